import { useMutation } from '@tanstack/react-query';
import type { PasswordResetConfirmInput } from '@shared/schemas/user';
import { api } from '@client/lib/api';

export const confirmPasswordReset = (input: PasswordResetConfirmInput) =>
  api<void>('/api/password-resets/confirm', { method: 'POST', body: input });
export const useConfirmPasswordReset = () => useMutation({ mutationFn: confirmPasswordReset });
