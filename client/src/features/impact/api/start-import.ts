import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api';
import { impactKeys } from './keys';

export interface StartImport {
  groupId: number;
  file: File;
  /** For a plain sheet: our field → its column. */
  mapping: Record<string, string>;
}

export const startImport = ({ groupId, file, mapping }: StartImport) => {
  const form = new FormData();
  form.append('groupId', String(groupId));
  form.append('mapping', JSON.stringify(mapping));
  form.append('file', file);
  return api<{ id: number }>('POST', '/api/imports', form);
};

export function useStartImport(groupId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: startImport,
    onSuccess: () => qc.invalidateQueries({ queryKey: impactKeys.imports(groupId) }),
  });
}
