import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api';
import { eventDayKeys } from './keys';

export const uploadRepairPhotos = (id: number, files: FileList) => {
  const form = new FormData();
  for (const f of Array.from(files)) form.append('photos', f);
  return api<{ id: number }[]>('POST', `/api/items/${id}/photos`, form);
};

export function useUploadRepairPhotos(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (files: FileList) => uploadRepairPhotos(id, files),
    onSuccess: () => qc.invalidateQueries({ queryKey: eventDayKeys.item(id) }),
  });
}
