import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { GateCard, WalkUpInput } from '@shared/schemas/show-day';
import { api } from '@client/lib/api';
import { showDayKeys } from './show-day-keys';

export const enterWalkUp = (eventId: number, input: WalkUpInput) => api<{ card: GateCard }>(`/api/events/${eventId}/gate/walk-ups`, { method: 'POST', body: input }).then((r) => r.card);

/** The printable numbered card of one entry (a walk-up's, or a replacement). */
export const gateCardUrl = (eventId: number, number: number) => `/api/events/${eventId}/gate/cards/${number}`;

export function useEnterWalkUp(eventId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: WalkUpInput) => enterWalkUp(eventId, input),
    onSettled: () => Promise.all([qc.invalidateQueries({ queryKey: showDayKeys.gateCounts(eventId) }), qc.invalidateQueries({ queryKey: showDayKeys.gateRoster(eventId) })]),
  });
}
