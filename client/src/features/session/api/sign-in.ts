import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SessionResponse, SignInInput } from '@shared/schemas/user';
import { api, setCsrfToken } from '@client/lib/api';
import { sessionQueryKey } from './get-session';
import { forgetVisitorData } from './forget-visitor-data';

export const signIn = (input: SignInInput) => api<SessionResponse>('/api/session', { method: 'POST', body: input });

export function useSignIn() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: (session) => {
      setCsrfToken(session.csrfToken);
      // Everything cached belonged to the previous visitor.
      forgetVisitorData(qc);
      qc.setQueryData(sessionQueryKey, session);
    },
  });
}
