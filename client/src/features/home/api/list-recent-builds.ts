import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PublicBuildTileListResponse } from '@shared/schemas/build';
import { api } from '@client/lib/api';

export const listRecentBuilds = (limit = 6) => api<PublicBuildTileListResponse>(`/api/public/builds?limit=${limit}`);
export const recentBuildsQueryOptions = () => queryOptions({ queryKey: ['public', 'builds', 'recent'], queryFn: () => listRecentBuilds(), staleTime: 60_000 });
export const useRecentBuilds = () => useQuery(recentBuildsQueryOptions());
