import { Router, type Request } from 'express';
import { IdParamSchema } from '@shared/schemas/params';
import { VoidAddressSchema } from '@shared/schemas/peoples-choice';
import { parseBody, parseParams } from '../middlewares/validate';
import { currentUser, requireUser } from '../middlewares/authenticate';
import { authorizePeoplesChoice } from '../policies/peoples-choice';
import { actorInEvent } from '../services/shows/event-actor';
import { findEvent } from '../services/shows/events';
import { loadPeoplesChoice, setVotingWindow, voidVotesOfAddress } from '../services/results/peoples-choice';
import { presentPeoplesChoice } from '../presenters/peoples-choice';

/** The organiser's side of people's choice; visitors vote on the public build page (`pages/vote-router.ts`). */
export const peoplesChoiceRouter = Router();
peoplesChoiceRouter.use('/events/:id/peoples-choice', requireUser);

async function authorized(req: Request, id: number) {
  const event = await findEvent(id);
  authorizePeoplesChoice(await actorInEvent(currentUser(req), event.id), 'manage', event);
}

const respond = async (res: import('express').Response, id: number, extra: object = {}) =>
  res.json({ peoplesChoice: presentPeoplesChoice(await loadPeoplesChoice(id)), ...extra });

peoplesChoiceRouter.get('/events/:id/peoples-choice', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  await authorized(req, id);
  await respond(res, id);
});

for (const [path, open] of [['open', true], ['close', false]] as const) {
  peoplesChoiceRouter.post(`/events/:id/peoples-choice/${path}`, async (req, res) => {
    const { id } = parseParams(req, IdParamSchema);
    await authorized(req, id);
    await setVotingWindow(id, open, currentUser(req));
    await respond(res, id);
  });
}

/** Voids every counted vote from one address (named by its hash from the tally). */
peoplesChoiceRouter.post('/events/:id/peoples-choice/void', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const { addressHash } = parseBody(req, VoidAddressSchema);
  await authorized(req, id);
  const voided = await voidVotesOfAddress(id, addressHash, currentUser(req));
  await respond(res, id, { voided });
});
