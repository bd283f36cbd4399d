import { useMutation } from '@tanstack/react-query';
import type { PasswordChangeInput } from '@shared/schemas/user';
import { api } from '@client/lib/api';

export const changePassword = (input: PasswordChangeInput) => api<void>('/api/account/password', { method: 'POST', body: input });
export const useChangePassword = () => useMutation({ mutationFn: changePassword });
