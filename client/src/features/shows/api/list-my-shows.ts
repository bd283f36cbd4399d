import { queryOptions, useQuery } from '@tanstack/react-query';
import type { EventSummary } from '@shared/schemas/show';
import { api } from '@client/lib/api';
import { showKeys } from './show-keys';

export const listMyShows = () => api<{ events: EventSummary[] }>('/api/events');
export const myShowsQueryOptions = () => queryOptions({ queryKey: showKeys.mine(), queryFn: listMyShows });
export const useMyShows = () => useQuery(myShowsQueryOptions());
