import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Profile } from '../../../../../shared/api/skills';
import type { ProfileInput } from '../../../../../shared/schemas/skills';
import { api } from '../../../lib/api';
import { skillKeys } from './keys';

export const saveProfile = (p: ProfileInput) => api<Profile>('PUT', '/api/me/profile', p);

/** The saved profile is the new answer; the group's matrix shows it on its next read. */
export function useSaveProfile() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: saveProfile,
    onSuccess: (p) => {
      qc.setQueryData(skillKeys.profile(), p);
      return qc.invalidateQueries({ queryKey: skillKeys.matrices() });
    },
  });
}
