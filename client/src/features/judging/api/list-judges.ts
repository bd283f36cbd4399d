import { queryOptions, useQuery } from '@tanstack/react-query';
import type { JudgeSummary } from '@shared/schemas/judging';
import { api } from '@client/lib/api';
import { judgingKeys } from './judging-keys';

export const listJudges = (eventId: number) => api<{ judges: JudgeSummary[] }>(`/api/events/${eventId}/judges`);
export const judgesQueryOptions = (eventId: number) => queryOptions({ queryKey: judgingKeys.judges(eventId), queryFn: () => listJudges(eventId) });
export const useJudges = (eventId: number) => useQuery(judgesQueryOptions(eventId));
