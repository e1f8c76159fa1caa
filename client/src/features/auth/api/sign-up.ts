import { useMutation } from '@tanstack/react-query';
import type { SignupInput } from '../../../../../shared/schemas/auth';
import { api } from '../../../lib/api';

const signUp = (input: SignupInput) => api<{ message: string }>('POST', '/api/auth/signup', input);

export const useSignUp = () => useMutation({ mutationFn: signUp });
