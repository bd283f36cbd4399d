import { queryOptions, useQuery } from '@tanstack/react-query';
import type { EventSummary } from '@shared/schemas/show';
import { api } from '@client/lib/api';
import { judgingKeys } from './judging-keys';

/** The shows the signed-in person judges. */
export const listJudgingShows = () => api<{ events: EventSummary[] }>('/api/judging');
export const judgingShowsQueryOptions = () => queryOptions({ queryKey: judgingKeys.myShows(), queryFn: listJudgingShows });
export const useJudgingShows = () => useQuery(judgingShowsQueryOptions());
