import { queryOptions, useQuery } from '@tanstack/react-query';
import type { EventDetail } from '@shared/schemas/show';
import { api } from '@client/lib/api';
import { showKeys } from './show-keys';

export const getShow = (id: number) => api<{ event: EventDetail }>(`/api/events/${id}`);
export const showQueryOptions = (id: number) => queryOptions({ queryKey: showKeys.detail(id), queryFn: () => getShow(id) });
export const useShow = (id: number) => useQuery(showQueryOptions(id));
