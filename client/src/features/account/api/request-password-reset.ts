import { useMutation } from '@tanstack/react-query';
import type { PasswordResetRequestInput } from '@shared/schemas/user';
import { api } from '@client/lib/api';

export const requestPasswordReset = (input: PasswordResetRequestInput) =>
  api<{ message: string }>('/api/password-resets', { method: 'POST', body: input });
export const useRequestPasswordReset = () => useMutation({ mutationFn: requestPasswordReset });
