import { Router, type Request, type Response } from 'express';
import multer from 'multer';
import { PHOTO_MAX_BYTES } from '@shared/schemas/build';
import { photoUploadLimiter } from '../middlewares/rate-limits';
import { currentUser, requireUser } from '../middlewares/authenticate';
import { removeEventLogo, setEventLogo, tooLargeError } from '../services/shows/event-logo';
import { AppError, ValidationError } from '../errors';
import { loadEventFor } from './load-for';
import { respondWithEvent } from './respond-with-event';

export const eventLogoRouter = Router();
/** Takes multipart, like the build photo upload (see jsonBodiesOnly in app.ts). */
export const EVENT_LOGO_PATH = /^\/events\/[^/]+\/logo\/?$/;

const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: PHOTO_MAX_BYTES, files: 1, fields: 2, parts: 3 } }).single('logo');

function receiveLogo(req: Request, res: Response): Promise<Express.Multer.File | undefined> {
  return new Promise((resolve, reject) =>
    upload(req, res, (err?: unknown) => {
      if (!err) return resolve(req.file);
      if (err instanceof multer.MulterError && err.code === 'LIMIT_FILE_SIZE') return reject(tooLargeError());
      if (err instanceof multer.MulterError) return reject(new ValidationError({ logo: 'Send one image in the field "logo".' }));
      reject(new AppError(400, 'BAD_REQUEST', 'The upload could not be read. Please try again.', { logo: 'The upload could not be read.' }));
    }),
  );
}

/** The organisers of the show set its logo; the file is read only after they are known to be allowed. */
eventLogoRouter.post('/events/:id/logo', requireUser, photoUploadLimiter, async (req, res) => {
  const { event } = await loadEventFor(req, 'manage');
  const file = await receiveLogo(req, res);
  if (!file) throw new ValidationError({ logo: 'Choose an image for the logo.' });
  await setEventLogo(event.id, { buffer: file.buffer, originalName: file.originalname }, currentUser(req).id);
  await respondWithEvent(req, res, event.id);
});

eventLogoRouter.delete('/events/:id/logo', requireUser, async (req, res) => {
  const { event } = await loadEventFor(req, 'manage');
  await removeEventLogo(event.id, currentUser(req).id);
  await respondWithEvent(req, res, event.id);
});
