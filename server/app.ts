import expressStaticGzip from 'express-static-gzip';
import express, { type Express, type Request, type RequestHandler, type Response } from 'express';
import helmet from 'helmet';
import path from 'node:path';
import './models/index';
import { config } from './config';
import { passport } from './auth/passport';
import { sessionMiddleware } from './session-store';
import { csrfProtection } from './middlewares/csrf';
import { apiLimiter } from './middlewares/rate-limits';
import { visitorTurns } from './middlewares/visitor-turns';
import { requestLog } from './middlewares/request-log';
import { emptyBodyIsNoBody, jsonBodiesOnly, noteEmptyBody } from './middlewares/body-type';
import { apiNotFound, errorHandler } from './middlewares/error-handler';
import { healthRouter } from './routes/health';
import { sessionRouter } from './routes/session';
import { usersRouter } from './routes/users';
import { accountRouter } from './routes/account';
import { passwordResetsRouter } from './routes/password-resets';
import { emailVerificationsRouter } from './routes/email-verifications';
import { adminRouter } from './routes/admin';
import { buildsRouter } from './routes/builds';
import { buildRecordsRouter } from './routes/build-records';
import { buildLogRouter } from './routes/build-log';
import { buildQuestionsRouter } from './routes/build-questions';
import { PHOTO_UPLOAD_PATH, photosRouter } from './routes/photos';
import { cardsRouter } from './routes/cards';
import { buildPreviewRouter } from './routes/build-preview';
import { publicApiRouter } from './routes/public';
import { mediaRouter } from './routes/media';
import { sitePagesRouter } from './pages/site-router';
import { pagesRouter } from './pages/router';
import { eventPagesRouter } from './pages/event-router';
import { eventsRouter } from './routes/events';
import { eventPeopleRouter } from './routes/event-people';
import { entriesRouter } from './routes/entries';
import { paymentsWebhookRouter } from './routes/payments';
import { registerPaymentHandler } from './payments/handlers';
import { handleEntryPayment } from './services/entries/entry-payments';
import { showDayRouter } from './routes/show-day';
import { judgingRouter } from './routes/judging';
import { EVENT_LOGO_PATH, eventLogoRouter } from './routes/event-logo';
import { cardPrintsRouter } from './routes/card-prints';
import { peoplesChoiceRouter } from './routes/peoples-choice';
import { votePagesRouter } from './pages/vote-router';
import { buildLogPagesRouter } from './pages/build-log-router';
import { resultsRouter } from './routes/results';
import { CLIENT_DIST, clientShellHtml } from './client-shell';
import { firstScreenFor, FIRST_SCREENS_FOR_SOMEONE } from './first-screens/first-screen';
import { policyWithEarlyScript } from './first-screens/early-script';
import { sendCompressed } from './middlewares/send-compressed';


function apiRouter() {
  const api = express.Router();
  api.use(healthRouter); // before the limiter and the session: probes must stay cheap
  // The public JSON and the webhook have no session: metered per address before them. Every other request
  // is metered after the session is read, per signed-in person or else per address (apiLimiter counts once).
  api.use(['/public', '/payments'], apiLimiter);
  api.use(paymentsWebhookRouter); // raw body, no session, no CSRF: the signature is the proof
  api.use(publicApiRouter); // public JSON: no session, cacheable
  api.use((_req, res, next) => {
    res.set('Cache-Control', 'no-store'); // answers depend on who asks
    next();
  });
  api.use(jsonBodiesOnly([PHOTO_UPLOAD_PATH, EVENT_LOGO_PATH]));
  api.use(express.json({ limit: '1mb', verify: noteEmptyBody }), emptyBodyIsNoBody);
  api.use(sessionMiddleware);
  api.use(passport.session());
  api.use(apiLimiter);
  api.use(csrfProtection);
  api.use(sessionRouter, usersRouter, accountRouter, passwordResetsRouter, emailVerificationsRouter, adminRouter);
  api.use(buildsRouter, buildRecordsRouter, buildLogRouter, buildQuestionsRouter, photosRouter, cardsRouter, buildPreviewRouter);
  api.use(eventsRouter, eventLogoRouter, eventPeopleRouter, entriesRouter, showDayRouter, judgingRouter, cardPrintsRouter, peoplesChoiceRouter, resultsRouter);
  api.use(apiNotFound);
  return api;
}

/** The built client: hashed assets cached for a year, and index.html for every client route. */
function clientRouter() {
  const client = express.Router();
  // Source maps are not for visitors: the build keeps them out of this folder, and a stray one is refused.
  client.use((req, res, next) => (req.path.toLowerCase().endsWith('.map') ? void res.status(404).type('text/plain').send('Not found.') : next()));
  // Hashed file names never change: cached for a year; sent as the .br or .gz written at build time.
  client.use(
    '/assets',
    expressStaticGzip(path.join(CLIENT_DIST, 'assets'), {
      enableBrotli: true,
      orderPreference: ['br', 'gz'],
      serveStatic: { immutable: true, maxAge: '365d', fallthrough: false },
    }),
  );
  // The rest (the service workers, the icons): an hour, revalidated; the .br or .gz copy when the browser takes it.
  client.use(expressStaticGzip(CLIENT_DIST, { enableBrotli: true, orderPreference: ['br', 'gz'], index: false, serveStatic: { index: false, maxAge: '1h' } }));
  // The app's page, naming what this address's screen needs (server/client-shell.ts), with the first screen the
  // server draws for it (first-screens/): the gate's needs the person's session, read when it can be.
  for (const address of FIRST_SCREENS_FOR_SOMEONE) client.get(address, ...sessionIfReadable, sendAppPage);
  client.get('/{*splat}', sendAppPage);
  return client;
}

/** The session for a page that only draws more with it: a database away for a moment costs that, not the page. */
const sessionIfReadable: RequestHandler[] = [...sessionMiddleware, passport.session()].map((read) => (req, res, next) => read(req, res, () => next()));

async function sendAppPage(req: Request, res: Response) {
  const screen = await firstScreenFor(req);
  const html = clientShellHtml(req.path, screen?.html);
  if (html === null) {
    res.status(503).type('text/plain').send('The client is not built yet: run `npm run build` (npm start does it for you).');
    return;
  }
  if (screen) res.set('Content-Security-Policy', policyWithEarlyScript(String(res.getHeader('Content-Security-Policy') ?? '')));
  res.set('Cache-Control', screen?.personal ? 'private, no-cache' : 'no-cache').type('html');
  sendCompressed(req, res, html);
}

/** What each kind of payment reference confirms when its webhook arrives: wired here, in one place. */
function wirePaymentHandlers(): void {
  registerPaymentHandler('entry', handleEntryPayment);
}

/** Builds the Express app without listening, so tests drive it through supertest. */
export function createApp(): Express {
  wirePaymentHandlers();
  const app = express();
  app.disable('x-powered-by');
  if (config.trustProxy) app.set('trust proxy', 1);
  app.use(visitorTurns); // first: a visitor's request costs nothing more until its turn
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: { 'img-src': ["'self'", 'data:', 'blob:'], 'upgrade-insecure-requests': config.secureCookies ? [] : null },
      },
      strictTransportSecurity: config.secureCookies,
    }),
  );
  app.use(requestLog());
  app.use('/api', apiRouter());
  app.use(mediaRouter); // uploaded photos under /media
  app.use(votePagesRouter); // people's choice votes from the public build page (form POSTs, no session)
  app.use(buildLogPagesRouter); // a build's log page, its Atom feed and visitors' questions (form POSTs, no session)
  app.use(sitePagesRouter); // the home page and the list of published builds, server HTML
  app.use(pagesRouter); // public pages such as /c/<code>, complete HTML without the app bundle
  app.use(eventPagesRouter); // public show pages /e/<slug> and their calendar files
  app.use(clientRouter());
  app.use(errorHandler);
  return app;
}
