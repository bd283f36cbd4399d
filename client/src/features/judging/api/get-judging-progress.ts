import { queryOptions, useQuery } from '@tanstack/react-query';
import type { JudgingProgress } from '@shared/schemas/judging';
import { api } from '@client/lib/api';
import { judgingKeys } from './judging-keys';

export const getJudgingProgress = (eventId: number) => api<{ progress: JudgingProgress }>(`/api/events/${eventId}/judging/progress`);
// Judges score while the organiser watches: refresh every 20 s.
export const judgingProgressQueryOptions = (eventId: number) => queryOptions({ queryKey: judgingKeys.progress(eventId), queryFn: () => getJudgingProgress(eventId), refetchInterval: 20_000 });
export const useJudgingProgress = (eventId: number) => useQuery(judgingProgressQueryOptions(eventId));
