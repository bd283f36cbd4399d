import type { Request, Response } from 'express';
import { currentUser } from '../middlewares/authenticate';
import { loadFullBuildOrThrow } from '../services/builds/builds';
import { presentOwnerBuild } from '../presenters/build';

/** After any change, the owner's routes answer with the whole build as the editor shows it. */
export async function respondWithBuild(req: Request, res: Response, id: number, status = 200): Promise<void> {
  const build = await loadFullBuildOrThrow(id);
  res.status(status).json({ build: presentOwnerBuild(build, currentUser(req)) });
}
