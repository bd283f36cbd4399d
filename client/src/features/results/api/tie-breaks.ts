import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { TieBreakCreateInput } from '@shared/schemas/results';
import { api } from '@client/lib/api';
import { resultsReviewQueryKey } from './get-results-review';

export function useAddTieBreak(eventId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: TieBreakCreateInput) => api<{ tieBreak: { id: number } }>(`/api/events/${eventId}/results/tie-breaks`, { method: 'POST', body: input }),
    onSuccess: () => qc.invalidateQueries({ queryKey: resultsReviewQueryKey(eventId) }),
  });
}

export function useRemoveTieBreak(eventId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (tieBreakId: number) => api<void>(`/api/events/${eventId}/results/tie-breaks/${tieBreakId}`, { method: 'DELETE' }),
    onSuccess: () => qc.invalidateQueries({ queryKey: resultsReviewQueryKey(eventId) }),
  });
}
