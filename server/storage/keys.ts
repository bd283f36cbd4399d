import { randomBytes } from 'node:crypto';

/**
 * The shapes of stored keys and the URLs they are served at: the one place that knows them.
 * A photo's storage key is 32 random hex digits: unique, never reused, so its files can be cached forever.
 */
export const PHOTO_STORAGE_KEY = /^[0-9a-f]{32}$/;
/** The only keys /media serves: `photos/<storageKey>-<width>.<webp|jpg>`. */
export const PHOTO_FILE_KEY = /^photos\/[0-9a-f]{32}-[1-9][0-9]{0,4}\.(?:webp|jpg)$/;

export const newPhotoStorageKey = () => randomBytes(16).toString('hex');

/** The key of one stored width of a photo. */
export const photoVariantKey = (storageKey: string, width: number, ext: 'webp' | 'jpg') => `photos/${storageKey}-${width}.${ext}`;
/** What every stored width and format of one photo starts with, to list them all from the key alone. */
export const photoVariantsPrefix = (storageKey: string) => `photos/${storageKey}-`;

const MEDIA_PREFIX = '/media/';
/** The URL a stored file is served at (`GET /media/<key>`, no session). */
export const mediaUrl = (key: string) => `${MEDIA_PREFIX}${key}`;
/** The storage key behind a /media URL, or null for any other URL. */
export const keyOfMediaUrl = (url: string): string | null => (url.startsWith(MEDIA_PREFIX) ? url.slice(MEDIA_PREFIX.length) : null);

/** A numbered card's cached one-page PDF, by the SHA-256 of its content and design (`services/show-day/numbered-cards.ts`). */
export const cardCacheKey = (hash: string) => `card-cache/${hash}.pdf`;
/** A finished bulk print, by the SHA-256 of its cards' keys in order: the same cards in the same order are one file. */
export const cardSetKey = (hash: string) => `card-sets/${hash}.pdf`;
