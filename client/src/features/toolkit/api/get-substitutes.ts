import { useQuery } from '@tanstack/react-query';
import type { SubstituteQuery } from '../../../../../shared/api/toolkit';
import type { Substitute } from './types';
import { api } from '../../../lib/api';
import { queryString } from '../../../lib/query-string';
import { toolkitKeys } from './keys';

export const getSubstitutes = (groupId: number, f: SubstituteQuery) =>
  api<Substitute[]>('GET', `/api/groups/${groupId}/salvage/substitutes${queryString(f)}`);

/** Asked only when the fixer has said what the item needs (`enabled`). */
export const useSubstitutes = (groupId: number, f: SubstituteQuery, enabled: boolean) =>
  useQuery({
    queryKey: toolkitKeys.salvage.substitutes(groupId, f),
    queryFn: () => getSubstitutes(groupId, f),
    enabled,
  });
