import { Router, type Request } from 'express';
import { IdParamSchema, IdSchema } from '@shared/schemas/params';
import { JudgeClassesSchema, ScoreSubmitSchema } from '@shared/schemas/judging';
import { parseBody, parseParams } from '../middlewares/validate';
import { currentUser, requireUser } from '../middlewares/authenticate';
import { authorizeJudging, type JudgingAction } from '../policies/judging';
import { actorInEvent } from '../services/shows/event-actor';
import { findEvent, loadEventDetail } from '../services/shows/events';
import { computeShowResults, rulesOf } from '../services/results/results';
import { listTieBreaks } from '../services/results/tie-breaks';
import { presentPublishedReview, presentResultsReview, presentTieBreak } from '../presenters/results';
import { loadPublishedResults } from '../services/results/published-results';
import { assignJudge, listJudges } from '../services/judging/judge-assignments';
import { judgingClosedReason, setJudgingClosed, submitScores } from '../services/judging/scores';
import { listJudgingShows, loadJudgeView, loadProgress } from '../services/judging/judging';
import { presentJudge, presentJudgeView, presentProgress } from '../presenters/judging';
import { presentEventSummary } from '../presenters/event';

export const judgingRouter = Router();
judgingRouter.use(['/judging', '/events/:id/judges', '/events/:id/judging', '/events/:id/scores', '/events/:id/results'], requireUser);

const JudgeParamsSchema = IdParamSchema.extend({ judgeId: IdSchema });

async function authorized(req: Request, id: number, action: JudgingAction) {
  const event = await findEvent(id);
  authorizeJudging(await actorInEvent(currentUser(req), event.id), action, event);
  return event;
}

/** The shows the person judges that are being judged now. */
judgingRouter.get('/judging', async (req, res) => {
  const events = await listJudgingShows(currentUser(req).id);
  res.json({ events: events.map((e) => presentEventSummary(e, ['judge'])) });
});

/** The judge's phone: their cars, the sheet, their own scores (never another judge's). */
judgingRouter.get('/events/:id/judging/mine', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const event = await authorized(req, id, 'viewOwnSheets');
  const view = await loadJudgeView(id, currentUser(req).id);
  res.set('Cache-Control', 'private, no-store').json(presentJudgeView(view, judgingClosedReason(event)));
});

/** Scores and car comments from a judge's phone; idempotent per device id, newest device time wins. */
judgingRouter.post('/events/:id/scores', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const input = parseBody(req, ScoreSubmitSchema);
  await authorized(req, id, 'score');
  const applied = await submitScores(id, currentUser(req).id, input);
  res.json({ applied });
});

judgingRouter.get('/events/:id/judges', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  await authorized(req, id, 'assignJudges');
  res.json({ judges: (await listJudges(id)).map(presentJudge) });
});

judgingRouter.put('/events/:id/judges/:judgeId/classes', async (req, res) => {
  const { id, judgeId } = parseParams(req, JudgeParamsSchema);
  const input = parseBody(req, JudgeClassesSchema);
  await authorized(req, id, 'assignJudges');
  await assignJudge(id, judgeId, input, currentUser(req));
  res.json({ judges: (await listJudges(id)).map(presentJudge) });
});

judgingRouter.get('/events/:id/judging/progress', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const event = await authorized(req, id, 'viewProgress');
  res.json({ progress: presentProgress(await loadProgress(id), judgingClosedReason(event) === null) });
});

for (const [path, closed] of [['close', true], ['reopen', false]] as const) {
  judgingRouter.post(`/events/:id/judging/${path}`, async (req, res) => {
    const { id } = parseParams(req, IdParamSchema);
    await authorized(req, id, 'closeJudging');
    await setJudgingClosed(id, closed, currentUser(req));
    const event = await findEvent(id);
    res.json({ progress: presentProgress(await loadProgress(id), judgingClosedReason(event) === null) });
  });
}

/** The results as they stand, for the organiser's review before publishing (places, totals, how each tie was decided); once published, what was published. */
judgingRouter.get('/events/:id/results/review', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const event = await authorized(req, id, 'viewAllScores');
  const detail = await loadEventDetail(id);
  const { results, cars } = await computeShowResults(id);
  const criteria = new Map((detail.criteria ?? []).map((c) => [c.id, c.name]));
  const classNames = new Map((detail.classes ?? []).map((c) => [c.id, c.name]));
  const tieBreaks = await listTieBreaks(id);
  const published = await loadPublishedResults(id);
  res.set('Cache-Control', 'private, no-store').json({
    review: published ? presentPublishedReview(published) : presentResultsReview(results, cars, criteria, classNames),
    tieBreaks: tieBreaks.map((t) => presentTieBreak(t.row, t.by, cars)),
    rules: published ? published.rules : rulesOf(event),
    published: published !== null,
  });
});
