import { api } from '@client/lib/api';
import { useLogPostMutation } from './log-post-mutation';

export const deleteLogPost = (buildId: number, postId: number) => api<void>(`/api/builds/${buildId}/log/${postId}`, { method: 'DELETE' });

export const useDeleteLogPost = (buildId: number) => useLogPostMutation(buildId, (postId: number) => deleteLogPost(buildId, postId));
