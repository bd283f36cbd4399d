import { renderToStaticMarkup } from 'react-dom/server';
import { formatInZone, spanInZone } from '@shared/calc/time-zone';
import { PUBLIC_EVENT_ENTRIES_PER_PAGE, type PublicEntryLine, type PublicEntryListing, type PublicEvent, type PublicEventPageQuery } from '@shared/schemas/public-event';
import { countOf } from '@shared/words';
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
ol.entries li>a{flex:1 1 0}
.here{margin-left:auto;font-size:.8rem;text-transform:uppercase;letter-spacing:.06em;color:var(--graphite);white-space:nowrap}
ol.results{list-style:none;margin:0;padding:0}
ol.results li{display:grid;grid-template-columns:4.5rem 3ch minmax(0,1fr) auto;gap:12px;align-items:baseline;border-bottom:1px solid var(--rule);min-height:44px;padding:8px 0}
ol.results .p{font-family:Oswald,"Arial Narrow",sans-serif;font-weight:600;text-transform:uppercase}
ol.results .t{font-variant-numeric:tabular-nums;text-align:right}
.best{border:2px solid var(--ink);padding:8px 12px;margin:8px 0 16px}
.best .p{color:var(--signal-ink)}
/* A long unbroken title breaks inside its column rather than widening the page on a phone. */
ol.entries li>*,ol.results li>*{min-width:0;overflow-wrap:anywhere}
ul.classes{list-style:none;margin:0 0 8px;padding:0}
ul.classes li{display:flex;flex-wrap:wrap;gap:0 12px;align-items:baseline;border-bottom:1px solid var(--rule);padding:4px 0}
ul.classes a{display:inline-block;min-height:44px;line-height:44px;font-weight:600}
ul.classes a[aria-current]{border-bottom:3px solid var(--signal)}
form.find{display:flex;flex-wrap:wrap;gap:8px 12px;align-items:end;margin:12px 0 8px}
form.find .field{flex:1 1 12rem;display:flex;flex-direction:column;gap:2px}
form.find label{font-size:.875rem;color:var(--graphite)}
form.find input,form.find select{min-height:44px;font:inherit;color:var(--ink);background:#fff;border:2px solid var(--ink);padding:0 8px;width:100%}
form.find button{min-height:44px;font:600 1rem Oswald,"Arial Narrow",sans-serif;text-transform:uppercase;letter-spacing:.04em;background:var(--ink);color:var(--paper);border:2px solid var(--ink);padding:0 16px;cursor:pointer}
.pager{display:flex;justify-content:space-between;align-items:center;gap:12px;margin-top:16px}
.pager a{display:inline-block;min-height:44px;line-height:44px}
.err{border-left:4px solid var(--signal);padding:8px 12px;background:#fff8}`;

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

/** The address of one view of the list: only what differs from the first view is in it. */
function listLink(slug: string, q: Partial<PublicEventPageQuery>): string {
  const params = new URLSearchParams();
  if (q.q) params.set('q', q.q);
  if (q.class !== undefined) params.set('class', String(q.class));
  if (q.page && q.page > 1) params.set('page', String(q.page));
  const query = params.toString();
  return `/e/${slug}${query ? `?${query}` : ''}#entries`;
}

/** Consecutive cars of one class, so the page reads as the classes' lists even across a page boundary. */
function byClass(lines: PublicEntryLine[]): PublicEntryLine[][] {
  const groups: PublicEntryLine[][] = [];
  for (const line of lines) {
    const last = groups[groups.length - 1];
    if (last && last[0]!.classId === line.classId) last.push(line);
    else groups.push([line]);
  }
  return groups;
}

function Entries({ e, listing }: { e: PublicEvent; listing: PublicEntryListing }) {
  const { query, perClass, total, pages } = listing;
  const all = Object.values(perClass).reduce((a, b) => a + b, 0);
  const classOf = new Map(e.classes.map((c) => [c.id, c]));
  const chosen = query.class !== undefined ? classOf.get(query.class) : undefined;
  const first = (query.page - 1) * PUBLIC_EVENT_ENTRIES_PER_PAGE + 1;
  const here = (classId: number | undefined) => (!query.q && query.class === classId ? { 'aria-current': 'page' as const } : {});
  return (
    <section aria-labelledby="classes">
      <h2 id="classes">Classes and entries</h2>
      <ul className="classes" aria-label="Classes">
        <li>
          <a href={listLink(e.slug, {})} {...here(undefined)}>
            Every class
          </a>
          <span className="muted">{countOf(all, 'car')}</span>
        </li>
        {e.classes.map((c) => (
          <li key={c.id}>
            <a href={listLink(e.slug, { class: c.id })} {...here(c.id)}>
              {c.name}
            </a>
            <span className="muted">{countOf(perClass[c.id] ?? 0, 'car')}</span>
            {/* Places matter only while the show takes entries: afterwards "no limit" would read as an invitation. */}
            {e.status === 'registration_open' && <span className="places">{placesLeftWords(c.placesLeft)}</span>}
          </li>
        ))}
      </ul>
      <form className="find" method="get" action={`/e/${e.slug}#entries`} role="search">
        <div className="field">
          <label htmlFor="find-q">Find a car by title or number</label>
          <input id="find-q" type="search" name="q" defaultValue={query.q} maxLength={80} />
        </div>
        <div className="field">
          <label htmlFor="find-class">Class</label>
          <select id="find-class" name="class" defaultValue={chosen ? String(chosen.id) : ''}>
            <option value="">Every class</option>
            {e.classes.map((c) => (
              <option key={c.id} value={c.id}>
                {c.name}
              </option>
            ))}
          </select>
        </div>
        <button type="submit">Find</button>
      </form>
      <p id="entries" className="muted" role="status">
        {listing.unknownClass
          ? 'That class is not one of this show’s.'
          : total === 0
            ? query.q
              ? `No car matches “${query.q}”${chosen ? ` in ${chosen.name}` : ''}.`
              : 'No confirmed entries yet.'
            : `${query.q ? `${countOf(total, 'car')} ${total === 1 ? 'matches' : 'match'} “${query.q}”` : countOf(total, 'car')}${chosen ? ` in ${chosen.name}` : ''}${pages > 1 ? ` · ${first}–${Math.min(first + PUBLIC_EVENT_ENTRIES_PER_PAGE - 1, total)} shown, page ${query.page} of ${pages}` : ''}`}
      </p>
      {total > 0 && listing.entries.length === 0 ? (
        <p>
          There is no car on page {query.page}. <a href={listLink(e.slug, { ...query, page: 1 })}>Back to the first page</a>
        </p>
      ) : null}
      {byClass(listing.entries).map((group) => {
        const c = classOf.get(group[0]!.classId);
        return (
          <section key={`${group[0]!.classId}-${group[0]!.number}`} aria-label={c?.name ?? 'Class'}>
            <h3 className="d">{c?.name}</h3>
            {c?.description ? <p className="muted">{c.description}</p> : null}
            <ol className="entries">
              {group.map((x) => (
                <li key={x.number}>
                  <span className="n">{x.number}</span>
                  <a href={x.url}>{x.title}</a>
                  {x.arrived ? <span className="here">On the field</span> : null}
                </li>
              ))}
            </ol>
          </section>
        );
      })}
      {pages > 1 ? (
        <nav className="pager" aria-label="Pages">
          {query.page > 1 ? <a href={listLink(e.slug, { ...query, page: Math.min(query.page - 1, pages) })}>← Previous</a> : <span />}
          {query.page < pages ? <a href={listLink(e.slug, { ...query, page: query.page + 1 })}>Next →</a> : <span />}
        </nav>
      ) : null}
    </section>
  );
}

function Page({ e, listing }: { e: PublicEvent; listing: PublicEntryListing }) {
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
              {spanInZone(e.startsAt, e.endsAt, e.timeZone)} <span className="muted">({e.timeZone})</span>
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
          <Entries e={e} listing={listing} />
        </main>
      </body>
    </html>
  );
}

export function renderPublicEventPage(e: PublicEvent, listing: PublicEntryListing): string {
  return `<!doctype html>${renderToStaticMarkup(<Page e={e} listing={listing} />)}`;
}

/** A search the page cannot read (`?page=x`, a class that is no number): a short page naming what was wrong. */
export function renderBadEventSearchPage(e: { name: string; slug: string }, problems: string[]): string {
  return `<!doctype html>${renderToStaticMarkup(
    <html lang="en">
      <PageHead title={`${e.name} · Placard`} shareTitle={e.name} description={e.name} css={PAGE_CSS + EVENT_CSS} />
      <body>
        <main>
          <h1>{e.name}</h1>
          <div className="err" role="alert">
            <p>This list could not be read:</p>
            <ul>
              {problems.map((p) => (
                <li key={p}>{p}</li>
              ))}
            </ul>
          </div>
          <p>
            <a href={`/e/${e.slug}`}>Back to the show</a>
          </p>
        </main>
      </body>
    </html>,
  )}`;
}

export const EVENT_NOT_FOUND_HTML = `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1"><meta name="robots" content="noindex"><title>No show here · Placard</title><style>html{background:#F5F0E6;color:#1C1B19;font:16px/1.5 system-ui,sans-serif}main{max-width:560px;margin:15vh auto;padding:0 16px}h1{font:600 2rem/1.1 Oswald,"Arial Narrow",sans-serif;text-transform:uppercase}</style></head><body><main><h1>No show here</h1><p>There is no public show at this address.</p><p><a href="/">Placard</a></p></main></body></html>`;
