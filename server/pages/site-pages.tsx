import type { ReactNode } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { formatInZone } from '@shared/calc/time-zone';
import { countOf } from '@shared/words';
import { BUILD_STYLES, BUILD_STYLE_LABELS, type PublicBuildSearch, type PublicBuildTile } from '@shared/schemas/build';
import type { EventSummary } from '@shared/schemas/show';
import { PAGE_CSS } from './page-styles';
import { PageHead } from './page-head';

// The home page and the list of builds: server HTML like the build page, readable with no script.
// The app (sign-in, My builds, shows) is a link away; these pages know nothing of the session, so
// one cached copy serves everyone.
export const SITE_CSS = `main.wide,.bar.wide,footer.wide{max-width:1100px;margin:0 auto}
.bar.wide{flex-wrap:wrap;row-gap:0}
.bar nav{display:flex;flex-wrap:wrap;gap:0 2px;margin-right:-8px}
.bar nav a{display:inline-block;min-height:44px;line-height:44px;padding:0 8px;text-decoration:none}
.bar nav a[aria-current]{border-bottom:3px solid var(--signal)}
.hero{padding:24px 0 28px;border-bottom:2px solid var(--ink)}
.hero p{max-width:40rem;font-size:1.125rem;color:var(--graphite)}
.cta{display:flex;flex-wrap:wrap;gap:12px;margin-top:16px}
.btn{display:inline-block;min-height:44px;line-height:40px;padding:0 16px;border:2px solid var(--ink);text-decoration:none;font-family:Oswald,"Arial Narrow",sans-serif;font-weight:600;text-transform:uppercase;letter-spacing:.04em}
.btn.solid{background:var(--ink);color:var(--paper)}
.who{display:grid;gap:0 24px;grid-template-columns:repeat(auto-fit,minmax(240px,1fr))}
.who h2{border:0}
.tiles{list-style:none;margin:0;padding:0;display:grid;gap:12px;grid-template-columns:repeat(auto-fill,minmax(240px,1fr))}
.tiles a{display:block;text-decoration:none;background:#fff8;border:1px solid var(--rule);height:100%}
.tiles img,.tiles .nophoto{display:block;width:100%;height:auto;aspect-ratio:8/5;object-fit:cover;background:var(--rule)}
.tiles .nophoto{display:flex;align-items:center;justify-content:center;color:var(--graphite)}
.tiles .t{font-family:Oswald,"Arial Narrow",sans-serif;font-weight:600;font-size:1.25rem;text-transform:uppercase;margin:8px 10px 0;line-height:1.2;overflow-wrap:anywhere}
.tiles .s{margin:0 10px 10px;color:var(--graphite)}
form.find{display:flex;flex-wrap:wrap;gap:8px 12px;align-items:end;margin:12px 0 16px}
form.find label{flex:1 1 12rem;display:flex;flex-direction:column;font-size:.875rem;color:var(--graphite);gap:2px}
form.find input,form.find select{min-height:44px;font:inherit;color:var(--ink);background:#fff;border:2px solid var(--ink);padding:0 8px;width:100%}
form.find button{min-height:44px;font:600 1rem Oswald,"Arial Narrow",sans-serif;text-transform:uppercase;letter-spacing:.04em;background:var(--ink);color:var(--paper);border:2px solid var(--ink);padding:0 16px;cursor:pointer}
:focus-visible{outline:3px solid var(--signal);outline-offset:2px}
.pager{display:flex;justify-content:space-between;align-items:center;gap:12px;margin-top:20px}
.pager a{display:inline-block;min-height:44px;line-height:44px}
.shows{list-style:none;margin:0;padding:0}
.shows li{border-bottom:1px solid var(--rule);padding:10px 0}
.shows a{font-weight:600}
.err{border-left:4px solid var(--signal);padding:8px 12px;background:#fff8}`;

export type OpenShow = Pick<EventSummary, 'name' | 'publicUrl' | 'startsAt' | 'timeZone' | 'venueName'>;
type Current = 'home' | 'builds';

const styleLabel = (s: string | null) => (s && s in BUILD_STYLE_LABELS ? BUILD_STYLE_LABELS[s as keyof typeof BUILD_STYLE_LABELS] : null);

function Shell({ title, description, current, children }: { title: string; description: string; current: Current; children: ReactNode }) {
  const here = (page: Current) => (page === current ? { 'aria-current': 'page' as const } : {});
  return (
    <html lang="en">
      <PageHead title={title} description={description} css={PAGE_CSS + SITE_CSS} />
      <body>
        <header className="bar wide">
          <a className="brand" href="/">
            PLACARD
          </a>
          <nav aria-label="Main">
            <a href="/" {...here('home')}>
              Home
            </a>
            <a href="/c" {...here('builds')}>
              Builds
            </a>
            <a href="/builds">My builds</a>
            <a href="/sign-in">Sign in</a>
          </nav>
        </header>
        <main className="wide">{children}</main>
        <footer className="wide">
          <p>Placard: build sheets, windshield cards and shows for hot rods, customs and restomods.</p>
        </footer>
      </body>
    </html>
  );
}

function Tiles({ builds }: { builds: PublicBuildTile[] }) {
  return (
    <ul className="tiles">
      {builds.map((b) => {
        const small = b.cover?.sources[0];
        return (
          <li key={b.code}>
            <a href={`/c/${b.code}`}>
              {small ? (
                <img src={small.jpeg} srcSet={b.cover!.sources.map((s) => `${s.jpeg} ${s.width}w`).join(', ')} sizes="(min-width: 800px) 260px, 100vw" width={small.width} height={small.height} loading="lazy" decoding="async" alt="" />
              ) : (
                <span className="nophoto">No photo yet</span>
              )}
              <p className="t">{b.title}</p>
              <p className="s">{[b.modelYear, styleLabel(b.style)].filter(Boolean).join(' · ') || '\u00a0'}</p>
            </a>
          </li>
        );
      })}
    </ul>
  );
}

function SearchForm({ search }: { search: Pick<PublicBuildSearch, 'q' | 'style'> }) {
  return (
    <form className="find" method="get" action="/c" role="search">
      <label>
        Title
        <input type="search" name="q" defaultValue={search.q} maxLength={80} placeholder="e.g. coupe" />
      </label>
      <label>
        Style
        <select name="style" defaultValue={search.style ?? ''}>
          <option value="">Any style</option>
          {BUILD_STYLES.map((s) => (
            <option key={s} value={s}>
              {BUILD_STYLE_LABELS[s]}
            </option>
          ))}
        </select>
      </label>
      <button type="submit">Find builds</button>
    </form>
  );
}

const audiences = [
  ['Owners', 'Write the build sheet once: engine, drivetrain, chassis and suspension, brakes, wheels and tyres, with who built what. Every figure says whether it was measured, estimated or is a target. Print a windshield card for each show in a minute.'],
  ['Visitors', 'Scan the code on a card and the whole build opens on your phone, even on one bar of signal: photos, specs in your units, the story and the credits.'],
  ['Organisers', 'Registration, fees and classes; gate check-in by scanning the card; judges scoring on their phones, even offline; results, awards and certificates in the same place.'],
] as const;

function HomePage({ recent, shows }: { recent: PublicBuildTile[]; shows: OpenShow[] }) {
  return (
    <Shell title="Placard · the whole build, one scan away" description="Build sheets, windshield cards and shows for hot rods, customs and restomods." current="home">
      <section className="hero" style={{ marginTop: 0 }}>
        <h1>The whole build, one scan away.</h1>
        <p>Placard is for hot rods, customs and restomods: the owners who build them, the people who stop to read the card, and the crews who run the show.</p>
        <div className="cta">
          <a className="btn solid" href="/sign-up">
            Make an account
          </a>
          <a className="btn" href="/sign-in">
            Sign in
          </a>
        </div>
      </section>
      <section className="who" aria-label="Who Placard is for">
        {audiences.map(([title, body]) => (
          <div key={title}>
            <h2>{title}</h2>
            <p>{body}</p>
          </div>
        ))}
      </section>
      <section aria-labelledby="h-builds">
        <h2 id="h-builds">Builds on Placard</h2>
        <SearchForm search={{ q: '', style: undefined }} />
        {recent.length ? <Tiles builds={recent} /> : <p>No builds are published yet. Owners publish a build sheet from My builds.</p>}
        <p>
          <a href="/c">Every published build →</a>
        </p>
      </section>
      <section aria-labelledby="h-shows">
        <h2 id="h-shows">Shows taking entries</h2>
        {shows.length ? (
          <ul className="shows">
            {shows.map((s) => (
              <li key={s.publicUrl}>
                <a href={s.publicUrl}>{s.name}</a>
                <br />
                <span className="by">
                  {formatInZone(s.startsAt, s.timeZone, { weekday: 'short', day: 'numeric', month: 'long', year: 'numeric' })} · {s.venueName}
                </span>
              </li>
            ))}
          </ul>
        ) : (
          <p>No show is taking entries just now.</p>
        )}
      </section>
    </Shell>
  );
}

const pageLink = (search: PublicBuildSearch, page: number) => {
  const params = new URLSearchParams();
  if (search.q) params.set('q', search.q);
  if (search.style) params.set('style', search.style);
  if (page > 1) params.set('page', String(page));
  const query = params.toString();
  return query ? `/c?${query}` : '/c';
};

export type BuildListing = { search: PublicBuildSearch; builds: PublicBuildTile[]; total: number; pages: number };

function BuildListPage({ listing }: { listing: BuildListing }) {
  const { search, builds, total, pages } = listing;
  const narrowed = Boolean(search.q || search.style);
  const what = [search.q ? `“${search.q}”` : null, search.style ? styleLabel(search.style) : null].filter(Boolean).join(', ');
  return (
    <Shell title={`${narrowed ? `${what} · ` : ''}Builds on Placard`} description="Every published build sheet on Placard, newest first." current="builds">
      <h1>Builds on Placard</h1>
      <SearchForm search={search} />
      <p aria-live="polite">
        {narrowed ? `${countOf(total, 'build')} matching ${what}` : `${countOf(total, 'published build')}`}
        {pages > 1 ? ` · page ${search.page} of ${pages}` : ''}
      </p>
      {builds.length ? (
        <Tiles builds={builds} />
      ) : (
        search.page > 1 && total > 0 ? (
          // An old or typed page number past the end: say so, and link back to where the builds are.
          <p>
            There is no build on page {search.page}. <a href={pageLink(search, 1)}>Back to the first page</a>
          </p>
        ) : (
          <p>{narrowed ? 'No published build matches. Try fewer words or any style.' : 'No builds are published yet.'}</p>
        )
      )}
      {pages > 1 ? (
        <nav className="pager" aria-label="Pages">
          {search.page > 1 ? <a href={pageLink(search, Math.min(search.page - 1, pages))}>← Newer</a> : <span />}
          {search.page < pages ? <a href={pageLink(search, search.page + 1)}>Older →</a> : <span />}
        </nav>
      ) : null}
    </Shell>
  );
}

function BadSearchPage({ problems }: { problems: string[] }) {
  return (
    <Shell title="Builds on Placard" description="Every published build sheet on Placard." current="builds">
      <h1>Builds on Placard</h1>
      <div className="err" role="alert">
        {problems.map((p) => (
          <p key={p}>{p}</p>
        ))}
      </div>
      <SearchForm search={{ q: '', style: undefined }} />
    </Shell>
  );
}

const page = (node: ReactNode) => `<!doctype html>${renderToStaticMarkup(node)}`;
export const renderHomePage = (recent: PublicBuildTile[], shows: OpenShow[]) => page(<HomePage recent={recent} shows={shows} />);
export const renderBuildListPage = (listing: BuildListing) => page(<BuildListPage listing={listing} />);
export const renderBadSearchPage = (problems: string[]) => page(<BadSearchPage problems={problems} />);
