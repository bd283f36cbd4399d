import { Link } from 'react-router-dom';
import { convert, formatQuantity, isUnitOf, preferredUnit, UNITS, type QuantityKind, type Unit, type UnitSystem } from '@shared/calc';
import { BUILD_STYLE_LABELS, type BuildSummary } from '@shared/schemas/build';
import type { FigureInput } from '@shared/schemas/figure';
import { ProvenanceMark } from '@client/components/ui/provenance-mark';
import { PhotoImage } from './photos/photo-image';

const kindOf = (unit: string) => (Object.keys(UNITS) as QuantityKind[]).find((k) => isUnitOf(k, unit));

// Displacement reads in litres or cubic inches, as the trade gives it.
const DISPLACEMENT_UNIT: Record<UnitSystem, Unit> = { metric: 'L', imperial: 'in3', uk: 'L' };

/** A figure in the owner's chosen units, whatever unit it was typed in, so the builds compare at a glance. */
function Figure({ label, figure, system }: { label: string; figure: FigureInput | undefined; system: UnitSystem }) {
  const kind = figure ? kindOf(figure.unit) : undefined;
  if (!figure || !kind) return null;
  const to = kind === 'volume' ? DISPLACEMENT_UNIT[system] : preferredUnit(kind, system);
  const value = convert(kind, figure.value, figure.unit as never, to as never);
  return (
    <div className="flex flex-col">
      <dt className="text-xs uppercase tracking-wide text-graphite">{label}</dt>
      <dd className="font-display text-lg tabular-nums">
        {formatQuantity({ value, unit: to }, to === 'L' ? { decimals: 1 } : {})}
        <ProvenanceMark provenance={figure.provenance} />
      </dd>
    </div>
  );
}

/** One build in "My builds": cover, title, year and style, key figures with their provenance, draft or published. */
export function BuildSummaryCard({ build, system }: { build: BuildSummary; system: UnitSystem }) {
  const { power, weight, displacement } = build.keyFigures;
  const meta = [build.modelYear, build.style ? (BUILD_STYLE_LABELS[build.style as keyof typeof BUILD_STYLE_LABELS] ?? build.style) : null].filter(Boolean).join(' · ');
  return (
    <li className="flex flex-col border border-rule bg-white/60">
      <Link to={`/builds/${build.id}`} className="group flex flex-1 flex-col hover:text-signal-ink">
        <div className="aspect-[3/2] w-full overflow-hidden border-b border-rule bg-rule/40">
          {build.cover ? (
            <PhotoImage photo={build.cover} sizes="(min-width: 1024px) 320px, (min-width: 640px) 45vw, 95vw" alt="" className="h-full w-full object-cover" />
          ) : (
            <div className="flex h-full items-center justify-center font-display text-sm uppercase tracking-widest text-graphite">No photo yet</div>
          )}
        </div>
        <div className="flex flex-1 flex-col gap-2 p-3">
          <div className="flex items-start justify-between gap-2">
            <h2 className="font-display text-xl uppercase leading-tight tracking-wide">{build.title}</h2>
            <span className={`shrink-0 border px-2 py-0.5 font-display text-xs uppercase ${build.published ? 'border-ok text-ok' : 'border-caution text-caution'}`}>{build.published ? 'Published' : 'Draft'}</span>
          </div>
          {meta ? <p className="text-sm text-graphite">{meta}</p> : null}
          <dl className="mt-auto grid grid-cols-3 gap-2 text-ink">
            <Figure label={power ? `Power (${power.at === 'wheel' ? 'wheels' : 'flywheel'})` : 'Power'} figure={power} system={system} />
            <Figure label="Displacement" figure={displacement} system={system} />
            <Figure label="Weight" figure={weight} system={system} />
          </dl>
        </div>
      </Link>
    </li>
  );
}
