import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@client/lib/api';
import { buildQueryKey } from './get-build';
import { buildsQueryKey } from './list-builds';

export const deleteBuild = (id: number) => api<void>(`/api/builds/${id}`, { method: 'DELETE' });

export function useDeleteBuild(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => deleteBuild(id),
    onSuccess: () => void qc.invalidateQueries({ queryKey: buildsQueryKey, exact: true }),
  });
}

/**
 * Forgets a deleted build once the screen watching it has gone: forgotten while it still watches,
 * the build would be asked for again (and answer 404).
 */
export function useForgetBuild() {
  const qc = useQueryClient();
  return (id: number) => qc.removeQueries({ queryKey: buildQueryKey(id) });
}
