import { useState } from 'react';
import type { DynoRun, OwnerBuild } from '@shared/schemas/build';
import { convert, formatNumber, shownDecimals, type UnitSystem } from '@shared/calc';
import { DYNO_PRECISION } from '@shared/calc/dyno';
import { Button } from '@client/components/ui/button';
import { ConfirmDialog } from '@client/components/ui/confirm-dialog';
import { Notice } from '@client/components/ui/notice';
import { useApplyDynoRun } from '../../api/apply-dyno-run';
import { useDeleteDynoRun } from '../../api/delete-dyno-run';
import { EditorSection } from '../editor/section-form';
import { useNumbers } from '../numbers/numbers-context';
import { DynoChart } from './dyno-chart';
import { DynoRunForm } from './dyno-run-form';

const UNIT = { hp: 'hp', PS: 'PS', kW: 'kW', lbft: 'lb·ft', Nm: 'N·m' } as const;
type PowerUnit = DynoRun['powerUnit'];
type TorqueUnit = DynoRun['torqueUnit'];
/** A run's peaks in the owner's unit system, and as recorded when that differs: as many decimals as entered, converted ones to the trade's whole units. */
function peaks(run: DynoRun, system: UnitSystem): { shown: string; recorded?: string } {
  const powerUnit = system === 'metric' ? 'kW' : 'hp';
  const torqueUnit = system === 'metric' ? 'Nm' : 'lbft';
  const power = (unit: PowerUnit) => formatNumber(convert('power', run.peakPower, run.powerUnit, unit), { decimals: shownDecimals('power', run.peakPower, run.powerUnit, unit, DYNO_PRECISION) });
  const torque = (unit: TorqueUnit) => formatNumber(convert('torque', run.peakTorque, run.torqueUnit, unit), { decimals: shownDecimals('torque', run.peakTorque, run.torqueUnit, unit, DYNO_PRECISION) });
  const line = (pUnit: PowerUnit, tUnit: TorqueUnit) => `${power(pUnit)} ${UNIT[pUnit]} at ${formatNumber(run.peakPowerRpm)} rpm · ${torque(tUnit)} ${UNIT[tUnit]} at ${formatNumber(run.peakTorqueRpm)} rpm`;
  const recorded = line(run.powerUnit, run.torqueUnit);
  if (run.powerUnit === powerUnit && run.torqueUnit === torqueUnit) return { shown: recorded };
  return { shown: line(powerUnit, torqueUnit), recorded };
}

const newestFirst = (a: DynoRun, b: DynoRun) => (a.date < b.date ? 1 : a.date > b.date ? -1 : b.id - a.id);

export function DynoPanel({ build }: { build: OwnerBuild }) {
  const runs = [...build.dynoRuns].sort(newestFirst);
  const { system } = useNumbers();
  const [adding, setAdding] = useState(false);
  const [chosen, setChosen] = useState<number[] | null>(null);
  const [deleting, setDeleting] = useState<DynoRun | null>(null);
  const [message, setMessage] = useState<{ tone: 'ok' | 'danger'; text: string } | null>(null);
  const apply = useApplyDynoRun(build.id);
  const remove = useDeleteDynoRun(build.id);
  // Newest two overlay by default; the owner can pick others (at most two).
  const shownIds = (chosen ?? runs.slice(0, 2).map((r) => r.id)).filter((id) => runs.some((r) => r.id === id));
  const toggle = (id: number) => setChosen(shownIds.includes(id) ? shownIds.filter((x) => x !== id) : [...shownIds, id].slice(-2));

  return (
    <EditorSection id="dyno" title="Dyno runs">
      <div className="flex flex-col gap-4" data-testid="dyno-panel">
        {message ? <Notice tone={message.tone}>{message.text}</Notice> : null}
        {runs.length && !shownIds.length ? <p className="text-sm text-graphite">No run is on the chart: tick “On the chart” on one or two below.</p> : runs.length ? <DynoChart runs={runs.filter((r) => shownIds.includes(r.id))} system={system} /> : <p className="text-sm text-graphite">No dyno runs yet. Add one after a dyno day: the peaks can become the engine’s measured figures.</p>}
        <ul className="flex flex-col gap-3">
          {runs.map((run) => (
            <li key={run.id} className="border border-rule p-3">
              <div className="flex flex-wrap items-start justify-between gap-2">
                <p className="font-display uppercase">
                  {run.date}
                  {run.facility ? ` · ${run.facility}` : ''}
                </p>
                <label className="flex min-h-11 items-center gap-2 text-sm">
                  <input type="checkbox" className="h-5 w-5 accent-ink" checked={shownIds.includes(run.id)} onChange={() => toggle(run.id)} />
                  On the chart
                </label>
              </div>
              <p className="text-sm text-graphite">
                {run.standard} · at the {run.measuredAt === 'wheel' ? 'wheels' : 'flywheel'}
              </p>
              <p className="font-display text-lg tabular-nums">{peaks(run, system).shown}</p>
              {peaks(run, system).recorded ? <p className="text-sm text-graphite">As recorded: {peaks(run, system).recorded}</p> : null}
              {run.note ? <p className="text-sm text-graphite">{run.note}</p> : null}
              <SheetPhotoLink build={build} photoId={run.sheetPhotoId} />
              <div className="mt-2 flex flex-wrap gap-2">
                <Button
                  type="button"
                  variant="secondary"
                  busy={apply.isPending && apply.variables === run.id}
                  onClick={() =>
                    apply.mutate(run.id, {
                      onSuccess: () => setMessage({ tone: 'ok', text: `The engine’s ${run.measuredAt} power and torque are now measured on ${run.date}. The earlier figures are kept in the history.` }),
                      onError: (err) => setMessage({ tone: 'danger', text: err.message }),
                    })
                  }
                >
                  Use as the build’s power figure
                </Button>
                <Button type="button" variant="quiet" onClick={() => setDeleting(run)}>
                  Delete
                </Button>
              </div>
            </li>
          ))}
        </ul>
        {adding ? (
          <DynoRunForm build={build} onDone={() => setAdding(false)} />
        ) : (
          <Button type="button" className="self-start" onClick={() => setAdding(true)}>
            Add a dyno run
          </Button>
        )}
      </div>
      <ConfirmDialog
        open={deleting !== null}
        title="Delete this dyno run?"
        confirmLabel="Delete the run"
        busy={remove.isPending}
        onCancel={() => setDeleting(null)}
        onConfirm={() => deleting && remove.mutate(deleting.id, { onSettled: () => setDeleting(null), onError: (err) => setMessage({ tone: 'danger', text: err.message }) })}
      >
        The run of {deleting?.date} and its curve go for good. Figures already taken from it stay as they are.
      </ConfirmDialog>
    </EditorSection>
  );
}

/** The photo of the printed dyno sheet kept with a run, opened at its largest size. */
function SheetPhotoLink({ build, photoId }: { build: OwnerBuild; photoId: number | undefined }) {
  const photo = photoId ? build.photos.find((p) => p.id === photoId) : undefined;
  const largest = photo?.sources[photo.sources.length - 1];
  if (!largest) return null;
  return (
    <a href={largest.jpeg} target="_blank" rel="noopener" className="inline-flex min-h-11 items-center text-sm underline underline-offset-4">
      Photo of the printed sheet ↗
    </a>
  );
}
