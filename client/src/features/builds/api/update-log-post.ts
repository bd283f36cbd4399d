import type { LogPostUpdateInput, OwnLogPost } from '@shared/schemas/build-log';
import { api } from '@client/lib/api';
import { useLogPostMutation } from './log-post-mutation';

export const updateLogPost = (buildId: number, postId: number, input: LogPostUpdateInput) => api<{ post: OwnLogPost }>(`/api/builds/${buildId}/log/${postId}`, { method: 'PATCH', body: input });

export const useUpdateLogPost = (buildId: number) => useLogPostMutation(buildId, ({ postId, input }: { postId: number; input: LogPostUpdateInput }) => updateLogPost(buildId, postId, input));
