import { Router } from 'express';
import { IdParamSchema, IdSchema } from '@shared/schemas/params';
import { CertificateQuerySchema, PaperQuerySchema, ResultRulesUpdateSchema, TieBreakCreateSchema } from '@shared/schemas/results';
import { parseBody, parseParams, parseQuery } from '../middlewares/validate';
import { currentUser, requireUser } from '../middlewares/authenticate';
import { cardRenderLimiter } from '../middlewares/rate-limits';
import { loadEntryFor, loadEventFor } from './load-for';
import { ConflictError } from '../errors';
import { rulesOf } from '../services/results/results';
import { updateResultRules } from '../services/results/result-rules';
import { addTieBreak, removeTieBreak } from '../services/results/tie-breaks';
import { loadPublishedResults } from '../services/results/published-results';
import { loadOwnResults } from '../services/results/own-results';
import { awardsOf } from '../services/results/awards';
import { readOutOf } from '../services/results/read-out';
import { renderCertificates, renderResultsSheet } from '../services/results/result-pdfs';
import { scoresCsv } from '../services/judging/score-export';
import { presentAward, presentNewTieBreak, presentOwnResults, presentReadOut } from '../presenters/results';

export const resultsRouter = Router();
resultsRouter.use(['/events/:id/results', '/entries/:id/results'], requireUser);

const TieBreakParamsSchema = IdParamSchema.extend({ tieBreakId: IdSchema });

async function published(eventId: number) {
  const snapshot = await loadPublishedResults(eventId);
  if (!snapshot) throw new ConflictError('The results are not published yet.');
  return snapshot;
}

resultsRouter.get('/events/:id/results/rules', async (req, res) => {
  const { event } = await loadEventFor(req, 'manageResults');
  res.json({ rules: rulesOf(event) });
});

resultsRouter.put('/events/:id/results/rules', async (req, res) => {
  const input = parseBody(req, ResultRulesUpdateSchema);
  const { event } = await loadEventFor(req, 'manageResults');
  res.json({ rules: await updateResultRules(event.id, currentUser(req), input) });
});

/** The organiser orders a tie the rules left shared, with a reason; an audit line records it. */
resultsRouter.post('/events/:id/results/tie-breaks', async (req, res) => {
  const input = parseBody(req, TieBreakCreateSchema);
  const { event } = await loadEventFor(req, 'manageResults');
  const row = await addTieBreak(event.id, currentUser(req), input);
  res.status(201).json({ tieBreak: presentNewTieBreak(row) });
});

resultsRouter.delete('/events/:id/results/tie-breaks/:tieBreakId', async (req, res) => {
  const { id, tieBreakId } = parseParams(req, TieBreakParamsSchema);
  await loadEventFor(req, 'manageResults');
  await removeTieBreak(id, tieBreakId, currentUser(req));
  res.status(204).end();
});

/** The awards of published results, for the organiser to print one certificate or all. */
resultsRouter.get('/events/:id/results/awards', async (req, res) => {
  const { event } = await loadEventFor(req, 'manageResults');
  res.json({ awards: awardsOf(await published(event.id)).map(presentAward) });
});

/** The announcer's read-out: each class third to first, then best of show and people's choice. */
resultsRouter.get('/events/:id/results/read-out', async (req, res) => {
  const { event } = await loadEventFor(req, 'manageResults');
  res.set('Cache-Control', 'private, no-store').json({ readOut: presentReadOut(event.name, readOutOf(await published(event.id))) });
});

resultsRouter.get('/events/:id/results/scores.csv', async (req, res) => {
  const { event } = await loadEventFor(req, 'manageResults');
  res.set({ 'Content-Type': 'text/csv; charset=utf-8', 'Content-Disposition': `attachment; filename="${event.slug}-scores.csv"`, 'Cache-Control': 'private, no-store' });
  res.send(await scoresCsv(event.id));
});

resultsRouter.get('/events/:id/results/sheet.pdf', cardRenderLimiter, async (req, res) => {
  const { paper } = parseQuery(req, PaperQuerySchema);
  const { event } = await loadEventFor(req, 'manageResults');
  const chosen = paper ?? rulesOf(event).printPaper;
  const pdf = await renderResultsSheet(event, await published(event.id), chosen);
  res.type('application/pdf').set({ 'Content-Disposition': `attachment; filename="${event.slug}-results-${chosen}.pdf"`, 'Cache-Control': 'private, no-store' }).send(pdf);
});

resultsRouter.get('/events/:id/results/certificates.pdf', cardRenderLimiter, async (req, res) => {
  const { paper, award } = parseQuery(req, CertificateQuerySchema);
  const { event } = await loadEventFor(req, 'manageResults');
  const chosen = paper ?? rulesOf(event).printPaper;
  const pdf = await renderCertificates(event, await published(event.id), chosen, award);
  const name = award ? award.replace(/:/g, '-') : 'all';
  res.type('application/pdf').set({ 'Content-Disposition': `attachment; filename="${event.slug}-certificates-${name}-${chosen}.pdf"`, 'Cache-Control': 'private, no-store' }).send(pdf);
});

/** A car's own scores for its owner: nothing before the results are published. */
resultsRouter.get('/entries/:id/results', async (req, res) => {
  const { entry } = await loadEntryFor(req, 'viewOwnResults');
  res.set('Cache-Control', 'private, no-store').json({ results: presentOwnResults(await loadOwnResults(entry)) });
});
