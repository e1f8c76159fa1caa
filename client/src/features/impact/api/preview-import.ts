import { useMutation } from '@tanstack/react-query';
import type { ImportPreview } from '../../../../../shared/api/imports';
import { api } from '../../../lib/api';

/** The header and first rows of a file, read by the server the way the import will read it. */
export const previewImport = (file: File) => {
  const form = new FormData();
  form.append('file', file);
  return api<ImportPreview>('POST', '/api/imports/preview', form);
};

export const usePreviewImport = () => useMutation({ mutationFn: previewImport });
