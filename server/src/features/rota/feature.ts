import type { Feature } from '../../core/feature';
import { rotaPublicRoutes, rotaRoutes } from './routes';

export const rotaFeature: Feature = { name: 'rota', publicRoutes: rotaPublicRoutes, routes: rotaRoutes };
