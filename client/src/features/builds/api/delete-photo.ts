import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@client/lib/api';
import { updateCachedPhotos } from './photo-cache';
import { buildQueryKey } from './get-build';

export const deletePhoto = (buildId: number, photoId: number) => api<void>(`/api/builds/${buildId}/photos/${photoId}`, { method: 'DELETE' });

export function useDeletePhoto(buildId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (photoId: number) => deletePhoto(buildId, photoId),
    onSuccess: (_void, photoId) => {
      updateCachedPhotos(qc, buildId, (old) => old.filter((p) => p.id !== photoId));
      // The server may have chosen a new cover: ask again.
      void qc.invalidateQueries({ queryKey: buildQueryKey(buildId) });
    },
  });
}
