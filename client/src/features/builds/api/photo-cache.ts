import type { QueryClient } from '@tanstack/react-query';
import type { OwnerBuild, Photo } from '@shared/schemas/build';
import { buildQueryKey } from './get-build';
import { buildsQueryKey } from './list-builds';

/** Photo endpoints answer with photos, not the whole build: fold them into the cached build. */
export function updateCachedPhotos(qc: QueryClient, buildId: number, change: (photos: Photo[]) => Photo[]) {
  qc.setQueryData<{ build: OwnerBuild }>(buildQueryKey(buildId), (old) => (old ? { build: { ...old.build, photos: change(old.build.photos) } } : old));
  void qc.invalidateQueries({ queryKey: buildsQueryKey, exact: true });
}

export const byPosition = (photos: Photo[]) => [...photos].sort((a, b) => a.position - b.position);
