import type { Feature } from '../../core/feature';
import { workbenchRoutes } from './routes';

export const workbenchFeature: Feature = { name: 'workbench', routes: workbenchRoutes };
