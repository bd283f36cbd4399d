import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SessionResponse, SignUpInput } from '@shared/schemas/user';
import { api, setCsrfToken } from '@client/lib/api';
import { sessionQueryKey } from './get-session';

export const signUp = (input: SignUpInput) => api<SessionResponse>('/api/users', { method: 'POST', body: input });

export function useSignUp() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: signUp,
    onSuccess: (session) => {
      setCsrfToken(session.csrfToken);
      qc.clear();
      qc.setQueryData(sessionQueryKey, session);
    },
  });
}
