import { readdir, readFile } from 'node:fs/promises';
import path from 'node:path';
import { contentTypeOfKey } from './content-types';
import type { Storage } from './types';

/**
 * Copies every object of a local store (the folder STORAGE_DIR names) into another storage, key for
 * key, skipping what the target already has: run it again after a failure and it carries on.
 */
export async function copyLocalStoreInto(root: string, target: Storage, log: (line: string) => void = () => undefined): Promise<{ copied: number; skipped: number }> {
  let copied = 0;
  let skipped = 0;
  const walk = async (folder: string): Promise<void> => {
    for (const entry of await readdir(path.join(root, folder), { withFileTypes: true })) {
      const key = folder ? `${folder}/${entry.name}` : entry.name;
      if (entry.isDirectory()) await walk(key);
      else if (entry.isFile() && !entry.name.endsWith('.tmp')) {
        if (await target.exists(key)) skipped++;
        else {
          await target.put(key, await readFile(path.join(root, key)), contentTypeOfKey(key));
          copied++;
          if (copied % 100 === 0) log(`  ${copied} copied…`);
        }
      }
    }
  };
  await walk('');
  return { copied, skipped };
}
