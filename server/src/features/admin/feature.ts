import type { Feature } from '../../core/feature';
import { adminRoutes } from './routes';

export const adminFeature: Feature = { name: 'admin', routes: adminRoutes };
