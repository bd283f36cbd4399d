import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { EmailVerificationConfirmInput, EmailVerificationConfirmResponse } from '@shared/schemas/user';
import { api, setCsrfToken } from '@client/lib/api';
import { sessionQueryKey } from '@client/features/session/api/get-session';
import { forgetVisitorData } from '@client/features/session/api/forget-visitor-data';

export const confirmEmail = (input: EmailVerificationConfirmInput) =>
  api<EmailVerificationConfirmResponse>('/api/email-verifications/confirm', { method: 'POST', body: input });

export function useConfirmEmail() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: confirmEmail,
    onSuccess: ({ session }) => {
      if (session) {
        // Confirmed in the browser that signed up: signed in now, as after a sign-in.
        setCsrfToken(session.csrfToken);
        forgetVisitorData(qc);
        qc.setQueryData(sessionQueryKey, session);
      } else {
        // A signed-in person's banner goes away: the session now says the address is confirmed.
        void qc.invalidateQueries({ queryKey: sessionQueryKey });
      }
    },
  });
}
