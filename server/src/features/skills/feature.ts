import type { Feature } from '../../core/feature';
import { skillRoutes } from './routes';

export const skillsFeature: Feature = { name: 'skills', routes: skillRoutes };
