import { useMutation, useQueryClient } from '@tanstack/react-query';
import { buildLogKeys } from './build-log-keys';

/** A change to a post: the log is fetched again, in its date order as the server keeps it. */
export function useLogPostMutation<TInput, TResult>(buildId: number, mutationFn: (input: TInput) => Promise<TResult>) {
  const qc = useQueryClient();
  return useMutation({ mutationFn, onSuccess: () => qc.invalidateQueries({ queryKey: buildLogKeys.posts(buildId), exact: true }) });
}
