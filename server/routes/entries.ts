import { Router } from 'express';
import { EntryCreateSchema } from '@shared/schemas/entry';
import { IdParamSchema } from '@shared/schemas/params';
import { parseBody, parseParams } from '../middlewares/validate';
import { currentUser, requireUser } from '../middlewares/authenticate';
import { authorizeEntry, authorizeEvent } from '../policies/event';
import { hasEventRole } from '../policies/actor';
import { actorInEvent } from '../services/shows/event-actor';
import { findEvent } from '../services/shows/events';
import { acceptOffer, findEntry, listEntriesOf, listEntriesOfEvent, registerEntry, withdrawEntry } from '../services/entries/entries';
import { presentMyEntry, presentOrganiserEntry } from '../presenters/event';
import { authorizedEvent } from './events';
import { openEntryCheckout } from '../services/entries/entry-payments';

export const entriesRouter = Router();
entriesRouter.use('/entries', requireUser);

/** An owner enters a build; whether the show takes entries now is the service's rule, with the reason. */
entriesRouter.post('/events/:id/entries', requireUser, async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const input = parseBody(req, EntryCreateSchema);
  const user = currentUser(req);
  const event = await findEvent(id);
  authorizeEvent(user, 'register', event);
  const entry = await registerEntry(user, id, input);
  const mine = await listEntriesOf(user);
  res.status(201).json({ entry: presentMyEntry(mine.entries.find((e) => e.id === entry.id)!, mine.positions) });
});

entriesRouter.get('/events/:id/entries', requireUser, async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  await authorizedEvent(req, id, 'viewEntries');
  const { entries, positions } = await listEntriesOfEvent(id);
  res.json({ entries: entries.map((e) => presentOrganiserEntry(e, positions)) });
});

entriesRouter.get('/entries', async (req, res) => {
  const { entries, positions } = await listEntriesOf(currentUser(req));
  res.json({ entries: entries.map((e) => presentMyEntry(e, positions)) });
});

entriesRouter.post('/entries/:id/withdraw', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const entry = await findEntry(id);
  const actor = await actorInEvent(currentUser(req), entry.eventId);
  authorizeEntry(actor, 'withdraw', entry);
  const byOrganiser = entry.ownerId !== actor!.id && hasEventRole(actor, entry.eventId, 'organiser');
  const withdrawn = await withdrawEntry(id, currentUser(req), byOrganiser);
  res.json({ entry: { id: withdrawn.id, status: withdrawn.status, refundDue: withdrawn.refundDue, currency: withdrawn.currency } });
});

entriesRouter.post('/entries/:id/accept-offer', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const entry = await findEntry(id);
  const actor = await actorInEvent(currentUser(req), entry.eventId);
  authorizeEntry(actor, 'acceptOffer', entry);
  await acceptOffer(id, currentUser(req));
  const mine = await listEntriesOf(currentUser(req));
  res.json({ entry: presentMyEntry(mine.entries.find((e) => e.id === id)!, mine.positions) });
});

/** The entrant pays the fee online: the answer is where the payment service takes the payment. */
entriesRouter.post('/entries/:id/checkout', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const entry = await findEntry(id);
  const actor = await actorInEvent(currentUser(req), entry.eventId);
  authorizeEntry(actor, 'pay', entry);
  res.json(await openEntryCheckout(id));
});
