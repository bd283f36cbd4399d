import { renderToStaticMarkup } from 'react-dom/server';
import type { PublicLogPost } from '@shared/schemas/build-log';
import { PAGE_CSS } from './page-styles';
import { BUILD_LOG_CSS } from './build-log-styles';
import { PageHead } from './page-head';
import { AskForm, LogPost } from './build-log-sections';
import { LOG_PHOTOS_MAX } from '@shared/schemas/build-log';

const CSS = PAGE_CSS + BUILD_LOG_CSS;

function Shell({ title, backUrl, backLabel, children, noindex }: { title: string; backUrl: string; backLabel: string; children: React.ReactNode; noindex?: boolean }) {
  return (
    <html lang="en">
      <PageHead title={`${title} · Placard`} description={title} css={CSS} noindex={noindex} />
      <body>
        <header className="bar">
          <a className="brand" href="/">
            PLACARD
          </a>
          <a className="more" href={backUrl}>
            {backLabel}
          </a>
        </header>
        <main>{children}</main>
      </body>
    </html>
  );
}

const page = (node: React.ReactElement) => `<!doctype html>${renderToStaticMarkup(node)}`;

/** Every published post of a build, newest first, on a page of its own (server HTML, no script). */
export function renderLogPage(build: { code: string; title: string; url: string }, posts: PublicLogPost[]): string {
  const back = `/c/${build.code}`;
  return page(
    <Shell title={`${build.title}: build log`} backUrl={back} backLabel="Back to the build">
      <h1>
        <span className="kicker">Build log</span>
        {build.title}
      </h1>
      <p>
        <a href={`${back}/log.atom`}>Follow the log (Atom feed)</a>
      </p>
      {posts.length ? (
        <ol className="log">
          {posts.map((p) => (
            <LogPost key={p.id} post={p} pageUrl={back} photosShown={LOG_PHOTOS_MAX} />
          ))}
        </ol>
      ) : (
        <p>No posts yet.</p>
      )}
    </Shell>,
  );
}

export type QuestionOutcome = { kind: 'sent' } | { kind: 'invalid'; message: string } | { kind: 'inbox-full' } | { kind: 'too-many' } | { kind: 'unreadable' };

const WORDS: Record<QuestionOutcome['kind'], { status: number; heading: string; text: string }> = {
  sent: { status: 200, heading: 'Question sent', text: 'Thank you: the owner has your question. Answers appear on the build page.' },
  invalid: { status: 400, heading: 'Question not sent', text: '' },
  'inbox-full': { status: 409, heading: 'Question not sent', text: 'The owner has many questions waiting. Ask them at the car, or try again another day.' },
  'too-many': { status: 429, heading: 'Question not sent', text: 'Many questions came from this network. Wait a while and try again.' },
  unreadable: { status: 400, heading: 'Question not sent', text: 'The form could not be read. Go back to the build and try again.' },
};

/** The page after the form: thanks, or why the question was not sent, in words, with the way back. */
export function renderQuestionOutcome(code: string, outcome: QuestionOutcome): { status: number; html: string } {
  const words = WORDS[outcome.kind];
  const back = `/c/${code}`;
  const html = page(
    <Shell title={words.heading} backUrl={back} backLabel="Back to the build" noindex>
      <h1>{words.heading}</h1>
      <p role={outcome.kind === 'sent' ? 'status' : 'alert'}>{outcome.kind === 'invalid' ? outcome.message : words.text}</p>
      {outcome.kind === 'invalid' ? <AskForm code={code} /> : null}
      <p>
        <a className="more" href={`${back}#questions`}>
          Back to the build
        </a>
      </p>
    </Shell>,
  );
  return { status: words.status, html };
}
