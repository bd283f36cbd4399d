import { Router } from 'express';
import { CardPrintLatestQuerySchema, CardPrintParamsSchema, CardPrintStartSchema } from '@shared/schemas/card-print';
import { parseBody, parseParams, parseQuery } from '../middlewares/validate';
import { currentUser, requireUser } from '../middlewares/authenticate';
import { cardRenderLimiter } from '../middlewares/rate-limits';
import { cardPrintFile, findCardPrint, latestCardPrint, startCardPrint } from '../services/show-day/card-prints';
import { entryCardBuild, entryCardFileName, entryCardShow, renderEntryCard } from '../services/entries/entry-card';
import { queueShowReminders } from '../services/show-day/show-reminders';
import { presentCardPrint } from '../presenters/card-print';
import { presentPublicBuild } from '../presenters/public-build';
import { loadEntryFor, loadEventFor } from './load-for';

/** Numbered cards in bulk for the organiser, the owner's card of one entry, and the show reminder that attaches it. */
export const cardPrintsRouter = Router();

/** Starts a print (202), or answers the one already running for this show and filter (200). */
cardPrintsRouter.post('/events/:id/card-prints', requireUser, async (req, res) => {
  const { classId } = parseBody(req, CardPrintStartSchema);
  const { event } = await loadEventFor(req, 'printCards');
  const { print, created } = await startCardPrint(event, classId ?? null, currentUser(req));
  res.status(created ? 202 : 200).json({ print: presentCardPrint(print) });
});

/** The newest print for the filter: what the page shows after a reload, or to a second organiser. */
cardPrintsRouter.get('/events/:id/card-prints/latest', requireUser, async (req, res) => {
  const { classId } = parseQuery(req, CardPrintLatestQuerySchema);
  const { event } = await loadEventFor(req, 'printCards');
  const print = await latestCardPrint(event.id, classId ?? null);
  res.set('Cache-Control', 'private, no-store').json({ print: print ? presentCardPrint(print) : null });
});

cardPrintsRouter.get('/events/:id/card-prints/:printId', requireUser, async (req, res) => {
  const { id, printId } = parseParams(req, CardPrintParamsSchema);
  await loadEventFor(req, 'printCards');
  res.set('Cache-Control', 'private, no-store').json({ print: presentCardPrint(await findCardPrint(id, printId)) });
});

cardPrintsRouter.get('/events/:id/card-prints/:printId/cards.pdf', requireUser, async (req, res) => {
  const { id, printId } = parseParams(req, CardPrintParamsSchema);
  const { event } = await loadEventFor(req, 'printCards');
  const print = await findCardPrint(id, printId);
  const file = await cardPrintFile(print);
  const which = print.eventClass ? `-${print.eventClass.id}` : '';
  res.set('Content-Type', 'application/pdf');
  res.set('Content-Length', String(file.size));
  res.set('Content-Disposition', `attachment; filename="${event.slug}-numbered-cards${which}.pdf"`);
  res.set('Cache-Control', 'private, no-store');
  file.body.pipe(res);
});

/** Queues the show reminder with each confirmed entrant's card attached (202: the job renders and sends). */
cardPrintsRouter.post('/events/:id/reminders', requireUser, async (req, res) => {
  const { event } = await loadEventFor(req, 'manage');
  const { entrants } = await queueShowReminders(event);
  res.status(202).json({ entrants });
});

/** The owner's card for one entry: their own design carrying the show, class and entry number. */
cardPrintsRouter.get('/entries/:id/card.pdf', requireUser, cardRenderLimiter, async (req, res) => {
  const { entry } = await loadEntryFor(req, 'view');
  const show = await entryCardShow(entry);
  const build = await entryCardBuild(entry);
  // Drawn from the public face only, so nothing private reaches the paper.
  const pdf = await renderEntryCard(build, presentPublicBuild(build), show);
  res
    .type('application/pdf')
    .set('Content-Disposition', `attachment; filename="${entryCardFileName(build.code, entry.number!)}"`)
    .set('Cache-Control', 'private, no-store')
    .send(pdf);
});
