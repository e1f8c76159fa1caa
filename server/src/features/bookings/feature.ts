import type { Feature } from '../../core/feature';
import { bookingJobs } from './jobs';
import { bookingRoutes } from './routes';

export const bookingsFeature: Feature = { name: 'bookings', routes: bookingRoutes, jobs: bookingJobs };
