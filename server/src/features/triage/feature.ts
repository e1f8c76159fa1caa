import type { Feature } from '../../core/feature';
import { triageRoutes } from './routes';
import { runTriage } from './service';

export const triageFeature: Feature = {
  name: 'triage',
  routes: triageRoutes,
  // The plan follows who has arrived: each check-in re-plans its slot.
  hooks: { arrivalsChanged: [(ctx, e) => runTriage(ctx, e.eventId, e.slotId, e.userId).then(() => undefined)] },
};
