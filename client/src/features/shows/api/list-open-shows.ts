import { queryOptions, useQuery } from '@tanstack/react-query';
import type { EventSummary } from '@shared/schemas/show';
import { api } from '@client/lib/api';
import { showKeys } from './show-keys';

export const listOpenShows = () => api<{ events: EventSummary[] }>('/api/public/events');
export const openShowsQueryOptions = () => queryOptions({ queryKey: showKeys.open(), queryFn: listOpenShows });
export const useOpenShows = () => useQuery(openShowsQueryOptions());
