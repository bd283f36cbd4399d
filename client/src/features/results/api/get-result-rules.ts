import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ShowResultRules } from '@shared/schemas/judging';
import { api } from '@client/lib/api';
import { resultsKeys } from './results-keys';

export const getResultRules = (eventId: number) => api<{ rules: ShowResultRules }>(`/api/events/${eventId}/results/rules`);
export const resultRulesQueryOptions = (eventId: number) => queryOptions({ queryKey: resultsKeys.rules(eventId), queryFn: () => getResultRules(eventId) });
export const useResultRules = (eventId: number) => useQuery(resultRulesQueryOptions(eventId));
