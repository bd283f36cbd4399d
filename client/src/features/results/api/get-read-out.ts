import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ReadOut } from '@shared/schemas/read-out';
import { api } from '@client/lib/api';
import { resultsKeys } from './results-keys';

export const getReadOut = (eventId: number) => api<{ readOut: ReadOut }>(`/api/events/${eventId}/results/read-out`);
export const readOutQueryOptions = (eventId: number) => queryOptions({ queryKey: resultsKeys.readOut(eventId), queryFn: () => getReadOut(eventId) });
export const useReadOut = (eventId: number) => useQuery(readOutQueryOptions(eventId));
