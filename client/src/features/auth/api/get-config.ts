import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api';
import { authKeys } from './keys';

interface PublicConfig {
  demo: boolean;
  needsSetup: boolean;
}
export const configQuery = queryOptions({
  queryKey: authKeys.config(),
  queryFn: () => api<PublicConfig>('GET', '/api/public/config'),
});
export const useConfig = () => useQuery(configQuery);
