import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, setCsrfToken } from '@client/lib/api';
import { sessionQueryOptions } from './get-session';

export const signOut = () => api<void>('/api/session', { method: 'DELETE' });

export function useSignOut() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    onSuccess: async () => {
      setCsrfToken(undefined);
      qc.clear();
      await qc.fetchQuery(sessionQueryOptions());
    },
  });
}
