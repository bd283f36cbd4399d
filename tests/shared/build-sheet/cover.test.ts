import { describe, expect, it } from 'vitest';
import { coverPhotoOf } from '@shared/build-sheet/cover';

const photo = (id: number, position: number, isCover = false) => ({ id, position, isCover });

describe('a build’s cover photo', () => {
  it('is the photo marked as the cover, wherever it sits', () => {
    expect(coverPhotoOf([photo(1, 0), photo(2, 1, true), photo(3, 2)])?.id).toBe(2);
  });

  it('is otherwise the first in the owner’s order, whatever order the list came in', () => {
    expect(coverPhotoOf([photo(1, 2), photo(2, 0), photo(3, 1)])?.id).toBe(2);
  });

  it('is none for a build with no photos', () => {
    expect(coverPhotoOf([])).toBeNull();
    expect(coverPhotoOf(undefined)).toBeNull();
  });
});
