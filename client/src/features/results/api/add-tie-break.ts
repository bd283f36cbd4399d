import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { TieBreakCreateInput } from '@shared/schemas/results';
import { api } from '@client/lib/api';
import { resultsKeys } from './results-keys';

export const addTieBreak = (eventId: number, input: TieBreakCreateInput) =>
  api<{ tieBreak: { id: number } }>(`/api/events/${eventId}/results/tie-breaks`, { method: 'POST', body: input });

export function useAddTieBreak(eventId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: TieBreakCreateInput) => addTieBreak(eventId, input),
    onSuccess: () => qc.invalidateQueries({ queryKey: resultsKeys.review(eventId) }),
  });
}
