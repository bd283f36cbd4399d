import { createReadStream } from 'node:fs';
import { mkdir, readdir, rename, rm, stat, writeFile } from 'node:fs/promises';
import { randomBytes } from 'node:crypto';
import path from 'node:path';
import { assertValidKey, type Storage } from './types';

import { contentTypeOfKey as typeOf } from './content-types';

const missing = (err: unknown) => (err as NodeJS.ErrnoException)?.code === 'ENOENT';

/** Stores each key as a file under `root` (the key's slashes become folders). */
export function localDiskStorage(root: string): Storage {
  const fileOf = (key: string) => {
    assertValidKey(key);
    const file = path.resolve(root, key);
    if (!file.startsWith(path.resolve(root) + path.sep)) throw new Error(`Storage key escapes the folder: ${key}`);
    return file;
  };

  return {
    async put(key, body, contentType) {
      const file = fileOf(key);
      if (contentType !== typeOf(key)) throw new Error(`Content type ${contentType} does not match the key ${key}`);
      await mkdir(path.dirname(file), { recursive: true });
      // Write then rename, so a reader never sees half a file.
      const temp = `${file}.${randomBytes(6).toString('hex')}.tmp`;
      await writeFile(temp, body);
      await rename(temp, file).catch(async (err: unknown) => {
        await rm(temp, { force: true });
        throw err;
      });
    },

    async get(key) {
      const file = fileOf(key);
      try {
        const info = await stat(file);
        if (!info.isFile()) return null;
        return { body: createReadStream(file), contentType: typeOf(key), size: info.size };
      } catch (err) {
        if (missing(err)) return null;
        throw err;
      }
    },

    async delete(key) {
      await rm(fileOf(key), { force: true });
    },

    async exists(key) {
      try {
        return (await stat(fileOf(key))).isFile();
      } catch (err) {
        if (missing(err)) return false;
        throw err;
      }
    },

    async list(prefix) {
      const slash = prefix.lastIndexOf('/');
      const folder = slash < 0 ? '' : prefix.slice(0, slash);
      const start = prefix.slice(slash + 1);
      if (folder) assertValidKey(folder);
      try {
        const names = await readdir(path.join(root, folder));
        return names.filter((n) => n.startsWith(start) && !n.endsWith('.tmp')).map((n) => (folder ? `${folder}/${n}` : n));
      } catch (err) {
        if (missing(err)) return [];
        throw err;
      }
    },
  };
}
