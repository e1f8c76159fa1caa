import type { Feature } from '../../core/feature';
import { syncKnowledge } from './service';
import { toolkitRoutes } from './routes';

export const toolkitFeature: Feature = {
  name: 'toolkit',
  routes: toolkitRoutes,
  hooks: { outcomeRecorded: [(tx, e) => syncKnowledge(tx, e.item, e.outcome, e.notes ?? undefined)] },
};
