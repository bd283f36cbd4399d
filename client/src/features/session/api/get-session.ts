import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SessionResponse } from '@shared/schemas/user';
import { api, setCsrfToken } from '@client/lib/api';

export const sessionQueryKey = ['session'] as const;

export async function getSession(): Promise<SessionResponse> {
  const session = await api<SessionResponse>('/api/session');
  setCsrfToken(session.csrfToken);
  return session;
}

export const sessionQueryOptions = () => queryOptions({ queryKey: sessionQueryKey, queryFn: getSession, staleTime: 5 * 60_000 });

export const useSession = () => useQuery(sessionQueryOptions());
