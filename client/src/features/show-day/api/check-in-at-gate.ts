import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { GateCard } from '@shared/schemas/show-day';
import { api } from '@client/lib/api';
import { showDayKeys } from './show-day-keys';

export type CheckInInput = { number: number; takeCash: boolean };

export const checkInAtGate = (eventId: number, input: CheckInInput) =>
  api<{ card: GateCard }>(`/api/events/${eventId}/gate/check-in`, { method: 'POST', body: input }).then((r) => r.card);

export function useCheckInAtGate(eventId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: CheckInInput) => checkInAtGate(eventId, input),
    onSettled: () => qc.invalidateQueries({ queryKey: showDayKeys.gateCounts(eventId) }),
  });
}
