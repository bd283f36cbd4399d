import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Photo } from '@shared/schemas/build';
import { api } from '@client/lib/api';
import { byPosition, updateCachedPhotos } from './photo-cache';
import { buildQueryKey } from './get-build';

export const reorderPhotos = (buildId: number, photoIds: number[]) =>
  api<{ photos: Photo[] }>(`/api/builds/${buildId}/photos/order`, { method: 'PUT', body: { photoIds } });

export function useReorderPhotos(buildId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (photoIds: number[]) => reorderPhotos(buildId, photoIds),
    // Move at once on screen; the server's answer (or a refetch after an error) settles it.
    onMutate: (photoIds) => {
      updateCachedPhotos(qc, buildId, (old) => photoIds.map((id) => old.find((p) => p.id === id)).filter((p): p is Photo => !!p).map((p, position) => ({ ...p, position })));
    },
    onSuccess: ({ photos }) => updateCachedPhotos(qc, buildId, () => byPosition(photos)),
    onError: () => void qc.invalidateQueries({ queryKey: buildQueryKey(buildId) }),
  });
}
