import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { OrganiserEntry } from '@shared/schemas/event';
import { api } from '@client/lib/api';

export const showEntriesQueryKey = (id: number) => ['shows', id, 'entries'] as const;
export const getShowEntries = (id: number) => api<{ entries: OrganiserEntry[] }>(`/api/events/${id}/entries`);
export const showEntriesQueryOptions = (id: number) => queryOptions({ queryKey: showEntriesQueryKey(id), queryFn: () => getShowEntries(id) });
export const useShowEntries = (id: number, enabled = true) => useQuery({ ...showEntriesQueryOptions(id), enabled });

export function useCheckIn(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (number: number) => api<{ entry: { id: number; number: number; status: string } }>(`/api/events/${id}/check-in`, { method: 'POST', body: { number } }),
    onSuccess: () => qc.invalidateQueries({ queryKey: showEntriesQueryKey(id) }),
  });
}
