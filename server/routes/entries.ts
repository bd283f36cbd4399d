import { Router } from 'express';
import { EntryCreateSchema } from '@shared/schemas/entry';
import { parseBody } from '../middlewares/validate';
import { currentUser, requireUser } from '../middlewares/authenticate';
import { hasEventRole } from '../policies/actor';
import { acceptOffer, listEntriesOf, listEntriesOfEvent, registerEntry, withdrawEntry } from '../services/entries/entries';
import { presentMyEntry, presentOrganiserEntry, presentWithdrawal } from '../presenters/event';
import { loadEntryFor, loadEventFor } from './load-for';
import { openEntryCheckout } from '../services/entries/entry-payments';

export const entriesRouter = Router();
entriesRouter.use('/entries', requireUser);

/** An owner enters a build; whether the show takes entries now is the service's rule, with the reason. */
entriesRouter.post('/events/:id/entries', requireUser, async (req, res) => {
  const input = parseBody(req, EntryCreateSchema);
  const user = currentUser(req);
  const { event } = await loadEventFor(req, 'register');
  const entry = await registerEntry(user, event.id, input);
  const mine = await listEntriesOf(user);
  res.status(201).json({ entry: presentMyEntry(mine.entries.find((e) => e.id === entry.id)!, mine.positions) });
});

entriesRouter.get('/events/:id/entries', requireUser, async (req, res) => {
  const { event } = await loadEventFor(req, 'viewEntries');
  const { entries, positions } = await listEntriesOfEvent(event.id);
  res.json({ entries: entries.map((e) => presentOrganiserEntry(e, positions)) });
});

entriesRouter.get('/entries', async (req, res) => {
  const { entries, positions } = await listEntriesOf(currentUser(req));
  res.json({ entries: entries.map((e) => presentMyEntry(e, positions)) });
});

entriesRouter.post('/entries/:id/withdraw', async (req, res) => {
  const { entry, actor } = await loadEntryFor(req, 'withdraw');
  const byOrganiser = entry.ownerId !== actor.id && hasEventRole(actor, entry.eventId, 'organiser');
  const withdrawn = await withdrawEntry(entry.id, currentUser(req), byOrganiser);
  res.json({ entry: presentWithdrawal(withdrawn) });
});

entriesRouter.post('/entries/:id/accept-offer', async (req, res) => {
  const { entry } = await loadEntryFor(req, 'acceptOffer');
  await acceptOffer(entry.id, currentUser(req));
  const mine = await listEntriesOf(currentUser(req));
  res.json({ entry: presentMyEntry(mine.entries.find((e) => e.id === entry.id)!, mine.positions) });
});

/** The entrant pays the fee online: the answer is where the payment service takes the payment. */
entriesRouter.post('/entries/:id/checkout', async (req, res) => {
  const { entry } = await loadEntryFor(req, 'pay');
  const { url } = await openEntryCheckout(entry.id);
  res.json({ url });
});
