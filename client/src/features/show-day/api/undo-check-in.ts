import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { GateCard } from '@shared/schemas/show-day';
import { api } from '@client/lib/api';
import { showDayKeys } from './show-day-keys';

export const undoCheckIn = (eventId: number, entryId: number) =>
  api<{ card: GateCard }>(`/api/events/${eventId}/gate/undo`, { method: 'POST', body: { entryId } }).then((r) => r.card);

export function useUndoCheckIn(eventId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (entryId: number) => undoCheckIn(eventId, entryId),
    onSettled: () => qc.invalidateQueries({ queryKey: showDayKeys.gateCounts(eventId) }),
  });
}
