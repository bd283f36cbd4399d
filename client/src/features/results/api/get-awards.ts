import { queryOptions, useQuery } from '@tanstack/react-query';
import type { AwardView } from '@shared/schemas/results';
import { api } from '@client/lib/api';
import { resultsKeys } from './results-keys';

export const getAwards = (eventId: number) => api<{ awards: AwardView[] }>(`/api/events/${eventId}/results/awards`);
export const awardsQueryOptions = (eventId: number) => queryOptions({ queryKey: resultsKeys.awards(eventId), queryFn: () => getAwards(eventId) });
export const useAwards = (eventId: number, enabled: boolean) => useQuery({ ...awardsQueryOptions(eventId), enabled });
