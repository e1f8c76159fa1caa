import type { Feature } from '../../core/feature';
import { venueRoutes } from './routes';

export const venuesFeature: Feature = { name: 'venues', routes: venueRoutes };
