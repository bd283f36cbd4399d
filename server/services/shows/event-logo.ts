import type { Transaction } from 'sequelize';
import { withTransaction } from '../../db/transaction';
import { AppError, NotFoundError } from '../../errors';
import { logger } from '../../logger';
import { Event, type EventLogo } from '../../models/event';
import { newPhotoStorageKey, photoVariantKey } from '../../storage/keys';
import { writeAudit } from '../audit/audit';
import { deleteKeys, processAll, putAll, variantFiles, type PhotoFile } from '../media/photos';

export { tooLargeError } from '../media/photos';

/** A logo is small on every page: widths above this are not kept. */
const LOGO_MAX_WIDTH = 640;

const filesOf = (logo: EventLogo) => logo.variants.flatMap((v) => (['webp', 'jpg'] as const).map((ext) => photoVariantKey(logo.storageKey, v.width, ext)));

/**
 * Through the photo pipeline (type sniffed, pixel budgets, metadata stripped, WebP and JPEG in
 * several widths); the files are written first, the show row points at them in a transaction, and
 * the old logo's files go once that has committed.
 */
export async function setEventLogo(eventId: number, file: PhotoFile, uploaderId: number, outer?: Transaction): Promise<Event> {
  const [image] = await processAll([file], uploaderId).catch((err: unknown) => {
    // The photo pipeline names its own field; here the form's field is the logo.
    if (err instanceof AppError && err.fields?.photos) throw new AppError(err.status, err.code, 'The logo was refused.', { logo: err.fields.photos });
    throw err;
  });
  const kept = { ...image!, variants: image!.variants.filter((v, i) => i === 0 || v.width <= LOGO_MAX_WIDTH) };
  const logo: EventLogo = { storageKey: newPhotoStorageKey(), variants: kept.variants.map((v) => ({ width: v.width, height: v.height })) };
  const written = await putAll(variantFiles(logo.storageKey, kept));
  let previous: EventLogo | null = null;
  try {
    const event = await withTransaction(outer, async (transaction) => {
      const found = await Event.findByPk(eventId, { lock: transaction.LOCK.UPDATE, transaction });
      if (!found) throw new NotFoundError('No such show.');
      previous = found.logo ?? null;
      await found.update({ logo }, { transaction });
      await writeAudit({ eventId, entryId: null, actorId: uploaderId, action: 'logo_changed', before: previous ? { logo: previous.storageKey } : null, after: { logo: logo.storageKey } }, transaction);
      return found;
    });
    if (previous) await deleteKeys(filesOf(previous)).catch((err: unknown) => logger.warn({ err }, 'old logo files left behind'));
    return event;
  } catch (err) {
    await deleteKeys(written).catch((cleanupErr: unknown) => logger.warn({ err: cleanupErr }, 'logo files left behind'));
    throw err;
  }
}

export async function removeEventLogo(eventId: number, actorId: number, outer?: Transaction): Promise<Event> {
  let previous: EventLogo | null = null;
  const event = await withTransaction(outer, async (transaction) => {
    const found = await Event.findByPk(eventId, { lock: transaction.LOCK.UPDATE, transaction });
    if (!found) throw new NotFoundError('No such show.');
    previous = found.logo ?? null;
    if (!previous) return found;
    await found.update({ logo: null }, { transaction });
    await writeAudit({ eventId, entryId: null, actorId, action: 'logo_removed', before: { logo: previous.storageKey }, after: null }, transaction);
    return found;
  });
  if (previous) await deleteKeys(filesOf(previous)).catch((err: unknown) => logger.warn({ err }, 'old logo files left behind'));
  return event;
}
