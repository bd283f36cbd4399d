import type { UnitSystem } from '@shared/calc';
import type { DynoRun } from '@shared/schemas/build';
import { DynoChart as Chart } from '@templates/charts/dyno-chart';

/** The chosen runs' power and torque overlaid: the same SVG chart the public page draws, with the editor's caption. */
export function DynoChart({ runs, system }: { runs: DynoRun[]; system: UnitSystem }) {
  if (!runs.some((r) => r.curve.length > 1)) return <p className="text-sm text-graphite">No curve points on the chosen runs: peaks only.</p>;
  return (
    <figure className="w-full" data-testid="dyno-chart">
      <Chart runs={runs} units={system} titleId="editor-dyno-title" className="block h-auto w-full border border-rule bg-white" />
      <figcaption className="mt-1 text-xs text-graphite">
        {runs.map((r) => `${r.date}${r.facility ? ` ${r.facility}` : ''} (${r.measuredAt})`).join(' · ')}. Runs on different dynos or correction standards compare only roughly.
      </figcaption>
    </figure>
  );
}
