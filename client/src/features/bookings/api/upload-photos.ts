import { api } from '../../../lib/api';

/** Photos go up one item at a time after the booking exists. */
export function uploadPhotos(reference: string, token: string, itemId: number, files: File[]) {
  const form = new FormData();
  for (const f of files) form.append('photos', f, f.name);
  return api<{ id: number }[]>('POST', `/api/bookings/${reference}/items/${itemId}/photos`, form, {
    'X-Manage-Token': token,
  });
}
