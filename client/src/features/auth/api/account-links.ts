import { useMutation } from '@tanstack/react-query';
import type { SignupInput } from '../../../../../shared/schemas/auth';
import { api } from '../../../lib/api';

type Message = { message: string };

export const useSignUp = () =>
  useMutation({ mutationFn: (input: SignupInput) => api<Message>('POST', '/api/auth/signup', input) });
export const useVerifyEmail = () =>
  useMutation({ mutationFn: (token: string) => api<Message>('POST', '/api/auth/verify-email', { token }) });
export const useRequestReset = () =>
  useMutation({ mutationFn: (email: string) => api<Message>('POST', '/api/auth/password-reset', { email }) });
export const useConfirmReset = () =>
  useMutation({
    mutationFn: (input: { token: string; password: string; confirm: string }) =>
      api<Message>('POST', '/api/auth/password-reset/confirm', input),
  });
