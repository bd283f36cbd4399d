import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ShowResultRules } from '@shared/schemas/judging';
import type { ResultRulesUpdateInput } from '@shared/schemas/results';
import { api } from '@client/lib/api';

export const resultRulesQueryKey = (eventId: number) => ['results', eventId, 'rules'] as const;
export const getResultRules = (eventId: number) => api<{ rules: ShowResultRules }>(`/api/events/${eventId}/results/rules`);
export const resultRulesQueryOptions = (eventId: number) => queryOptions({ queryKey: resultRulesQueryKey(eventId), queryFn: () => getResultRules(eventId) });
export const useResultRules = (eventId: number) => useQuery(resultRulesQueryOptions(eventId));

export function useSaveResultRules(eventId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: ResultRulesUpdateInput) => api<{ rules: ShowResultRules }>(`/api/events/${eventId}/results/rules`, { method: 'PUT', body: input }),
    onSuccess: (data) => {
      qc.setQueryData(resultRulesQueryKey(eventId), data);
      void qc.invalidateQueries({ queryKey: ['results', eventId, 'review'] });
    },
  });
}
