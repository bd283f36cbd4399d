import { Router } from 'express';
import { IdParamSchema, IdSchema } from '@shared/schemas/params';
import { JudgeClassesSchema, ScoreSubmitSchema } from '@shared/schemas/judging';
import { parseBody, parseParams } from '../middlewares/validate';
import { currentUser, requireUser } from '../middlewares/authenticate';
import { sendCompressedJson } from '../middlewares/send-compressed';
import { loadEventFor } from './load-for';
import { findEvent } from '../services/shows/events';
import { loadResultsReview } from '../services/results/results-review';
import { presentResultsReviewReply } from '../presenters/results';
import { assignJudge, listJudges } from '../services/judging/judge-assignments';
import { judgingClosedReason, setJudgingClosed, submitScores } from '../services/judging/scores';
import { listJudgingShows, loadJudgeView, loadProgress } from '../services/judging/judging';
import { presentJudge, presentJudgeView, presentProgress } from '../presenters/judging';
import { presentEventSummary } from '../presenters/event';

export const judgingRouter = Router();
judgingRouter.use(['/judging', '/events/:id/judges', '/events/:id/judging', '/events/:id/scores', '/events/:id/results'], requireUser);

const JudgeParamsSchema = IdParamSchema.extend({ judgeId: IdSchema });

/** The shows the person judges that are being judged now. */
judgingRouter.get('/judging', async (req, res) => {
  const events = await listJudgingShows(currentUser(req).id);
  res.json({ events: events.map((e) => presentEventSummary(e, ['judge'])) });
});

/** The judge's phone: their cars, the sheet, their own scores (never another judge's). */
judgingRouter.get('/events/:id/judging/mine', async (req, res) => {
  const { event } = await loadEventFor(req, 'viewOwnSheets');
  const view = await loadJudgeView(event.id, currentUser(req).id);
  res.set('Cache-Control', 'private, no-store');
  sendCompressedJson(req, res, presentJudgeView(view, judgingClosedReason(event)));
});

/** Scores and car comments from a judge's phone; idempotent per device id, newest device time wins. */
judgingRouter.post('/events/:id/scores', async (req, res) => {
  const input = parseBody(req, ScoreSubmitSchema);
  const { event } = await loadEventFor(req, 'score');
  const applied = await submitScores(event.id, currentUser(req).id, input);
  res.json({ applied });
});

judgingRouter.get('/events/:id/judges', async (req, res) => {
  const { event } = await loadEventFor(req, 'assignJudges');
  res.json({ judges: (await listJudges(event.id)).map(presentJudge) });
});

judgingRouter.put('/events/:id/judges/:judgeId/classes', async (req, res) => {
  const { id, judgeId } = parseParams(req, JudgeParamsSchema);
  const input = parseBody(req, JudgeClassesSchema);
  await loadEventFor(req, 'assignJudges');
  await assignJudge(id, judgeId, input, currentUser(req));
  res.json({ judges: (await listJudges(id)).map(presentJudge) });
});

judgingRouter.get('/events/:id/judging/progress', async (req, res) => {
  const { event } = await loadEventFor(req, 'viewProgress');
  res.json({ progress: presentProgress(await loadProgress(event.id), judgingClosedReason(event) === null) });
});

for (const [path, closed] of [['close', true], ['reopen', false]] as const) {
  judgingRouter.post(`/events/:id/judging/${path}`, async (req, res) => {
    const { event } = await loadEventFor(req, 'closeJudging');
    await setJudgingClosed(event.id, closed, currentUser(req));
    const changed = await findEvent(event.id);
    res.json({ progress: presentProgress(await loadProgress(event.id), judgingClosedReason(changed) === null) });
  });
}

/** The results as they stand, for the organiser's review before publishing (places, totals, how each tie was decided); once published, what was published. */
judgingRouter.get('/events/:id/results/review', async (req, res) => {
  const { event } = await loadEventFor(req, 'viewAllScores');
  res.set('Cache-Control', 'private, no-store').json(presentResultsReviewReply(await loadResultsReview(event)));
});
