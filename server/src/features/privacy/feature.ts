import type { Feature } from '../../core/feature';
import { runRetention } from './erase';
import { privacyRoutes } from './routes';

export const privacyFeature: Feature = {
  name: 'privacy',
  routes: privacyRoutes,
  jobs: [{ name: 'personal-data retention', run: (ctx) => runRetention(ctx) }],
};
