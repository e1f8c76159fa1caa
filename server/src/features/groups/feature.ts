import type { Feature } from '../../core/feature';
import { groupPublicRoutes, groupRoutes } from './routes';

export const groupsFeature: Feature = { name: 'groups', publicRoutes: groupPublicRoutes, routes: groupRoutes };
