import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api';

const requestReset = (email: string) => api<{ message: string }>('POST', '/api/auth/password-reset', { email });

export const useRequestReset = () => useMutation({ mutationFn: requestReset });
