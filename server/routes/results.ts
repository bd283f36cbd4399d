import { Router, type Request } from 'express';
import { IdParamSchema, IdSchema } from '@shared/schemas/params';
import { CertificateQuerySchema, PaperQuerySchema, ResultRulesUpdateSchema, TieBreakCreateSchema } from '@shared/schemas/results';
import { parseBody, parseParams, parseQuery } from '../middlewares/validate';
import { currentUser, requireUser } from '../middlewares/authenticate';
import { cardRenderLimiter } from '../middlewares/rate-limits';
import { authorizeResults, type ResultsAction } from '../policies/results';
import { ConflictError } from '../errors';
import { actorInEvent } from '../services/shows/event-actor';
import { findEvent } from '../services/shows/events';
import { findEntry } from '../services/entries/entries';
import { rulesOf } from '../services/results/results';
import { updateResultRules } from '../services/results/result-rules';
import { addTieBreak, removeTieBreak } from '../services/results/tie-breaks';
import { loadPublishedResults } from '../services/results/published-results';
import { loadOwnResults } from '../services/results/own-results';
import { awardsOf } from '../services/results/awards';
import { renderCertificates, renderResultsSheet } from '../services/results/result-pdfs';
import { scoresCsv } from '../services/judging/score-export';
import { presentAward } from '../presenters/results';

export const resultsRouter = Router();
resultsRouter.use(['/events/:id/results', '/entries/:id/results'], requireUser);

const TieBreakParamsSchema = IdParamSchema.extend({ tieBreakId: IdSchema });

async function authorized(req: Request, id: number, action: ResultsAction) {
  const event = await findEvent(id);
  authorizeResults(await actorInEvent(currentUser(req), event.id), action, { eventId: event.id });
  return event;
}

async function published(eventId: number) {
  const snapshot = await loadPublishedResults(eventId);
  if (!snapshot) throw new ConflictError('The results are not published yet.');
  return snapshot;
}

resultsRouter.get('/events/:id/results/rules', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const event = await authorized(req, id, 'manageResults');
  res.json({ rules: rulesOf(event) });
});

resultsRouter.put('/events/:id/results/rules', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const input = parseBody(req, ResultRulesUpdateSchema);
  await authorized(req, id, 'manageResults');
  res.json({ rules: await updateResultRules(id, currentUser(req), input) });
});

/** The organiser orders a tie the rules left shared, with a reason; an audit line records it. */
resultsRouter.post('/events/:id/results/tie-breaks', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const input = parseBody(req, TieBreakCreateSchema);
  await authorized(req, id, 'manageResults');
  const row = await addTieBreak(id, currentUser(req), input);
  res.status(201).json({ tieBreak: { id: row.id, entryIds: row.entryIds, reason: row.reason } });
});

resultsRouter.delete('/events/:id/results/tie-breaks/:tieBreakId', async (req, res) => {
  const { id, tieBreakId } = parseParams(req, TieBreakParamsSchema);
  await authorized(req, id, 'manageResults');
  await removeTieBreak(id, tieBreakId, currentUser(req));
  res.status(204).end();
});

/** The awards of published results, for the organiser to print one certificate or all. */
resultsRouter.get('/events/:id/results/awards', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  await authorized(req, id, 'manageResults');
  res.json({ awards: awardsOf(await published(id)).map(presentAward) });
});

resultsRouter.get('/events/:id/results/scores.csv', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const event = await authorized(req, id, 'manageResults');
  res.set({ 'Content-Type': 'text/csv; charset=utf-8', 'Content-Disposition': `attachment; filename="${event.slug}-scores.csv"`, 'Cache-Control': 'private, no-store' });
  res.send(await scoresCsv(id));
});

resultsRouter.get('/events/:id/results/sheet.pdf', cardRenderLimiter, async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const { paper } = parseQuery(req, PaperQuerySchema);
  const event = await authorized(req, id, 'manageResults');
  const chosen = paper ?? rulesOf(event).printPaper;
  const pdf = await renderResultsSheet(event, await published(id), chosen);
  res.type('application/pdf').set({ 'Content-Disposition': `attachment; filename="${event.slug}-results-${chosen}.pdf"`, 'Cache-Control': 'private, no-store' }).send(pdf);
});

resultsRouter.get('/events/:id/results/certificates.pdf', cardRenderLimiter, async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const { paper, award } = parseQuery(req, CertificateQuerySchema);
  const event = await authorized(req, id, 'manageResults');
  const chosen = paper ?? rulesOf(event).printPaper;
  const pdf = await renderCertificates(event, await published(id), chosen, award);
  const name = award ? award.replace(/:/g, '-') : 'all';
  res.type('application/pdf').set({ 'Content-Disposition': `attachment; filename="${event.slug}-certificates-${name}-${chosen}.pdf"`, 'Cache-Control': 'private, no-store' }).send(pdf);
});

/** A car's own scores for its owner: nothing before the results are published. */
resultsRouter.get('/entries/:id/results', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const entry = await findEntry(id);
  authorizeResults(await actorInEvent(currentUser(req), entry.eventId), 'viewOwnResults', { eventId: entry.eventId, ownerId: entry.ownerId });
  res.set('Cache-Control', 'private, no-store').json({ results: await loadOwnResults(entry) });
});
