import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Photo } from '@shared/schemas/build';
import { api } from '@client/lib/api';
import { updateCachedPhotos } from './photo-cache';

export type PhotoUpdate = { caption?: string; isCover?: true };

export const updatePhoto = (buildId: number, photoId: number, input: PhotoUpdate) =>
  api<{ photo: Photo }>(`/api/builds/${buildId}/photos/${photoId}`, { method: 'PATCH', body: input });

export function useUpdatePhoto(buildId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ photoId, input }: { photoId: number; input: PhotoUpdate }) => updatePhoto(buildId, photoId, input),
    onSuccess: ({ photo }) => {
      // Only one cover: choosing one clears the others.
      updateCachedPhotos(qc, buildId, (old) => old.map((p) => (p.id === photo.id ? photo : photo.isCover ? { ...p, isCover: false } : p)));
    },
  });
}
