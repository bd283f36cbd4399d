import { Router, type Request, type Response } from 'express';
import multer from 'multer';
import { z } from 'zod';
import { PHOTO_MAX_BYTES, PHOTO_MAX_FILES, PhotoOrderSchema, PhotoUpdateSchema } from '@shared/schemas/build';
import { shortText } from '@shared/schemas/figure';
import { IdParamSchema, IdSchema } from '@shared/schemas/params';
import { parseBody, parseParams } from '../middlewares/validate';
import { photoUploadLimiter } from '../middlewares/rate-limits';
import { currentUser, requireUser } from '../middlewares/authenticate';
import { authorizeBuild } from '../policies/build';
import { findBuild } from '../services/builds/builds';
import { deletePhoto, reorderPhotos, storePhotosForBuild, tooLargeError, tooManyError, updatePhoto } from '../services/media/photos';
import { presentPhoto } from '../presenters/photo';
import { AppError, ValidationError } from '../errors';

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

/** Reads the multipart upload into memory; called after the build is loaded and authorized, so a stranger's upload is never read. */
function receivePhotos(req: Request, res: Response): Promise<Express.Multer.File[]> {
  return new Promise((resolve, reject) =>
    upload(req, res, (err?: unknown) => (err ? reject(uploadError(err)) : resolve((req.files as Express.Multer.File[] | undefined) ?? []))),
  );
}

/** Loads the build and checks the signed-in person may edit it. */
async function editableBuild(req: Request, id: number) {
  const build = await findBuild(id);
  authorizeBuild(currentUser(req), 'edit', build);
  return build;
}

photosRouter.post('/builds/:id/photos', requireUser, photoUploadLimiter, async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const build = await editableBuild(req, id);
  const files = (await receivePhotos(req, res)).map((f) => ({ buffer: f.buffer, originalName: f.originalname }));
  const { captions } = parseBody(req, PhotoUploadFieldsSchema);
  const photos = await storePhotosForBuild(build.id, files, captions, currentUser(req).id);
  res.status(201).json({ photos: photos.map(presentPhoto) });
});

photosRouter.put('/builds/:id/photos/order', requireUser, async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const { photoIds } = parseBody(req, PhotoOrderSchema);
  const build = await editableBuild(req, id);
  const photos = await reorderPhotos(build.id, photoIds);
  res.json({ photos: photos.map(presentPhoto) });
});

photosRouter.patch('/builds/:id/photos/:photoId', requireUser, async (req, res) => {
  const { id, photoId } = parseParams(req, PhotoParamsSchema);
  const input = parseBody(req, PhotoUpdateSchema);
  const build = await editableBuild(req, id);
  const photo = await updatePhoto(build.id, photoId, input);
  res.json({ photo: presentPhoto(photo) });
});

photosRouter.delete('/builds/:id/photos/:photoId', requireUser, async (req, res) => {
  const { id, photoId } = parseParams(req, PhotoParamsSchema);
  const build = await editableBuild(req, id);
  await deletePhoto(build.id, photoId);
  res.status(204).end();
});
