import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { GateCard, GateCounts } from '@shared/schemas/show-day';
import { api } from '@client/lib/api';
import { showDayKeys } from './show-day-keys';

export const lookUpCard = (eventId: number, what: { code: string } | { number: number }) =>
  api<{ card: GateCard }>(`/api/events/${eventId}/gate/lookup?${new URLSearchParams('code' in what ? { code: what.code } : { number: String(what.number) })}`).then((r) => r.card);

export const gateCountsQueryOptions = (eventId: number) =>
  // Live enough for a gate: other phones check cars in too.
  queryOptions({ queryKey: showDayKeys.gateCounts(eventId), queryFn: () => api<GateCounts>(`/api/events/${eventId}/gate/counts`), refetchInterval: 5000 });
export const useGateCounts = (eventId: number) => useQuery(gateCountsQueryOptions(eventId));

export function useLookUpCard(eventId: number) {
  return useMutation({ mutationFn: (what: { code: string } | { number: number }) => lookUpCard(eventId, what) });
}

export function useCheckIn(eventId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: { number: number; takeCash: boolean }) => api<{ card: GateCard }>(`/api/events/${eventId}/gate/check-in`, { method: 'POST', body: input }).then((r) => r.card),
    onSettled: () => qc.invalidateQueries({ queryKey: showDayKeys.gateCounts(eventId) }),
  });
}

export function useUndoCheckIn(eventId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (entryId: number) => api<{ card: GateCard }>(`/api/events/${eventId}/gate/undo`, { method: 'POST', body: { entryId } }).then((r) => r.card),
    onSettled: () => qc.invalidateQueries({ queryKey: showDayKeys.gateCounts(eventId) }),
  });
}
