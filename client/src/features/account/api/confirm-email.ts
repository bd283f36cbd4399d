import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { EmailVerificationConfirmInput, EmailVerificationConfirmResponse } from '@shared/schemas/user';
import { api } from '@client/lib/api';
import { sessionQueryKey } from '@client/features/session/api/get-session';

export const confirmEmail = (input: EmailVerificationConfirmInput) =>
  api<EmailVerificationConfirmResponse>('/api/email-verifications/confirm', { method: 'POST', body: input });

export function useConfirmEmail() {
  const qc = useQueryClient();
  // A signed-in person's banner goes away: the session now says the address is confirmed.
  return useMutation({ mutationFn: confirmEmail, onSuccess: () => qc.invalidateQueries({ queryKey: sessionQueryKey }) });
}
