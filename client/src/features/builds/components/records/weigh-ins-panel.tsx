import { useState } from 'react';
import type { OwnerBuild, WeighIn } from '@shared/schemas/build';
import { FUEL_LEVEL_LABELS, inText } from '@shared/build-sheet/choice-labels';
import { cornerWeights, formatNumber, formatPercent, formatQuantity, toSystem, type Unit } from '@shared/calc';
import { Button } from '@client/components/ui/button';
import { ConfirmDialog } from '@client/components/ui/confirm-dialog';
import { Notice } from '@client/components/ui/notice';
import { useApplyWeighIn } from '../../api/apply-weigh-in';
import { useDeleteWeighIn } from '../../api/delete-weigh-in';
import { EditorSection } from '../editor/section-form';
import { attempt } from '../../model/numbers/read';
import { WeighInForm } from './weigh-in-form';

/** A scale reading with the decimals it was given (up to two). */
const asTyped = (v: number) => formatNumber(v, { decimals: Number.isInteger(v) ? 0 : Number.isInteger(Math.round(v * 1000) / 100) ? 1 : 2 });

const newestFirst = (a: WeighIn, b: WeighIn) => (a.date < b.date ? 1 : a.date > b.date ? -1 : b.id - a.id);

/** The total in the other unit system, e.g. "≈ 3,411 lb" beside kilograms. */
function otherSystem(value: number, unit: WeighIn['unit']): string {
  const r = attempt(() => toSystem('mass', { value, unit }, unit === 'kg' ? 'imperial' : 'metric'));
  return r.ok ? `≈ ${formatQuantity(r.value as { value: number; unit: Unit })}` : '';
}

function Corners({ w }: { w: WeighIn }) {
  const c = attempt(() => cornerWeights(w));
  const cell = (label: string, v: number) => (
    <div className="border border-rule px-2 py-1 text-center">
      <span className="block text-xs text-graphite">{label}</span>
      <span className="font-display tabular-nums">{formatNumber(v)}</span>
    </div>
  );
  return (
    <div className="flex flex-wrap items-center gap-4">
      <div className="grid w-44 grid-cols-2 gap-1" role="group" aria-label={`Corners in ${w.unit}, front at the top`}>
        <span className="col-span-2 text-xs text-graphite">Corners, {w.unit} (front at the top)</span>
        {cell('LF', w.leftFront)}
        {cell('RF', w.rightFront)}
        {cell('LR', w.leftRear)}
        {cell('RR', w.rightRear)}
      </div>
      {c.ok ? (
        <table className="text-sm">
          <tbody>
            <tr><th scope="row" className="pr-3 text-left font-normal text-graphite">Total</th><td className="tabular-nums"><span className="font-display">{formatNumber(c.value.total)} {w.unit}</span> <span className="text-graphite">{otherSystem(c.value.total, w.unit)}</span></td></tr>
            <tr><th scope="row" className="pr-3 text-left font-normal text-graphite">Front / rear</th><td>{formatPercent(c.value.frontPercent)} / {formatPercent(c.value.rearPercent)}</td></tr>
            <tr><th scope="row" className="pr-3 text-left font-normal text-graphite">Left / right</th><td>{formatPercent(c.value.leftPercent)} / {formatPercent(c.value.rightPercent)}</td></tr>
            <tr><th scope="row" className="pr-3 text-left font-normal text-graphite">Cross</th><td>{formatPercent(c.value.crossPercent)}</td></tr>
          </tbody>
        </table>
      ) : null}
    </div>
  );
}

export function WeighInsPanel({ build }: { build: OwnerBuild }) {
  const list = [...build.weighIns].sort(newestFirst);
  const [adding, setAdding] = useState(false);
  const [deleting, setDeleting] = useState<WeighIn | null>(null);
  const [message, setMessage] = useState<{ tone: 'ok' | 'danger'; text: string } | null>(null);
  const apply = useApplyWeighIn(build.id);
  const remove = useDeleteWeighIn(build.id);
  return (
    <EditorSection id="weighIns" title="Weigh-ins">
      <div className="flex flex-col gap-4">
        {message ? <Notice tone={message.tone}>{message.text}</Notice> : null}
        {list.length === 0 ? <p className="text-sm text-graphite">No weigh-ins yet. Four corner scales give the weight and its splits; a tilted reading adds the centre-of-gravity height.</p> : null}
        <ul className="flex flex-col gap-3">
          {list.map((w) => (
            <li key={w.id} className="border border-rule p-3">
              <p className="font-display uppercase">
                {w.date} · {w.withDriver ? 'with driver' : 'no driver'} · fuel: {inText(FUEL_LEVEL_LABELS[w.fuelLevel])}
              </p>
              {w.note ? <p className="text-sm text-graphite">{w.note}</p> : null}
              <div className="mt-2">
                <Corners w={w} />
              </div>
              {w.tilt ? (
                <p className="mt-2 text-sm">
                  Tilted: {w.tilt.raisedAxle} axle raised {formatNumber(w.tilt.raisedHeightMm)} mm; the {w.tilt.raisedAxle === 'front' ? 'rear' : 'front'} scales then read {asTyped(w.tilt.leftRaised)} + {asTyped(w.tilt.rightRaised)} {w.unit}; wheel centres {formatNumber(w.tilt.wheelCentreHeightMm)} mm up.
                </p>
              ) : null}
              <div className="mt-2 flex flex-wrap gap-2">
                <Button
                  type="button"
                  variant="secondary"
                  busy={apply.isPending && apply.variables === w.id}
                  onClick={() => apply.mutate(w.id, { onSuccess: () => setMessage({ tone: 'ok', text: `The build’s weight is now measured on ${w.date}. The earlier figure is kept in the history.` }), onError: (err) => setMessage({ tone: 'danger', text: err.message }) })}
                >
                  Use as the build’s weight
                </Button>
                <Button type="button" variant="quiet" onClick={() => setDeleting(w)}>
                  Delete
                </Button>
              </div>
            </li>
          ))}
        </ul>
        {adding ? (
          <WeighInForm build={build} onDone={() => setAdding(false)} />
        ) : (
          <Button type="button" className="self-start" onClick={() => setAdding(true)}>
            Add a weigh-in
          </Button>
        )}
      </div>
      <ConfirmDialog
        open={deleting !== null}
        title="Delete this weigh-in?"
        confirmLabel="Delete the weigh-in"
        busy={remove.isPending}
        onCancel={() => setDeleting(null)}
        onConfirm={() => deleting && remove.mutate(deleting.id, { onSettled: () => setDeleting(null), onError: (err) => setMessage({ tone: 'danger', text: err.message }) })}
      >
        The weigh-in of {deleting?.date} goes for good. A weight already taken from it stays as it is.
      </ConfirmDialog>
    </EditorSection>
  );
}
