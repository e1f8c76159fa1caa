import type { Feature } from '../../core/feature';
import { benchRoutes } from './routes';

export const benchesFeature: Feature = { name: 'benches', routes: benchRoutes };
