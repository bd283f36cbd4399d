import { queryOptions, useQuery } from '@tanstack/react-query';
import type { OwnLogPost } from '@shared/schemas/build-log';
import { api } from '@client/lib/api';
import { buildLogKeys } from './build-log-keys';

export const listLogPosts = (buildId: number) => api<{ posts: OwnLogPost[] }>(`/api/builds/${buildId}/log`);

export const logPostsQueryOptions = (buildId: number) => queryOptions({ queryKey: buildLogKeys.posts(buildId), queryFn: () => listLogPosts(buildId) });

export const useLogPosts = (buildId: number) => useQuery(logPostsQueryOptions(buildId));
