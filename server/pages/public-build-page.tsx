import { renderToStaticMarkup } from 'react-dom/server';
import { coverPhotoOf } from '@shared/build-sheet/cover';
import { convert, cornerWeights, formatNumber, formatPercent, formatQuantity, preferredUnit, type Unit, type UnitSystem } from '@shared/calc';
import { BUILD_STYLE_LABELS, type Photo, type PublicBuild } from '@shared/schemas/build';
import type { KeyFigure } from '@shared/schemas/card';
import { computeKeyFigures } from '@shared/build-sheet/key-figures';
import { FUEL_LEVEL_LABELS, PROVENANCE_MARKS, inText } from '@shared/build-sheet/choice-labels';
import { headlineOf } from '@shared/build-sheet/headline';
import { DISPLACEMENT_ROW, engineLine, sectionViews, type SectionView } from '@shared/build-sheet/spec-lines';
import { DynoChart } from '@templates/charts/dyno-chart';
import { BrakeSplitBar, FrontViewSketch } from '@templates/charts/engineering-diagrams';
import { rollCentreWords, shownEngineering } from '@shared/build-sheet/engineering-shown';
import { PAGE_CSS } from './page-styles';
import { PageHead } from './page-head';
import { BUILD_LOG_CSS } from './build-log-styles';
import type { BuildOverTime } from '@shared/schemas/build-log';
import { LogSection, QuestionsSection } from './build-log-sections';

/**
 * What a show adds to the page: the entry, and while the show's people's choice window is open, the
 * place of the visitor's own vote box for that show (filled per response, see `vote-box.tsx`). A car
 * in several current shows has one of these each.
 */
export type ShowEntrySlot = { showName: string; showSlug?: string; showUrl?: string; className?: string; entryNumber?: string; votingMayOpen?: boolean; vote?: { eventId: number; url: string } };

/** The units a visitor may pick; the choice is remembered for every build they open (see router.ts). */
const UNIT_CHOICES: Array<[UnitSystem, string, string]> = [
  ['metric', 'Metric', 'Millimetres, kilograms, kW, N·m, km/h'],
  ['uk', 'UK', 'Metric, with power in hp, torque in lb·ft and speed in mph'],
  ['imperial', 'US', 'Inches, pounds, hp, lb·ft, mph'],
];

const cover = (b: PublicBuild) => coverPhotoOf(b.photos);
const styleLabel = (s: string | null) => (s && s in BUILD_STYLE_LABELS ? BUILD_STYLE_LABELS[s as keyof typeof BUILD_STYLE_LABELS] : null);
const mark = (f: { provenance: KeyFigure['provenance'] }) => PROVENANCE_MARKS[f.provenance] || null;

/** A photo in the sizes the browser picks from; a tap opens the largest copy (a plain link: no script needed). */
function Picture({ photo, sizes, lazy, alt }: { photo: Photo; sizes: string; lazy: boolean; alt: string }) {
  const src = photo.sources.find((s) => s.width >= 960) ?? photo.sources[photo.sources.length - 1];
  const largest = photo.sources[photo.sources.length - 1];
  if (!src || !largest) return null;
  return (
    <a className="big" href={largest.jpeg} aria-label={`${alt}: open the large photo`}>
    <picture>
      <source type="image/webp" srcSet={photo.sources.map((s) => `${s.webp} ${s.width}w`).join(', ')} sizes={sizes} />
      <img
        src={src.jpeg}
        srcSet={photo.sources.map((s) => `${s.jpeg} ${s.width}w`).join(', ')}
        sizes={sizes}
        width={src.width}
        height={src.height}
        alt={alt}
        decoding="async"
        {...(lazy ? { loading: 'lazy' as const } : { fetchPriority: 'high' as const })}
      />
    </picture>
    </a>
  );
}

function Figures({ figures, units }: { figures: KeyFigure[]; units: UnitSystem }) {
  if (figures.length === 0) return null;
  return (
    <dl className="fig">
      {figures.map((f) => (
        <div key={f.key}>
          <dt>{f.label}</dt>
          <dd>
            {f[units].text}
            {mark(f) ? <span className="mk"> {mark(f)}</span> : null}
            {f.note || f.measuredOn ? (
              <small>
                {f.note}
                {f.note && f.measuredOn ? ', ' : ''}
                {f.measuredOn ? <span className="nw">measured {f.measuredOn}</span> : null}
                {f.evidenceUrl ? (
                  <>
                    {' · '}
                    <a href={f.evidenceUrl}>see the evidence</a>
                  </>
                ) : null}
              </small>
            ) : null}
          </dd>
        </div>
      ))}
    </dl>
  );
}

function Section({ view }: { view: SectionView }) {
  return (
    <section id={view.kind} aria-labelledby={`h-${view.kind}`}>
      <h2 id={`h-${view.kind}`}>{view.label}</h2>
      {view.rows.length ? (
        <dl className="spec">
          {view.rows.map((r, i) => (
            <Row key={i} label={r.label} value={r.value} />
          ))}
        </dl>
      ) : null}
      {view.madeBy ? <p className="made">Made by: {view.madeBy}</p> : null}
      {view.note ? <p className="why">{view.note}</p> : null}
      {view.caution ? <p className="care">{view.caution}</p> : null}
    </section>
  );
}

const Row = ({ label, value }: { label: string; value: string }) => (
  <>
    <dt>{label}</dt>
    <dd>{value}</dd>
  </>
);

/** The chart first, then each run as two wide figures over one line of how it was measured: reads on a phone. */
function Dyno({ build, units }: { build: PublicBuild; units: UnitSystem }) {
  if (build.dynoRuns.length === 0) return null;
  const figure = (kind: 'power' | 'torque', v: number, from: string) => computeUnit(kind, v, from, preferredUnit(kind, units));
  return (
    <section id="dyno" className="dyno" aria-labelledby="h-dyno">
      <h2 id="h-dyno">Dyno</h2>
      <DynoChart runs={build.dynoRuns} units={units} />
      <p>Power solid, torque dashed; the latest run in the accent colour.</p>
      <ol className="runs">
        {build.dynoRuns.map((r, i) => (
          <li key={i}>
            <p className="how">
              <strong>{r.date}</strong> · {r.measuredAt === 'wheel' ? 'at the wheels' : 'at the flywheel'}, {r.standard}
              {r.facility ? `, ${r.facility}` : ''}
            </p>
            <dl>
              <div>
                <dt>Peak power</dt>
                <dd>
                  {figure('power', r.peakPower, r.powerUnit)} <small>at {formatNumber(r.peakPowerRpm)} rpm</small>
                </dd>
              </div>
              <div>
                <dt>Peak torque</dt>
                <dd>
                  {figure('torque', r.peakTorque, r.torqueUnit)} <small>at {formatNumber(r.peakTorqueRpm)} rpm</small>
                </dd>
              </div>
            </dl>
          </li>
        ))}
      </ol>
    </section>
  );
}

/** The worked-out figures the owner chose to show, each an estimate, with the caution beside them and the two sketches they come from. */
function WorkedOut({ build, units }: { build: PublicBuild; units: UnitSystem }) {
  const shown = shownEngineering(build, units);
  if (!shown) return null;
  return (
    <section id="worked-out" aria-labelledby="h-worked">
      <h2 id="h-worked">Worked out</h2>
      <dl className="spec">
        {shown.figures.map((f) => (
          <Row key={f.key} label={f.label} value={f.value} />
        ))}
      </dl>
      {shown.brakes ? (
        <figure className="sketch">
          <BrakeSplitBar frontPercent={shown.brakes.frontPercent} />
        </figure>
      ) : null}
      {shown.geometry ? (
        <figure className="sketch">
          <FrontViewSketch input={shown.geometry.input} centres={shown.geometry.centres} rcHeight={shown.geometry.centres.rollCentreHeightMm !== null ? rollCentreWords(shown.geometry.centres.rollCentreHeightMm, units) : undefined} />
          <figcaption>Front view of the right-hand front corner: the arms, the tyre and the roll centre (RC).</figcaption>
        </figure>
      ) : null}
      <p className="care">{shown.caution}</p>
    </section>
  );
}

function computeUnit(kind: 'power' | 'torque', value: number, from: string, to: string) {
  return formatQuantity({ value: convert(kind, value, from as never, to as never), unit: to as Unit });
}

function WeighIns({ build, units }: { build: PublicBuild; units: UnitSystem }) {
  const w = build.weighIns[0];
  if (!w) return null;
  const to = preferredUnit('mass', units);
  const cw = cornerWeights(w);
  const mass = (v: number) => formatQuantity({ value: convert('mass', v, w.unit, to), unit: to });
  return (
    <section id="weigh-in" aria-labelledby="h-weigh">
      <h2 id="h-weigh">Corner weights</h2>
      <table>
        <tbody>
          <tr>
            <th>Left front</th>
            <td>{mass(w.leftFront)}</td>
            <th>Right front</th>
            <td>{mass(w.rightFront)}</td>
          </tr>
          <tr>
            <th>Left rear</th>
            <td>{mass(w.leftRear)}</td>
            <th>Right rear</th>
            <td>{mass(w.rightRear)}</td>
          </tr>
        </tbody>
      </table>
      <p className="made">
        Total {mass(cw.total)} · front {formatPercent(cw.frontPercent)} · left {formatPercent(cw.leftPercent)} · cross {formatPercent(cw.crossPercent)}. Weighed {w.date}, {w.withDriver ? 'with driver' : 'without driver'}, fuel {inText(FUEL_LEVEL_LABELS[w.fuelLevel])}.
      </p>
    </section>
  );
}

function ShowEntry({ slot }: { slot: ShowEntrySlot }) {
  return (
    <section className="show" aria-label={`Entry in ${slot.showName}`} id={slot.showSlug ? `show-${slot.showSlug}` : undefined}>
      <p className="d">{slot.showUrl ? <a href={slot.showUrl}>{slot.showName}</a> : slot.showName}</p>
      {slot.className ? <p>Class: {slot.className}</p> : null}
      {slot.entryNumber ? <p className="d">Entry {slot.entryNumber}</p> : null}
      {slot.vote ? <div data-vote-box={String(slot.vote.eventId)} /> : null}
    </section>
  );
}

/** Every current show the car is in, each with its own number, class and vote. */
function ShowEntries({ slots }: { slots: ShowEntrySlot[] }) {
  if (slots.length === 0) return null;
  return (
    <div id="show-entry">
      {slots.map((slot) => (
        <ShowEntry key={slot.showSlug ?? slot.showName} slot={slot} />
      ))}
    </div>
  );
}

function Page({ build, units, shows, preview, overTime }: { build: PublicBuild; units: UnitSystem; shows: ShowEntrySlot[]; preview: 'draft' | 'published' | null; overTime: BuildOverTime | null }) {
  const { heading, kicker } = headlineOf(build);
  const photo = cover(build);
  const figures = computeKeyFigures(build);
  // Each thing once per page: the displacement as a figure (not again in the engine line or the
  // Engine section), and the engineering caution under the first section that needs it.
  const sizeShown = figures.some((f) => f.key === 'displacement');
  const engine = engineLine(build.sections.engine, units, { withDisplacement: !sizeShown });
  const firstCaution = sectionViews(build.sections, units).findIndex((v) => v.caution);
  const views = sectionViews(build.sections, units).map((v, i) => ({
    ...v,
    rows: v.kind === 'engine' && sizeShown ? v.rows.filter((r) => r.label !== DISPLACEMENT_ROW) : v.rows,
    caution: i === firstCaution ? v.caution : null,
  }));
  const byline = [styleLabel(build.style), build.ownerName ? `owned by ${build.ownerName}` : null].filter(Boolean).join(' · ');
  const description = [engine, figures.map((f) => `${f.label} ${f[units].text}${mark(f) ? ` ${mark(f)}` : ''}`).join(', ')].filter(Boolean).join('. ') || `${heading} on Placard.`;
  const og = photo?.sources.find((s) => s.width >= 960) ?? photo?.sources[photo.sources.length - 1];
  const title = kicker ? `${heading}: ${kicker}` : heading;
  const gallery = build.photos.filter((p) => p !== photo);
  return (
    <html lang="en">
      <PageHead title={`${title} · Placard`} shareTitle={title} description={description} css={overTime ? PAGE_CSS + BUILD_LOG_CSS : PAGE_CSS} url={build.url} image={og ? { url: og.jpeg, width: og.width, height: og.height } : null} noindex={Boolean(preview)} />
      <body>
        <header className="bar">
          <a className="brand" href="/">
            PLACARD
          </a>
          <nav className="units" aria-label="Units">
            {UNIT_CHOICES.map(([system, name, title]) => (
              <a key={system} href={`?units=${system}`} title={title} {...(units === system ? { 'aria-current': 'true' as const } : {})}>
                {name}
              </a>
            ))}
          </nav>
        </header>
        {preview ? (
          <p className="preview" role="status">
            {preview === 'draft' ? 'Preview of a draft: visitors see this page once you publish the build.' : 'Preview: this is the page visitors see.'}
          </p>
        ) : null}
        <main>
          {photo ? (
            <figure className="cover">
              <Picture photo={photo} sizes="(min-width: 800px) 760px, 100vw" lazy={false} alt={photo.caption || heading} />
            </figure>
          ) : null}
          <h1>
            {kicker ? <span className="kicker">{kicker}</span> : null}
            {heading}
          </h1>
          {byline ? <p className="by">{byline}</p> : null}
          <ShowEntries slots={shows} />
          <Figures figures={figures} units={units} />
          {engine ? <p className="eng">{engine}</p> : null}
          {build.story.trim() ? (
            <section className="story" aria-labelledby="h-story">
              <h2 id="h-story">The story</h2>
              {build.story
                .split(/\n{2,}/)
                .filter((p) => p.trim())
                .map((p, i) => (
                  <p key={i}>{p.trim()}</p>
                ))}
            </section>
          ) : null}
          {overTime ? <QuestionsSection code={build.code} answers={overTime.answers} /> : null}
          {views.map((v) => (
            <Section key={v.kind} view={v} />
          ))}
          <WorkedOut build={build} units={units} />
          <Dyno build={build} units={units} />
          <WeighIns build={build} units={units} />
          {overTime ? <LogSection code={build.code} overTime={overTime} /> : null}
          {gallery.length ? (
            <section id="photos" aria-labelledby="h-photos">
              <h2 id="h-photos">Photos</h2>
              <ul className="gal">
                {gallery.map((p) => (
                  <li key={p.id}>
                    <figure>
                      <Picture photo={p} sizes="(min-width: 800px) 372px, 100vw" lazy alt={p.caption || heading} />
                      {p.caption ? <figcaption>{p.caption}</figcaption> : null}
                    </figure>
                  </li>
                ))}
              </ul>
            </section>
          ) : null}
          {build.credits.length ? (
            <section id="credits" aria-labelledby="h-credits">
              <h2 id="h-credits">Credits</h2>
              <dl className="spec">
                {build.credits.map((c, i) => (
                  <Row key={i} label={c.role} value={c.name} />
                ))}
              </dl>
            </section>
          ) : null}
        </main>
        <footer>
          <p>
            Figures marked {PROVENANCE_MARKS.estimated} are estimates and those marked {PROVENANCE_MARKS.target} are goals; the rest were measured.
          </p>
          <p>
            Build sheet {build.code} on Placard · updated {build.updatedAt.slice(0, 10)}
          </p>
        </footer>
      </body>
    </html>
  );
}

/** The whole public page as a string: complete HTML with its style inlined and no script. */
/** `preview` marks the owner's own look at the page (a draft included), never cached or indexed. */
/** `overTime` adds the build log and the questions (left out, the page is the build sheet alone). */
export function renderPublicBuildPage(build: PublicBuild, units: UnitSystem, shows: ShowEntrySlot[] = [], preview: 'draft' | 'published' | null = null, overTime: BuildOverTime | null = null): string {
  return `<!doctype html>${renderToStaticMarkup(<Page build={build} units={units} shows={shows} preview={preview} overTime={overTime} />)}`;
}

/** One plain page for every code that is not a published build, so a guess learns nothing. */
export const NOT_FOUND_HTML = `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1"><meta name="robots" content="noindex"><title>No build here · Placard</title><style>html{background:#F5F0E6;color:#1C1B19;font:16px/1.5 system-ui,sans-serif}main{max-width:560px;margin:15vh auto;padding:0 16px}h1{font:600 2rem/1.1 Oswald,"Arial Narrow",sans-serif;text-transform:uppercase}</style></head><body><main><h1>No build here</h1><p>There is no published build sheet at this address. Check the code on the card and try again.</p><p><a href="/">Placard</a></p></main></body></html>`;
