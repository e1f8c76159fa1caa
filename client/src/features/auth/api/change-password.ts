import { useMutation } from '@tanstack/react-query';
import type { ChangePasswordInput } from '../../../../../shared/schemas/auth';
import { api } from '../../../lib/api';

const changePassword = (input: ChangePasswordInput) => api<{ message: string }>('POST', '/api/auth/password', input);

export const useChangePassword = () => useMutation({ mutationFn: changePassword });
