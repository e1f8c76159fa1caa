import type { Feature } from '../../core/feature';
import { refreshCells, refreshEventCells, refreshItemCells } from './queries/cells';
import { afterOutcome, markCameBack, markRebooked, sendFollowUpReminders } from './follow-ups';
import { impactPublicRoutes, impactRoutes } from './routes';
import { runImports } from './imports';
import { sendThankYous } from './thanks';

export const impactFeature: Feature = {
  name: 'impact',
  publicRoutes: impactPublicRoutes,
  routes: impactRoutes,
  hooks: {
    outcomeRecorded: [(tx, e) => refreshItemCells(tx, e.item), (tx, e) => afterOutcome(e.ctx, tx, e.item, e.outcome)],
    itemsCheckedIn: [(tx, e) => refreshCells(tx, e.itemIds), (tx, e) => markCameBack(tx, e.arrivedIds)],
    eventsCancelled: [(tx, e) => refreshEventCells(tx, e.eventIds)],
    returnBooked: [markRebooked],
  },
  jobs: [
    { name: 'part follow-up reminders', run: sendFollowUpReminders },
    { name: 'thank-you mails', run: sendThankYous },
    { name: 'imports of earlier records', run: runImports },
  ],
};
