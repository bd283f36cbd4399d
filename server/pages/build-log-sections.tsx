import type { Photo } from '@shared/schemas/build';
import type { BuildOverTime, PublicLogPost } from '@shared/schemas/build-log';
import { QUESTION_HONEYPOT, QUESTION_MAX, type PublicAnswer } from '@shared/schemas/build-questions';
import { lightFormat } from '@shared/build-log/light-format';
import { countOf } from '@shared/words';


/** Light formatting drawn by React, which escapes every piece: a person's text never becomes markup. */
export function LightText({ text }: { text: string }) {
  return (
    <div className="lt">
      {lightFormat(text).map((paragraph, i) => (
        <p key={i}>
          {paragraph.map((line, j) => (
            <span key={j}>
              {j > 0 ? <br /> : null}
              {line.map((piece, k) =>
                piece.kind === 'em' ? (
                  <em key={k}>{piece.text}</em>
                ) : piece.kind === 'link' ? (
                  <a key={k} href={piece.href} rel="nofollow ugc noopener">
                    {piece.text}
                  </a>
                ) : (
                  piece.text
                ),
              )}
            </span>
          ))}
        </p>
      ))}
    </div>
  );
}

/** A small photo of a post: the phone-sized copy, lazy, linking to the largest. */
function Thumb({ photo, alt }: { photo: Photo; alt: string }) {
  const small = photo.sources[0];
  const largest = photo.sources[photo.sources.length - 1];
  if (!small || !largest) return null;
  return (
    <a href={largest.jpeg} aria-label={`${alt}: open the large photo`}>
      <img src={small.jpeg} width={small.width} height={small.height} alt={alt} loading="lazy" decoding="async" />
    </a>
  );
}

const MEASUREMENT_WORDS = { dyno: 'the dyno run of', 'weigh-in': 'the weigh-in of' } as const;

/** One post; `pageUrl` is the build page, where a linked measurement is shown. */
export function LogPost({ post, pageUrl, photosShown }: { post: PublicLogPost; pageUrl: string; photosShown: number }) {
  const photos = post.photos.slice(0, photosShown);
  return (
    <li id={`post-${post.id}`}>
      <p className="when">
        <time dateTime={post.postedOn}>{post.postedOn}</time>
      </p>
      <h3>{post.title}</h3>
      <LightText text={post.body} />
      {photos.length ? (
        <ul className="lph">
          {photos.map((p) => (
            <li key={p.id}>
              <Thumb photo={p} alt={p.caption || post.title} />
            </li>
          ))}
        </ul>
      ) : null}
      {post.measurement ? (
        <p className="when">
          See <a href={`${pageUrl}#${post.measurement.anchor}`}>{MEASUREMENT_WORDS[post.measurement.kind]} {post.measurement.date}</a>.
        </p>
      ) : null}
    </li>
  );
}

/** The newest few posts on the build page, with the way to the rest and the feed. */
export function LogSection({ code, overTime }: { code: string; overTime: BuildOverTime }) {
  if (!overTime.posts.length) return null;
  const page = `/c/${code}`;
  return (
    <section id="log" aria-labelledby="h-log">
      <h2 id="h-log">Build log</h2>
      <ol className="log">
        {overTime.posts.map((p) => (
          <LogPost key={p.id} post={p} pageUrl={page} photosShown={1} />
        ))}
      </ol>
      <p>
        <a className="more" href={`${page}/log`}>
          All {countOf(overTime.postCount, 'post')}
        </a>
        {' · '}
        <a href={`${page}/log.atom`}>Follow the log (Atom feed)</a>
      </p>
    </section>
  );
}

/** Questions the owner answered, the most asked first, and the visitor's form to ask another. */
export function QuestionsSection({ code, answers }: { code: string; answers: PublicAnswer[] }) {
  return (
    <section id="questions" aria-labelledby="h-questions">
      <h2 id="h-questions">Questions people ask</h2>
      {answers.length ? (
        <dl className="qa">
          {answers.map((a, i) => (
            <div key={i}>
              <dt>
                {a.question}
                {a.askedCount > 1 ? <span className="often">
                    {' · '}
                    <span className="nw">asked {countOf(a.askedCount, 'time')}</span>
                  </span> : null}
              </dt>
              <dd>
                <LightText text={a.answer} />
              </dd>
            </div>
          ))}
        </dl>
      ) : null}
      <AskForm code={code} />
    </section>
  );
}

/** A plain form: no script, no account, nothing about the visitor asked for. */
export function AskForm({ code }: { code: string }) {
  return (
    <form className="ask" id="ask" method="post" action={`/c/${code}/questions`}>
      <label htmlFor="ask-q">Ask the owner a question</label>
      <textarea id="ask-q" name="question" maxLength={QUESTION_MAX} required />
      {/* Hidden from people; a robot that fills every box fills this one too. */}
      <div className="hp" aria-hidden="true">
        <label htmlFor="ask-hp">Leave this empty</label>
        <input id="ask-hp" type="text" name={QUESTION_HONEYPOT} tabIndex={-1} autoComplete="off" />
      </div>
      <button type="submit">Send the question</button>
      <small>The owner answers here on this page. We ask for no name or e-mail and keep none.</small>
    </form>
  );
}
