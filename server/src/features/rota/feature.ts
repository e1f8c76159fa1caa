import type { Feature } from '../../core/feature';
import { rotaRoutes } from './routes';

export const rotaFeature: Feature = { name: 'rota', routes: rotaRoutes };
