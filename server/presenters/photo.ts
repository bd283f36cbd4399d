import type { Photo as PhotoBody } from '@shared/schemas/build';
import type { Photo } from '../models/photo';

import { mediaUrl, photoVariantKey } from '../storage/keys';

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
