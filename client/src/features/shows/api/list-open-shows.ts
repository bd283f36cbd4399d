import { queryOptions, useQuery } from '@tanstack/react-query';
import type { EventSummary } from '@shared/schemas/event';
import { api } from '@client/lib/api';

export const openShowsQueryKey = ['shows', 'open'] as const;
export const listOpenShows = () => api<{ events: EventSummary[] }>('/api/public/events');
export const openShowsQueryOptions = () => queryOptions({ queryKey: openShowsQueryKey, queryFn: listOpenShows });
export const useOpenShows = () => useQuery(openShowsQueryOptions());
