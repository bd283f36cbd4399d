import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SignUpInput, SignUpResponse } from '@shared/schemas/user';
import { api, setCsrfToken } from '@client/lib/api';
import { sessionQueryKey } from './get-session';
import { forgetVisitorData } from './forget-visitor-data';

/**
 * Sign-up signs nobody in: the answer is the same for a new and a known address, and the mail says which.
 * The exception is a new account from an invitation link with the invited address: it comes back signed in.
 */
export const signUp = (input: SignUpInput) => api<SignUpResponse>('/api/users', { method: 'POST', body: input });

export function useSignUp() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: signUp,
    onSuccess: ({ session }) => {
      if (!session) return;
      setCsrfToken(session.csrfToken);
      forgetVisitorData(qc);
      qc.setQueryData(sessionQueryKey, session);
    },
  });
}
