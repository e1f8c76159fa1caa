import type { Feature } from '../../core/feature';
import { volunteerRoutes } from './routes';

export const volunteersFeature: Feature = { name: 'volunteers', routes: volunteerRoutes };
