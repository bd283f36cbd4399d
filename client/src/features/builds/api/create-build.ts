import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BuildCreateInput, OwnerBuild } from '@shared/schemas/build';
import { api } from '@client/lib/api';
import { buildQueryKey } from './get-build';
import { buildsQueryKey } from './list-builds';

export const createBuild = (input: BuildCreateInput) => api<{ build: OwnerBuild }>('/api/builds', { method: 'POST', body: input });

export function useCreateBuild() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: createBuild,
    onSuccess: ({ build }) => {
      qc.setQueryData(buildQueryKey(build.id), { build });
      void qc.invalidateQueries({ queryKey: buildsQueryKey, exact: true });
    },
  });
}
