import type { Feature } from '../../core/feature';
import { categoryRoutes } from './routes';

export const categoriesFeature: Feature = { name: 'categories', routes: categoryRoutes };
