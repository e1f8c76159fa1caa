import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api';
import type { Language } from '../../../../../shared/i18n/languages';
import { groupKeys } from './keys';

/** Only the parts sent are saved. */
type SettingsInput = {
  houseRules?: string;
  excludedCategoryIds?: number[];
  currency?: string;
  country?: string;
  defaultLanguage?: Language;
  retentionMonths?: number;
  contactEmail?: string;
};

const saveGroupSettings = (groupId: number, s: SettingsInput) => api('PUT', `/api/groups/${groupId}/settings`, s);

/** `onSaved` lets the page refresh what other features show of the settings (the events' house rules). */
export function useSaveGroupSettings(groupId: number, onSaved?: () => unknown) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (s: SettingsInput) => saveGroupSettings(groupId, s),
    onSuccess: () => {
      qc.invalidateQueries({ queryKey: groupKeys.settings(groupId) });
      onSaved?.();
    },
  });
}
