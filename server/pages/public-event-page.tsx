import { renderToStaticMarkup } from 'react-dom/server';
import { formatInZone } from '@shared/calc/time-zone';
import type { PublicEvent } from '@shared/schemas/public-event';
import { placesLeftWords, refundRuleWords } from '@shared/entry-terms-words';
import { placeWords, type PublicResultLine, type PublicResults } from '@shared/schemas/results';
import { PAGE_CSS } from './page-styles';
import { PageHead } from './page-head';

export const EVENT_CSS = `.meta{margin:12px 0 0;display:grid;grid-template-columns:max-content 1fr;gap:4px 16px}
.meta dt{font-size:.75rem;letter-spacing:.08em;text-transform:uppercase;color:var(--graphite);padding-top:3px}
.meta dd{margin:0}
.status{display:inline-block;margin-top:8px;padding:2px 8px;border:1px solid var(--ink);font-size:.85rem;text-transform:uppercase;letter-spacing:.06em}
ol.entries{list-style:none;margin:0;padding:0}
img.logo{display:block;height:auto;max-height:96px;width:auto;max-width:min(240px,60vw);margin:0 0 12px}
ol.entries li{display:flex;gap:12px;align-items:baseline;border-bottom:1px solid var(--rule);min-height:44px;padding:8px 0}
ol.entries .n,ol.results .n{font-family:Oswald,"Arial Narrow",sans-serif;font-weight:600;font-size:1.3rem;min-width:3ch;text-align:right;font-variant-numeric:tabular-nums}
.cal a,.enter a{display:inline-block;min-height:44px;line-height:44px}
.muted{color:var(--graphite)}
.places{margin:4px 0 8px;font-weight:600}
.here{margin-left:auto;font-size:.8rem;text-transform:uppercase;letter-spacing:.06em;color:var(--graphite);white-space:nowrap}
ol.results{list-style:none;margin:0;padding:0}
ol.results li{display:grid;grid-template-columns:4.5rem 3ch minmax(0,1fr) auto;gap:12px;align-items:baseline;border-bottom:1px solid var(--rule);min-height:44px;padding:8px 0}
ol.results .p{font-family:Oswald,"Arial Narrow",sans-serif;font-weight:600;text-transform:uppercase}
ol.results .t{font-variant-numeric:tabular-nums;text-align:right}
.best{border:2px solid var(--ink);padding:8px 12px;margin:8px 0 16px}
.best .p{color:var(--signal-ink)}
/* A long unbroken title breaks inside its column rather than widening the page on a phone. */
ol.entries li>*,ol.results li>*{min-width:0;overflow-wrap:anywhere}`;

/** Dates in the show's own time zone, with the zone named so a visitor from elsewhere is not misled. */
function when(e: PublicEvent, iso: string) {
  return formatInZone(iso, e.timeZone, { weekday: 'short', day: 'numeric', month: 'long', year: 'numeric', hour: '2-digit', minute: '2-digit', hourCycle: 'h23' });
}

function ResultLines({ lines, showClass }: { lines: PublicResultLine[]; showClass?: boolean }) {
  return (
    <ol className="results">
      {lines.map((x) => (
        <li key={`${x.place}-${x.number}`}>
          <span className="p">{placeWords(x.place, x.shared)}</span>
          <span className="n">{x.number}</span>
          <span>
            <a href={x.url}>{x.title}</a>
            {showClass ? <span className="muted"> · {x.className}</span> : null}
          </span>
          <span className="t" aria-label={`total ${x.total}`}>
            {x.total}
          </span>
        </li>
      ))}
    </ol>
  );
}

function Results({ r }: { r: PublicResults }) {
  return (
    <section aria-labelledby="results">
      <h2 id="results">Results</h2>
      {r.bestOfShow.length ? (
        <section className="best" aria-label="Best of show">
          <h3 className="d">Best of show</h3>
          <ResultLines lines={r.bestOfShow} showClass />
        </section>
      ) : null}
      {r.peoplesChoice.length ? (
        <section aria-label="People’s choice">
          <h3 className="d">People’s choice</h3>
          <ResultLines lines={r.peoplesChoice} showClass />
        </section>
      ) : null}
      {r.classes.map((c) => (
        <section key={c.name} aria-label={`Results: ${c.name}`}>
          <h3 className="d">{c.name}</h3>
          {c.placings.length ? <ResultLines lines={c.placings} /> : <p className="muted">No car of this class was placed.</p>}
        </section>
      ))}
      <p className="muted">Totals are the judges’ weighted scores, rounded to two decimals. A shared place means the scores could not separate the cars. People’s choice goes to the most visitors’ votes.</p>
    </section>
  );
}

function Page({ e }: { e: PublicEvent }) {
  const description = `${e.name}: ${e.venueName}, ${when(e, e.startsAt)}.`;
  return (
    <html lang="en">
      <PageHead title={`${e.name} · Placard`} shareTitle={e.name} description={description} css={PAGE_CSS + EVENT_CSS} url={e.url} />
      <body>
        <header className="bar">
          <a className="brand" href="/">
            PLACARD
          </a>
        </header>
        <main>
          {e.logo ? (
            <picture>
              <source srcSet={e.logo.webp} type="image/webp" />
              <img className="logo" src={e.logo.jpeg} alt={`${e.name} logo`} width={e.logo.width} height={e.logo.height} />
            </picture>
          ) : null}
          <h1>{e.name}</h1>
          <span className="status">{e.statusLabel}</span>
          <dl className="meta">
            <dt>When</dt>
            <dd>
              {when(e, e.startsAt)} – {when(e, e.endsAt)} <span className="muted">({e.timeZone})</span>
            </dd>
            <dt>Where</dt>
            <dd>
              {e.venueName}
              {e.venueAddress ? <>, {e.venueAddress}</> : null}
            </dd>
            <dt>Entry fee</dt>
            <dd>{e.feeText}</dd>
            <dt>Refunds</dt>
            <dd>{refundRuleWords(e.refundRule, e.timeZone, e.entryFee)}</dd>
          </dl>
          <p className="cal">
            <a href={e.calendarUrl}>Add to your calendar (.ics)</a>
          </p>
          {e.description ? (
            <section className="story" aria-label="About the show">
              {e.description.split(/\n{2,}/).map((p, i) => (
                <p key={i}>{p}</p>
              ))}
            </section>
          ) : null}
          {e.peoplesChoiceOpen ? (
            <p className="vote-open" role="note">
              People’s choice voting is open: open a car’s page below and press its vote button. One vote per visitor.
            </p>
          ) : null}
          {e.results ? <Results r={e.results} /> : null}
          <section aria-labelledby="how">
            <h2 id="how">How to enter</h2>
            {e.takingEntries ? (
              <>
                <p>
                  Entries are open until {when(e, e.registrationClosesAt)}. Publish your car’s build sheet on Placard, then enter it in one class.
                  {e.entryFee > 0 ? ` The fee of ${e.feeText} is paid when you enter.` : ''}
                </p>
                <p className="enter">
                  <a href={`/enter/${e.slug}`}>Enter a car</a>
                </p>
              </>
            ) : e.status === 'registration_open' && new Date(e.registrationOpensAt) > new Date() ? (
              <p>Entries open on {when(e, e.registrationOpensAt)}.</p>
            ) : (
              <p>Entries are closed.</p>
            )}
          </section>
          <section aria-labelledby="classes">
            <h2 id="classes">Classes and entries</h2>
            {e.classes.map((c) => (
              <section key={c.id} aria-label={c.name}>
                <h3 className="d">{c.name}</h3>
                {c.description ? <p className="muted">{c.description}</p> : null}
                <p className="places">{placesLeftWords(c.placesLeft)}</p>
                {c.entries.length ? (
                  <ol className="entries">
                    {c.entries.map((x) => (
                      <li key={x.number}>
                        <span className="n">{x.number}</span>
                        <a href={x.url}>{x.title}</a>
                        {x.arrived ? <span className="here">On the field</span> : null}
                      </li>
                    ))}
                  </ol>
                ) : (
                  <p className="muted">No confirmed entries yet.</p>
                )}
              </section>
            ))}
          </section>
        </main>
      </body>
    </html>
  );
}

export function renderPublicEventPage(e: PublicEvent): string {
  return `<!doctype html>${renderToStaticMarkup(<Page e={e} />)}`;
}

export const EVENT_NOT_FOUND_HTML = `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1"><meta name="robots" content="noindex"><title>No show here · Placard</title><style>html{background:#F5F0E6;color:#1C1B19;font:16px/1.5 system-ui,sans-serif}main{max-width:560px;margin:15vh auto;padding:0 16px}h1{font:600 2rem/1.1 Oswald,"Arial Narrow",sans-serif;text-transform:uppercase}</style></head><body><main><h1>No show here</h1><p>There is no public show at this address.</p><p><a href="/">Placard</a></p></main></body></html>`;
