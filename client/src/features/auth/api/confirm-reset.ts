import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api';

const confirmReset = (input: { token: string; password: string; confirm: string }) =>
  api<{ message: string }>('POST', '/api/auth/password-reset/confirm', input);

export const useConfirmReset = () => useMutation({ mutationFn: confirmReset });
