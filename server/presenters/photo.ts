import type { Photo as PhotoBody } from '@shared/schemas/build';
import type { Photo } from '../models/photo';

/** Public URL of one stored variant; the storage driver serves /media/<key>. */
export const photoVariantKey = (storageKey: string, width: number, ext: 'webp' | 'jpg') => `photos/${storageKey}-${width}.${ext}`;
export const mediaUrl = (key: string) => `/media/${key}`;

export function presentPhoto(photo: Photo): PhotoBody {
  return {
    id: photo.id,
    caption: photo.caption,
    position: photo.position,
    isCover: photo.isCover,
    width: photo.width,
    height: photo.height,
    sources: [...photo.variants]
      .sort((a, b) => a.width - b.width)
      .map((v) => ({
        width: v.width,
        height: v.height,
        webp: mediaUrl(photoVariantKey(photo.storageKey, v.width, 'webp')),
        jpeg: mediaUrl(photoVariantKey(photo.storageKey, v.width, 'jpg')),
      })),
  };
}
