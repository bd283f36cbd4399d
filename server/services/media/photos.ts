import { Op, type Transaction } from 'sequelize';
import { PHOTO_MAX_BYTES, PHOTO_MAX_FILES, photoTooLargeMessage } from '@shared/schemas/build';
import { Photo } from '../../models/photo';
import { newPhotoStorageKey, PHOTO_STORAGE_KEY, photoVariantKey, photoVariantsPrefix } from '../../storage/keys';
import { storage } from '../../storage/index';
import { logger } from '../../logger';
import { AppError, NotFoundError, ValidationError } from '../../errors';
import { imagePixels, processImage, ImageRejectedError, type ProcessedImage } from './image-processing';
import { chargePersonPixels, checkRequestPixels, imageSlots } from './image-budget';
import { lockBuild, touchBuild } from '../builds/builds';
import { withTransaction } from '../../db/transaction';

export type PhotoFile = { buffer: Buffer; originalName: string };


export const tooLargeError = () => new AppError(413, 'PAYLOAD_TOO_LARGE', photoTooLargeMessage(), { photos: photoTooLargeMessage() });
export const tooManyError = () => new ValidationError({ photos: `Send at most ${PHOTO_MAX_FILES} photos at a time.` });

const refused = (message: string) => new ValidationError({ photos: message }, 'A photo was refused, so nothing was saved.');
const shownName = (name: string) => (name.trim() || 'A file').slice(0, 80);

export const listPhotos = (buildId: number, transaction?: Transaction) =>
  Photo.findAll({ where: { buildId }, order: [['position', 'ASC'], ['id', 'ASC']], transaction });

/** Locks the build row: uploads, reorders, cover changes and deletes of one build run one at a time. */
async function findPhotoOf(buildId: number, photoId: number, transaction: Transaction): Promise<Photo> {
  const photo = await Photo.findOne({ where: { id: photoId, buildId }, transaction });
  if (!photo) throw new NotFoundError('No such photo in this build.');
  return photo;
}

/** Checks the budgets and re-encodes every file, one at a time; a refused file names itself. */
export async function processAll(files: PhotoFile[], uploaderId?: number): Promise<ProcessedImage[]> {
  if (files.length === 0) throw new ValidationError({ photos: 'Choose at least one photo.' });
  if (files.length > PHOTO_MAX_FILES) throw tooManyError();
  if (files.some((f) => f.buffer.length > PHOTO_MAX_BYTES)) throw tooLargeError();
  // The pixel budgets are checked from the headers, before any decoding.
  const pixels = (await Promise.all(files.map((f) => imagePixels(f.buffer)))).reduce((a, b) => a + b, 0);
  checkRequestPixels(pixels);
  if (uploaderId !== undefined) await chargePersonPixels(uploaderId, pixels);
  const processed: ProcessedImage[] = [];
  // One at a time, and in turn with every other upload to this process (imageSlots).
  for (const file of files) {
    try {
      processed.push(await imageSlots.run(() => processImage(file.buffer)));
    } catch (err) {
      if (err instanceof ImageRejectedError) throw refused(`${shownName(file.originalName)} ${err.message}.`);
      throw err;
    }
  }
  return processed;
}

export const variantFiles = (storageKey: string, image: ProcessedImage) =>
  image.variants.flatMap((v) => [
    { key: photoVariantKey(storageKey, v.width, 'webp'), body: v.webp, type: 'image/webp' },
    { key: photoVariantKey(storageKey, v.width, 'jpg'), body: v.jpeg, type: 'image/jpeg' },
  ]);

export async function deleteKeys(keys: string[]) {
  await Promise.all(keys.map((key) => storage.delete(key)));
}

/** Writes every file or none: on any failure the ones already written are removed again. */
export async function putAll(files: { key: string; body: Buffer; type: string }[]): Promise<string[]> {
  const results = await Promise.allSettled(files.map((f) => storage.put(f.key, f.body, f.type)));
  const written = files.filter((_, i) => results[i]!.status === 'fulfilled').map((f) => f.key);
  const failure = results.find((r): r is PromiseRejectedResult => r.status === 'rejected');
  if (failure) {
    await deleteKeys(written).catch((err: unknown) => logger.warn({ err }, 'photo files left behind'));
    throw failure.reason;
  }
  return written;
}

/**
 * Adds photos to a build, all or nothing: every file is checked and re-encoded first, then the
 * files are written, then the rows in one transaction (the files are removed if it fails).
 * The first photo of a build becomes its cover. Returns all of the build's photos in order.
 */
export async function storePhotosForBuild(buildId: number, files: PhotoFile[], captions: string[] = [], uploaderId?: number, outer?: Transaction): Promise<Photo[]> {
  if (captions.length > files.length) throw new ValidationError({ captions: 'There are more captions than photos.' });
  const images = await processAll(files, uploaderId);
  const prepared = images.map((image, i) => ({ image, storageKey: newPhotoStorageKey(), caption: captions[i]?.trim() ?? '' }));
  const written = await putAll(prepared.flatMap((p) => variantFiles(p.storageKey, p.image)));
  try {
    return await withTransaction(outer, async (transaction) => {
      const build = await lockBuild(buildId, transaction);
      const existing = await listPhotos(buildId, transaction);
      const hasCover = existing.some((p) => p.isCover);
      let position = existing.reduce((max, p) => Math.max(max, p.position), -1) + 1;
      for (const [i, p] of prepared.entries()) {
        await Photo.create(
          {
            buildId,
            storageKey: p.storageKey,
            caption: p.caption,
            position: position++,
            isCover: !hasCover && i === 0,
            width: p.image.width,
            height: p.image.height,
            variants: p.image.variants.map((v) => ({ width: v.width, height: v.height })),
          },
          { transaction },
        );
      }
      await touchBuild(build, transaction);
      return listPhotos(buildId, transaction);
    });
  } catch (err) {
    await deleteKeys(written).catch((cleanupErr: unknown) => logger.warn({ err: cleanupErr }, 'photo files left behind'));
    throw err;
  }
}

/** Changes a caption and/or makes the photo the build's one cover. */
export async function updatePhoto(buildId: number, photoId: number, input: { caption?: string; isCover?: true }, outer?: Transaction): Promise<Photo> {
  return withTransaction(outer, async (transaction) => {
    const build = await lockBuild(buildId, transaction);
    const photo = await findPhotoOf(buildId, photoId, transaction);
    if (input.isCover) {
      await Photo.update({ isCover: false }, { where: { buildId, isCover: true, id: { [Op.ne]: photo.id } }, transaction });
      photo.isCover = true;
    }
    if (input.caption !== undefined) photo.caption = input.caption;
    await photo.save({ transaction });
    await touchBuild(build, transaction);
    return photo;
  });
}

/** Puts the photos in the given order; the list must name each of the build's photos exactly once. */
export async function reorderPhotos(buildId: number, photoIds: number[], outer?: Transaction): Promise<Photo[]> {
  return withTransaction(outer, async (transaction) => {
    const build = await lockBuild(buildId, transaction);
    const photos = await listPhotos(buildId, transaction);
    if (new Set(photoIds).size !== photoIds.length) throw new ValidationError({ photoIds: 'Each photo may appear only once.' });
    const byId = new Map(photos.map((p) => [p.id, p]));
    if (photoIds.length !== photos.length || photoIds.some((id) => !byId.has(id))) {
      throw new ValidationError({ photoIds: `Send the ids of all ${photos.length} photos of this build, each once.` });
    }
    for (const [position, id] of photoIds.entries()) {
      const photo = byId.get(id)!;
      if (photo.position !== position) await photo.update({ position }, { transaction });
    }
    await touchBuild(build, transaction);
    return listPhotos(buildId, transaction);
  });
}

/** Deletes the photo and its files; when it was the cover, the next photo in order takes over. */
export async function deletePhoto(buildId: number, photoId: number, outer?: Transaction): Promise<void> {
  const storageKey = await withTransaction(outer, async (transaction) => {
    const build = await lockBuild(buildId, transaction);
    const photo = await findPhotoOf(buildId, photoId, transaction);
    await photo.destroy({ transaction });
    if (photo.isCover) {
      const [next] = await listPhotos(buildId, transaction);
      if (next) await next.update({ isCover: true }, { transaction });
    }
    await touchBuild(build, transaction);
    return photo.storageKey;
  });
  // Files go after the rows: a failed delete leaves an orphan file, never a photo with no file.
  await deletePhotoFiles([storageKey]).catch((err: unknown) => logger.warn({ err, storageKey }, 'photo files left behind'));
}

/** Removes every stored file of these photos (all widths, both formats). Used when a photo or a whole build goes. */
export async function deletePhotoFiles(storageKeys: string[]): Promise<void> {
  const valid = storageKeys.filter((key) => PHOTO_STORAGE_KEY.test(key));
  const keys = (await Promise.all(valid.map((key) => storage.list(photoVariantsPrefix(key))))).flat();
  await deleteKeys(keys);
}
