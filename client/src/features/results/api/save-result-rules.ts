import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ShowResultRules } from '@shared/schemas/judging';
import type { ResultRulesUpdateInput } from '@shared/schemas/results';
import { api } from '@client/lib/api';
import { resultsKeys } from './results-keys';

export const saveResultRules = (eventId: number, input: ResultRulesUpdateInput) =>
  api<{ rules: ShowResultRules }>(`/api/events/${eventId}/results/rules`, { method: 'PUT', body: input });

/** The rules decide the placings: the review is asked again after a change. */
export function useSaveResultRules(eventId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: ResultRulesUpdateInput) => saveResultRules(eventId, input),
    onSuccess: (data) => {
      qc.setQueryData(resultsKeys.rules(eventId), data);
      void qc.invalidateQueries({ queryKey: resultsKeys.review(eventId) });
    },
  });
}
