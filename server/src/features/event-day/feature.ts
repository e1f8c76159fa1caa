import type { Feature } from '../../core/feature';
import { eventDayPublicRoutes, eventDayRoutes } from './routes';

export const eventDayFeature: Feature = {
  name: 'event-day',
  publicRoutes: eventDayPublicRoutes,
  routes: eventDayRoutes,
};
