import type { Feature } from '../../core/feature';
import { platformRoutes } from './routes';

export const platformFeature: Feature = { name: 'platform', publicRoutes: platformRoutes };
