import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ShowResultRules } from '@shared/schemas/judging';
import type { ResultRulesUpdateInput } from '@shared/schemas/results';
import { api } from '@client/lib/api';
import { resultsKeys } from './results-keys';

export const resultRulesQueryKey = resultsKeys.rules;
export const getResultRules = (eventId: number) => api<{ rules: ShowResultRules }>(`/api/events/${eventId}/results/rules`);
export const resultRulesQueryOptions = (eventId: number) => queryOptions({ queryKey: resultRulesQueryKey(eventId), queryFn: () => getResultRules(eventId) });
export const useResultRules = (eventId: number) => useQuery(resultRulesQueryOptions(eventId));

export function useSaveResultRules(eventId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: ResultRulesUpdateInput) => api<{ rules: ShowResultRules }>(`/api/events/${eventId}/results/rules`, { method: 'PUT', body: input }),
    onSuccess: (data) => {
      qc.setQueryData(resultRulesQueryKey(eventId), data);
      void qc.invalidateQueries({ queryKey: resultsKeys.review(eventId) });
    },
  });
}
