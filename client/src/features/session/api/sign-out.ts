import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, setCsrfToken } from '@client/lib/api';
import { sessionQueryOptions } from './get-session';
import { forgetVisitorData } from './forget-visitor-data';

export const signOut = () => api<void>('/api/session', { method: 'DELETE' });

export function useSignOut() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    onSuccess: async () => {
      setCsrfToken(undefined);
      forgetVisitorData(qc);
      await qc.fetchQuery({ ...sessionQueryOptions(), staleTime: 0 });
    },
  });
}
