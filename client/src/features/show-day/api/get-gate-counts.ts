import { queryOptions, useQuery } from '@tanstack/react-query';
import type { GateCounts } from '@shared/schemas/show-day';
import { api } from '@client/lib/api';
import { showDayKeys } from './show-day-keys';

export const getGateCounts = (eventId: number) => api<GateCounts>(`/api/events/${eventId}/gate/counts`);
// Live enough for a gate: other phones check cars in too.
export const gateCountsQueryOptions = (eventId: number) => queryOptions({ queryKey: showDayKeys.gateCounts(eventId), queryFn: () => getGateCounts(eventId), refetchInterval: 5000 });
export const useGateCounts = (eventId: number) => useQuery(gateCountsQueryOptions(eventId));
