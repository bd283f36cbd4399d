import express, { Router, type ErrorRequestHandler, type Response } from 'express';
import { QUESTION_HONEYPOT, VisitorQuestionSchema } from '@shared/schemas/build-questions';
import { questionLimiter } from '../middlewares/rate-limits';
import { readForm } from '../middlewares/validate';
import { loadPublicBuild } from '../services/public/public-builds';
import { loadAllPublicPosts, loadFeedPosts } from '../services/public/public-build-log';
import { receiveVisitorQuestion } from '../services/builds/build-questions';
import { presentPublicLogPost } from '../presenters/build-log';
import { presentPublicBuild } from '../presenters/public-build';
import { NOT_FOUND_HTML } from './public-build-page';
import { renderLogPage, renderQuestionOutcome, type QuestionOutcome } from './build-log-pages';
import { buildLogFeed } from './build-log-feed';
import { sendHtml } from './send-html';
import { publicDbWork } from '../services/platform/public-db-budget';

/** The build over time, public side: the "all posts" page, the Atom feed, and a visitor's question (a plain form post). */
export const buildLogPagesRouter = Router();

const codeOf = (raw: unknown) => String(raw).toUpperCase();
const PUBLIC_CACHE = 'public, max-age=30, stale-while-revalidate=300';

function notFound(res: Response) {
  res.status(404).type('html').set('Cache-Control', 'no-cache').send(NOT_FOUND_HTML);
}

buildLogPagesRouter.get('/c/:code/log', async (req, res) => {
  const found = await publicDbWork(async () => {
    const build = await loadPublicBuild(codeOf(req.params.code));
    return build && { build, posts: await loadAllPublicPosts(build.id) };
  });
  if (!found) return notFound(res);
  const { build } = found;
  const posts = found.posts.map(presentPublicLogPost);
  sendHtml(req, res, renderLogPage(presentPublicBuild(build), posts), PUBLIC_CACHE);
});

buildLogPagesRouter.get('/c/:code/log.atom', async (req, res) => {
  const found = await publicDbWork(async () => {
    const build = await loadPublicBuild(codeOf(req.params.code));
    return build && { build, posts: await loadFeedPosts(build.id) };
  });
  if (!found) return notFound(res);
  const pub = presentPublicBuild(found.build);
  const posts = found.posts.map(presentPublicLogPost);
  res.set('Cache-Control', PUBLIC_CACHE).type('application/atom+xml; charset=utf-8').send(buildLogFeed({ buildUrl: pub.url, title: pub.title, ownerName: pub.ownerName, buildUpdatedAt: pub.updatedAt, posts }));
});

function answer(res: Response, code: string, outcome: QuestionOutcome) {
  const { status, html } = renderQuestionOutcome(code, outcome);
  res.status(status).set('Cache-Control', 'no-store').type('html').send(html);
}

buildLogPagesRouter.post(
  '/c/:code/questions',
  questionLimiter, // before the body is read, so refused questions count too
  express.urlencoded({ extended: false, limit: '8kb', parameterLimit: 5 }),
  async (req, res) => {
    const code = codeOf(req.params.code);
    const build = await loadPublicBuild(code);
    if (!build) return notFound(res);
    const parsed = readForm(req, VisitorQuestionSchema);
    if (!parsed.success) return answer(res, code, { kind: 'invalid', message: parsed.error.issues[0]?.message ?? 'Your question could not be read.' });
    // The honeypot was filled: a robot. It is told what a person is told, and nothing is kept.
    if (parsed.data[QUESTION_HONEYPOT]) return res.set('Cache-Control', 'no-store').redirect(303, `/c/${code}/asked`);
    if (!(await receiveVisitorQuestion(build.id, parsed.data.question))) return answer(res, code, { kind: 'inbox-full' });
    // Post, redirect, get: a reload of the thanks does not send the question again.
    res.set('Cache-Control', 'no-store').redirect(303, `/c/${code}/asked`);
  },
);

buildLogPagesRouter.get('/c/:code/asked', (req, res) => answer(res, codeOf(req.params.code).replace(/[^A-Z0-9]/g, ''), { kind: 'sent' }));

/** The limiter's 429 and the body parser's 4xx answer as pages, since a person pressed a button. */
const questionPageErrors: ErrorRequestHandler = (err, req, res, next) => {
  if (res.headersSent) return next(err);
  const status = (err as { status?: unknown }).status;
  if (typeof status !== 'number' || status < 400 || status >= 500) return next(err);
  answer(res, codeOf(req.params.code ?? '').replace(/[^A-Z0-9]/g, ''), { kind: status === 429 ? 'too-many' : 'unreadable' });
};
buildLogPagesRouter.use('/c/:code/questions', questionPageErrors);
