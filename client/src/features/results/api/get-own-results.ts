import { queryOptions, useQuery } from '@tanstack/react-query';
import type { OwnResults } from '@shared/schemas/results';
import { api } from '@client/lib/api';
import { resultsKeys } from './results-keys';

export const getOwnResults = (entryId: number) => api<{ results: OwnResults }>(`/api/entries/${entryId}/results`);
export const ownResultsQueryOptions = (entryId: number) => queryOptions({ queryKey: resultsKeys.ownResults(entryId), queryFn: () => getOwnResults(entryId) });
export const useOwnResults = (entryId: number) => useQuery(ownResultsQueryOptions(entryId));
