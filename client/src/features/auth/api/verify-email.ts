import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api';

const verifyEmail = (token: string) => api<{ message: string }>('POST', '/api/auth/verify-email', { token });

export const useVerifyEmail = () => useMutation({ mutationFn: verifyEmail });
