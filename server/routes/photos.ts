import { Router, type RequestHandler, type Response } from 'express';
import multer from 'multer';
import { z } from 'zod';
import { PHOTO_MAX_BYTES, PHOTO_MAX_FILES, PhotoOrderSchema, PhotoUpdateSchema } from '@shared/schemas/build';
import { shortText } from '@shared/schemas/figure';
import { IdParamSchema, IdSchema } from '@shared/schemas/params';
import { validate } from '../middlewares/validate';
import { photoUploadLimiter } from '../middlewares/rate-limits';
import { currentUser, requireUser } from '../middlewares/authenticate';
import { authorizeBuild } from '../policies/build';
import { findBuild } from '../services/builds';
import { deletePhoto, reorderPhotos, storePhotosForBuild, tooLargeError, tooManyError, updatePhoto } from '../services/photos';
import { presentPhoto } from '../presenters/photo';
import { AppError, ValidationError } from '../errors';
import type { Build } from '../models/build';

export const photosRouter = Router();
/** The one route that takes multipart (see jsonBodiesOnly in app.ts). */
export const PHOTO_UPLOAD_PATH = /^\/builds\/[^/]+\/photos\/?$/;

const PhotoParamsSchema = IdParamSchema.extend({ photoId: IdSchema });
const caption = shortText('Caption', 300);
/** The text fields sent beside the files: `captions`, one per photo in the same order (repeat the field). */
const PhotoUploadFieldsSchema = z.object({
  captions: z.preprocess(
    (c) => (c === undefined ? [] : Array.isArray(c) ? c : [c]),
    z.array(caption).max(PHOTO_MAX_FILES, { error: `At most ${PHOTO_MAX_FILES} captions.` }),
  ),
});

const upload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: PHOTO_MAX_BYTES, files: PHOTO_MAX_FILES, fields: PHOTO_MAX_FILES + 4, fieldSize: 4096, parts: 2 * PHOTO_MAX_FILES + 4 },
}).array('photos', PHOTO_MAX_FILES);

/** Multer's errors in our error shape, naming the `photos` field. */
function uploadError(err: unknown): AppError {
  if (err instanceof multer.MulterError) {
    if (err.code === 'LIMIT_FILE_SIZE') return tooLargeError();
    if (err.code === 'LIMIT_FILE_COUNT' || (err.code === 'LIMIT_UNEXPECTED_FILE' && err.field === 'photos')) return tooManyError();
    if (err.code === 'LIMIT_UNEXPECTED_FILE') return new ValidationError({ [err.field ?? 'photos']: 'Send the photos in the field "photos".' });
    return new ValidationError({ [err.field ?? 'photos']: `The upload was refused: ${err.message}.` });
  }
  return new AppError(400, 'BAD_REQUEST', 'The upload could not be read. Please try again.', { photos: 'The upload could not be read.' });
}

const receivePhotos: RequestHandler = (req, res, next) => upload(req, res, (err?: unknown) => next(err ? uploadError(err) : undefined));

/** Loads the build and checks the signed-in person may edit it, before any upload is read. */
const loadEditableBuild: RequestHandler = async (req, res, next) => {
  const build = await findBuild((res.locals.params as { id: number }).id);
  authorizeBuild(currentUser(req), 'edit', build);
  res.locals.build = build;
  next();
};

const buildOf = (res: Response) => res.locals.build as Build;
const photoIdOf = (res: Response) => (res.locals.params as { photoId: number }).photoId;

photosRouter.post('/builds/:id/photos', requireUser, photoUploadLimiter, validate('params', IdParamSchema), loadEditableBuild, receivePhotos, validate('body', PhotoUploadFieldsSchema), async (req, res) => {
  const files = ((req.files as Express.Multer.File[] | undefined) ?? []).map((f) => ({ buffer: f.buffer, originalName: f.originalname }));
  const { captions } = res.locals.body as z.infer<typeof PhotoUploadFieldsSchema>;
  const photos = await storePhotosForBuild(buildOf(res).id, files, captions, currentUser(req).id);
  res.status(201).json({ photos: photos.map(presentPhoto) });
});

photosRouter.put('/builds/:id/photos/order', requireUser, validate('params', IdParamSchema), validate('body', PhotoOrderSchema), loadEditableBuild, async (_req, res) => {
  const photos = await reorderPhotos(buildOf(res).id, (res.locals.body as z.infer<typeof PhotoOrderSchema>).photoIds);
  res.json({ photos: photos.map(presentPhoto) });
});

photosRouter.patch('/builds/:id/photos/:photoId', requireUser, validate('params', PhotoParamsSchema), validate('body', PhotoUpdateSchema), loadEditableBuild, async (_req, res) => {
  const photo = await updatePhoto(buildOf(res).id, photoIdOf(res), res.locals.body as z.infer<typeof PhotoUpdateSchema>);
  res.json({ photo: presentPhoto(photo) });
});

photosRouter.delete('/builds/:id/photos/:photoId', requireUser, validate('params', PhotoParamsSchema), loadEditableBuild, async (_req, res) => {
  await deletePhoto(buildOf(res).id, photoIdOf(res));
  res.status(204).end();
});
