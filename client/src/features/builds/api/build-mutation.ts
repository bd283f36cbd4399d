import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { OwnerBuild } from '@shared/schemas/build';
import { buildQueryKey } from './get-build';
import { buildsQueryKey } from './list-builds';

/**
 * Every write to a build answers with the whole build: put it straight into the editor's cache
 * (so other sections keep their state) and let the list refetch when next shown.
 */
export function useBuildMutation<TInput>(buildId: number, mutationFn: (input: TInput) => Promise<{ build: OwnerBuild }>) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn,
    onSuccess: ({ build }) => {
      // Panels save by themselves, so two answers can cross: one older than the build already in the
      // cache would put back what a later save changed. Ask for the build afresh instead.
      const cached = qc.getQueryData<{ build: OwnerBuild }>(buildQueryKey(buildId));
      if (cached && cached.build.updatedAt > build.updatedAt) void qc.invalidateQueries({ queryKey: buildQueryKey(buildId), exact: true });
      else qc.setQueryData(buildQueryKey(buildId), { build });
      void qc.invalidateQueries({ queryKey: buildsQueryKey, exact: true });
    },
  });
}
