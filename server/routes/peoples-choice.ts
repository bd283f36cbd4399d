import { Router } from 'express';
import { VoidAddressSchema, VoidBurstSchema } from '@shared/schemas/peoples-choice';
import { parseBody } from '../middlewares/validate';
import { currentUser, requireUser } from '../middlewares/authenticate';
import { loadEventFor } from './load-for';
import { loadPeoplesChoice, setVotingWindow, voidVoteBurst, voidVotesOfAddress } from '../services/results/peoples-choice';
import { presentPeoplesChoice } from '../presenters/peoples-choice';

/** The organiser's side of people's choice; visitors vote on the public build page (`pages/vote-router.ts`). */
export const peoplesChoiceRouter = Router();
peoplesChoiceRouter.use('/events/:id/peoples-choice', requireUser);

const respond = async (res: import('express').Response, id: number, extra: object = {}) =>
  res.json({ peoplesChoice: presentPeoplesChoice(await loadPeoplesChoice(id)), ...extra });

peoplesChoiceRouter.get('/events/:id/peoples-choice', async (req, res) => {
  const { event } = await loadEventFor(req, 'managePeoplesChoice');
  await respond(res, event.id);
});

for (const [path, open] of [['open', true], ['close', false]] as const) {
  peoplesChoiceRouter.post(`/events/:id/peoples-choice/${path}`, async (req, res) => {
    const { event } = await loadEventFor(req, 'managePeoplesChoice');
    await setVotingWindow(event.id, open, currentUser(req));
    await respond(res, event.id);
  });
}

/** Voids every counted vote from one address (named by its hash from the tally). */
peoplesChoiceRouter.post('/events/:id/peoples-choice/void', async (req, res) => {
  const { addressHash } = parseBody(req, VoidAddressSchema);
  const { event } = await loadEventFor(req, 'managePeoplesChoice');
  const voided = await voidVotesOfAddress(event.id, addressHash, currentUser(req));
  await respond(res, event.id, { voided });
});

/** Voids one burst of new voters from one address (named by the hash and the times from the list); the address's other votes keep counting. */
peoplesChoiceRouter.post('/events/:id/peoples-choice/void-burst', async (req, res) => {
  const burst = parseBody(req, VoidBurstSchema);
  const { event } = await loadEventFor(req, 'managePeoplesChoice');
  const voided = await voidVoteBurst(event.id, { addressHash: burst.addressHash, from: new Date(burst.from), to: new Date(burst.to) }, currentUser(req));
  await respond(res, event.id, { voided });
});
