import { Link } from 'react-router-dom';
import { formatQuantity, isUnitOf, UNITS, type QuantityKind, type Unit } from '@shared/calc';
import { BUILD_STYLE_LABELS, type BuildSummary } from '@shared/schemas/build';
import type { FigureInput } from '@shared/schemas/figure';
import { ProvenanceMark } from '@client/components/ui/provenance-mark';
import { PhotoImage } from './photos/photo-image';

const kindOf = (unit: string) => (Object.keys(UNITS) as QuantityKind[]).find((k) => isUnitOf(k, unit));

function Figure({ label, figure }: { label: string; figure: FigureInput | undefined }) {
  if (!figure || !kindOf(figure.unit)) return null;
  return (
    <div className="flex flex-col">
      <dt className="text-xs uppercase tracking-wide text-graphite">{label}</dt>
      <dd className="font-display text-lg tabular-nums">
        {formatQuantity({ value: figure.value, unit: figure.unit as Unit })}
        <ProvenanceMark provenance={figure.provenance} />
      </dd>
    </div>
  );
}

/** One build in "My builds": cover, title, year and style, key figures with their provenance, draft or published. */
export function BuildSummaryCard({ build }: { build: BuildSummary }) {
  const { power, weight, displacement } = build.keyFigures;
  const meta = [build.modelYear, build.style ? (BUILD_STYLE_LABELS[build.style as keyof typeof BUILD_STYLE_LABELS] ?? build.style) : null].filter(Boolean).join(' · ');
  return (
    <li className="flex flex-col border border-rule bg-white/60">
      <Link to={`/builds/${build.id}`} className="group flex flex-1 flex-col hover:text-signal">
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
            <Figure label={power ? `Power (${power.at === 'wheel' ? 'wheels' : 'flywheel'})` : 'Power'} figure={power} />
            <Figure label="Displacement" figure={displacement} />
            <Figure label="Weight" figure={weight} />
          </dl>
        </div>
      </Link>
    </li>
  );
}
