import { queryOptions, useQuery } from '@tanstack/react-query';
import type { BuildSummary } from '@shared/schemas/build';
import { api } from '@client/lib/api';

export const buildsQueryKey = ['builds'] as const;

export const listBuilds = () => api<{ builds: BuildSummary[] }>('/api/builds');

export const buildsQueryOptions = () => queryOptions({ queryKey: buildsQueryKey, queryFn: listBuilds });

export const useBuilds = () => useQuery(buildsQueryOptions());
