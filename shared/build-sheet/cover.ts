/** A build's cover photo, the one rule every screen, page and card follows: the photo marked as the cover, else the first in the owner's order. */
export function coverPhotoOf<P extends { isCover: boolean; position: number }>(photos: readonly P[] | null | undefined): P | null {
  if (!photos?.length) return null;
  return photos.find((p) => p.isCover) ?? [...photos].sort((a, b) => a.position - b.position)[0]!;
}
