import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@client/lib/api';
import { resultsKeys } from './results-keys';

export const removeTieBreak = (eventId: number, tieBreakId: number) => api<void>(`/api/events/${eventId}/results/tie-breaks/${tieBreakId}`, { method: 'DELETE' });

export function useRemoveTieBreak(eventId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (tieBreakId: number) => removeTieBreak(eventId, tieBreakId),
    onSuccess: () => qc.invalidateQueries({ queryKey: resultsKeys.review(eventId) }),
  });
}
