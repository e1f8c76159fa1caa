import { useMutation } from '@tanstack/react-query';
import type { FreshLinkInput } from '../../../../../shared/schemas/bookings';
import { api } from '../../../lib/api';

const requestFreshLink = (input: FreshLinkInput) => api<{ message: string }>('POST', '/api/bookings/new-link', input);

/** Asks for a fresh link to every current booking of an address; the answer is the same whether it has any. */
export const useRequestFreshLink = () => useMutation({ mutationFn: requestFreshLink });
