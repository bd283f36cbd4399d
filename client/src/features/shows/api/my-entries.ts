import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { EntryCreateInput, MyEntry } from '@shared/schemas/entry';
import { api } from '@client/lib/api';
import { entryKeys, showKeys } from './show-keys';

export const myEntriesQueryKey = entryKeys.mine();
export const listMyEntries = () => api<{ entries: MyEntry[] }>('/api/entries');
export const myEntriesQueryOptions = () => queryOptions({ queryKey: myEntriesQueryKey, queryFn: listMyEntries });
/** While an entry just paid waits for the payment service's confirmation, ask again every two seconds. */
export const useMyEntries = (awaitingPaidId: number | null = null) =>
  useQuery({
    ...myEntriesQueryOptions(),
    refetchInterval: (q) => (awaitingPaidId && !q.state.data?.entries.find((e) => e.id === awaitingPaidId)?.paidAt ? 2000 : false),
  });

export function useRegisterEntry(eventId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: EntryCreateInput) => api<{ entry: MyEntry }>(`/api/events/${eventId}/entries`, { method: 'POST', body: input }),
    onSuccess: () => qc.invalidateQueries({ queryKey: myEntriesQueryKey }),
  });
}
export function useWithdrawEntry() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (entryId: number) => api<{ entry: { id: number; status: string; refundDue: number | null; currency: string } }>(`/api/entries/${entryId}/withdraw`, { method: 'POST' }),
    onSuccess: () => qc.invalidateQueries({ queryKey: entryKeys.all }).then(() => qc.invalidateQueries({ queryKey: showKeys.all })),
  });
}
export function useAcceptOffer() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (entryId: number) => api<{ entry: MyEntry }>(`/api/entries/${entryId}/accept-offer`, { method: 'POST' }),
    onSuccess: () => qc.invalidateQueries({ queryKey: myEntriesQueryKey }),
  });
}

/** Opens (or reopens) the payment service's checkout for an entry's fee; the browser then goes there. */
export function usePayEntry() {
  return useMutation({
    mutationFn: (entryId: number) => api<{ url: string }>(`/api/entries/${entryId}/checkout`, { method: 'POST' }),
    onSuccess: ({ url }) => window.location.assign(url),
  });
}
