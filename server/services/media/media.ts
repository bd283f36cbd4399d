import { storage, type StoredObject } from '../../storage/index';
import { PHOTO_FILE_KEY } from '../../storage/keys';

/** A stored file by its key, or null: only keys of the exact stored shape are looked up, so no path can climb out. */
export async function openMediaFile(key: string): Promise<StoredObject | null> {
  if (!PHOTO_FILE_KEY.test(key)) return null;
  return storage.get(key);
}
