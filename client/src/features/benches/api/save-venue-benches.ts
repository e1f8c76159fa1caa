import { useMutation } from '@tanstack/react-query';
import type { Bench } from '../../../../../shared/api/benches';
import { api } from '../../../lib/api';

/** The venue's usual layout, copied into each later session there; ids stay with the session's own benches. */
export const saveVenueBenches = (venueId: number, benches: Bench[]) =>
  api<Bench[]>('PUT', `/api/venues/${venueId}/benches`, {
    benches: benches.map(({ name, seats, equipment }) => ({ name, seats, equipment })),
  });

export const useSaveVenueBenches = (venueId: number | undefined) =>
  useMutation({ mutationFn: (benches: Bench[]) => saveVenueBenches(venueId!, benches) });
