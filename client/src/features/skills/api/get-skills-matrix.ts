import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import type { SkillsMatrix } from '../../../../../shared/api/skills';
import { api } from '../../../lib/api';
import { skillKeys } from './keys';

export const getSkillsMatrix = (groupId: number) => api<SkillsMatrix>('GET', `/api/groups/${groupId}/skills`);

export const skillsMatrixQuery = (groupId: number) =>
  queryOptions({ queryKey: skillKeys.matrix(groupId), queryFn: () => getSkillsMatrix(groupId) });

/** Read after the route's loader has the matrix, so the page renders with it from the start. */
export const useSkillsMatrix = (groupId: number) => useSuspenseQuery(skillsMatrixQuery(groupId));
