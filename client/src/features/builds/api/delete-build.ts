import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@client/lib/api';
import { buildQueryKey } from './get-build';
import { buildsQueryKey } from './list-builds';

export const deleteBuild = (id: number) => api<void>(`/api/builds/${id}`, { method: 'DELETE' });

export function useDeleteBuild(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => deleteBuild(id),
    onSuccess: () => {
      qc.removeQueries({ queryKey: buildQueryKey(id) });
      void qc.invalidateQueries({ queryKey: buildsQueryKey, exact: true });
    },
  });
}
