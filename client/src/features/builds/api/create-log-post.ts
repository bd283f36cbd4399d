import type { LogPostCreateInput, OwnLogPost } from '@shared/schemas/build-log';
import { api } from '@client/lib/api';
import { useLogPostMutation } from './log-post-mutation';

export const createLogPost = (buildId: number, input: LogPostCreateInput) => api<{ post: OwnLogPost }>(`/api/builds/${buildId}/log`, { method: 'POST', body: input });

export const useCreateLogPost = (buildId: number) => useLogPostMutation(buildId, (input: LogPostCreateInput) => createLogPost(buildId, input));
