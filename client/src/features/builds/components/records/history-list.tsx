import { formatQuantity, isUnitOf, UNITS, type QuantityKind, type Unit } from '@shared/calc';
import type { FigureChange, OwnerBuild } from '@shared/schemas/build';
import { SECTION_LABELS, type SectionKind } from '@shared/schemas/build-sections';
import type { FigureInput } from '@shared/schemas/figure';
import { PROVENANCE_LABELS, inText } from '@shared/build-sheet/choice-labels';

const kindOf = (unit: string) => (Object.keys(UNITS) as QuantityKind[]).find((k) => isUnitOf(k, unit));

function figureText(f: FigureInput): string {
  const quantity = kindOf(f.unit) ? formatQuantity({ value: f.value, unit: f.unit as Unit }) : `${f.value} ${f.unit}`;
  return `${inText(PROVENANCE_LABELS[f.provenance])} ${quantity}`;
}

/** "estimated 1,250 kg → measured 1,287 kg on 2026-05-30" */
export function changeText(c: FigureChange): string {
  const after = c.after ? `${figureText(c.after)}${c.after.measuredOn ? ` on ${c.after.measuredOn}` : ''}` : 'cleared';
  return `${figureText(c.before)}${c.before.measuredOn ? ` (${c.before.measuredOn})` : ''} → ${after}`;
}

const words = (key: string) => key.replace(/([A-Z])/g, ' $1').toLowerCase();

export function pathLabel(path: string): string {
  const [head, ...rest] = path.split('.');
  const section = head === 'overview' ? 'Overview' : (SECTION_LABELS[head as SectionKind] ?? head);
  return `${section} · ${rest.map(words).join(' ')}`;
}

const newestFirst = (a: FigureChange, b: FigureChange) => (a.changedAt < b.changedAt ? 1 : a.changedAt > b.changedAt ? -1 : b.id - a.id);

/** Earlier values of one figure, shown under it. */
export function HistoryFor({ build, path }: { build: OwnerBuild; path: string }) {
  const changes = build.history.filter((c) => c.path === path).sort(newestFirst);
  if (!changes.length) return null;
  return (
    <ul className="mt-1 text-sm text-graphite" aria-label="Earlier values">
      {changes.map((c) => (
        <li key={c.id}>
          <span className="tabular-nums">{changeText(c)}</span> <span className="text-xs">(changed {c.changedAt.slice(0, 10)})</span>
        </li>
      ))}
    </ul>
  );
}

/** Every figure's earlier values, newest first. */
export function HistoryPanel({ build }: { build: OwnerBuild }) {
  const changes = [...build.history].sort(newestFirst);
  return (
    <section id="section-history" aria-labelledby="section-history-title" className="scroll-mt-20 border border-rule bg-white/60">
      <header className="border-b border-rule px-4 py-2">
        <h2 id="section-history-title" tabIndex={-1} className="font-display text-lg uppercase tracking-wide outline-none">
          History
        </h2>
      </header>
      <div className="p-4">
        {changes.length === 0 ? (
          <p className="text-sm text-graphite">When a figure changes (an estimate replaced by a dyno day or a weigh-in), its earlier value is kept here.</p>
        ) : (
          <table className="w-full text-sm">
            <thead>
              <tr className="border-b border-rule text-left text-graphite">
                <th className="py-1 pr-2 font-normal">Figure</th>
                <th className="py-1 pr-2 font-normal">Change</th>
                <th className="py-1 font-normal">When</th>
              </tr>
            </thead>
            <tbody>
              {changes.map((c) => (
                <tr key={c.id} className="border-b border-rule/60 align-top">
                  <td className="py-1 pr-2">{pathLabel(c.path)}</td>
                  <td className="py-1 pr-2">{changeText(c)}</td>
                  <td className="py-1 whitespace-nowrap">{c.changedAt.slice(0, 10)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </div>
    </section>
  );
}
