import type { Feature } from './core/feature';
import { adminFeature } from './features/admin/feature';
import { benchesFeature } from './features/benches/feature';
import { bookingsFeature } from './features/bookings/feature';
import { categoriesFeature } from './features/categories/feature';
import { eventDayFeature } from './features/event-day/feature';
import { eventsFeature } from './features/events/feature';
import { groupsFeature } from './features/groups/feature';
import { impactFeature } from './features/impact/feature';
import { platformFeature } from './features/platform/feature';
import { privacyFeature } from './features/privacy/feature';
import { rotaFeature } from './features/rota/feature';
import { skillsFeature } from './features/skills/feature';
import { toolkitFeature } from './features/toolkit/feature';
import { triageFeature } from './features/triage/feature';
import { workbenchFeature } from './features/workbench/feature';

/**
 * The composition root: every feature, in the order its routers are mounted and its hook steps and jobs run.
 * No feature imports another; they meet here and in server/src/core/.
 */
export const FEATURES: Feature[] = [
  platformFeature,
  groupsFeature,
  adminFeature,
  categoriesFeature,
  eventsFeature,
  bookingsFeature,
  skillsFeature,
  rotaFeature,
  workbenchFeature,
  benchesFeature,
  triageFeature,
  eventDayFeature,
  impactFeature,
  toolkitFeature,
  privacyFeature,
];
