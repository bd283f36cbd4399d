import { queryOptions, useQuery } from '@tanstack/react-query';
import type { EventDetail } from '@shared/schemas/event';
import { api } from '@client/lib/api';

export const getShow = (id: number) => api<{ event: EventDetail }>(`/api/events/${id}`).then((r) => r.event);
export const showQueryOptions = (id: number) => queryOptions({ queryKey: ['shows', id], queryFn: () => getShow(id) });
export const useShow = (id: number) => useQuery(showQueryOptions(id));
