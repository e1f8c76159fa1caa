import type { Feature } from '../../core/feature';
import { eventRoutes } from './routes';

export const eventsFeature: Feature = { name: 'events', routes: eventRoutes };
