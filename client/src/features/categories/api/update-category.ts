import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Category } from '../../../../../shared/api/categories';
import type { CategoryPatchInput } from '../../../../../shared/schemas/categories';
import { api } from '../../../lib/api';
import { categoryKeys } from './keys';

const updateCategory = (id: number, patch: CategoryPatchInput) =>
  api<Category>('PATCH', `/api/categories/${id}`, patch);

export function useUpdateCategory(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (patch: CategoryPatchInput) => updateCategory(id, patch),
    onSuccess: () => qc.invalidateQueries({ queryKey: categoryKeys.all }),
  });
}
