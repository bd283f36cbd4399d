import { queryOptions, useQuery } from '@tanstack/react-query';
import type { OwnerBuild } from '@shared/schemas/build';
import { api } from '@client/lib/api';
import { buildsQueryKey } from './list-builds';

export const buildQueryKey = (id: number) => [...buildsQueryKey, id] as const;

export const getBuild = (id: number) => api<{ build: OwnerBuild }>(`/api/builds/${id}`);

export const buildQueryOptions = (id: number) => queryOptions({ queryKey: buildQueryKey(id), queryFn: () => getBuild(id) });

export const useBuild = (id: number) => useQuery(buildQueryOptions(id));
