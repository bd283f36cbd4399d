import { useState } from 'react';
import { useFieldArray, useForm, type Path } from 'react-hook-form';
import { sheetEditable } from '@shared/event-lifecycle';
import { JudgingSheetSchema, type JudgingSheetInput } from '@shared/schemas/show-classes';
import { type EventDetail } from '@shared/schemas/show';
import { applyServerErrors, serverFieldsUnder } from '@client/lib/form-errors';
import { numberOrNull, resolverFor } from '@client/lib/form-resolver';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/notice';
import { Panel } from '@client/components/ui/panel';
import { TextField } from '@client/components/ui/text-field';
import { useSaveJudgingSheet } from '../api/save-judging-sheet';

/** A criterion as typed: numbers are text until the sheet is checked. */
type Row = { name: string; maxPoints: string; weight: string; tieBreakOrder: string };
type SheetValues = { criteria: Row[] };
const toRows = (show: EventDetail): Row[] => show.criteria.map((c) => ({ name: c.name, maxPoints: String(c.maxPoints), weight: String(c.weight), tieBreakOrder: c.tieBreakOrder ? String(c.tieBreakOrder) : '' }));
// An empty points or weight box is no number at all (the schema says so), not zero.
const sheetResolver = resolverFor(JudgingSheetSchema, (v: SheetValues) => ({
  criteria: v.criteria.map((r) => ({ name: r.name, maxPoints: numberOrNull(r.maxPoints) ?? undefined, weight: numberOrNull(r.weight) ?? undefined, tieBreakOrder: numberOrNull(r.tieBreakOrder) })),
}));

/** The judging sheet: criteria with points, weight and tie-break place; saved whole, fixed once judging starts. */
export function JudgingSheetPanel({ show }: { show: EventDetail }) {
  const editable = show.abilities.manage && sheetEditable(show.status);
  const maxTotal = show.criteria.reduce((t, c) => t + c.maxPoints * c.weight, 0);

  if (!editable) {
    return (
      <Panel title="Judging sheet">
        {show.criteria.length === 0 ? <p className="text-graphite">The organiser has not written the sheet yet.</p> : null}
        <table className="w-full text-left">
          <thead className="text-sm text-graphite">
            <tr><th className="py-1">Criterion</th><th>Points</th><th>Weight</th><th>Tie-break</th></tr>
          </thead>
          <tbody>
            {show.criteria.map((c) => (
              <tr key={c.id} className="border-t border-rule">
                <td className="py-2">{c.name}</td><td>0–{c.maxPoints}</td><td>× {c.weight}</td><td>{c.tieBreakOrder ?? '—'}</td>
              </tr>
            ))}
          </tbody>
        </table>
        {show.criteria.length ? <p className="mt-2 text-sm text-graphite">Highest weighted total: {maxTotal}. {sheetEditable(show.status) ? 'The organiser can still change it until judging starts.' : 'Fixed: judging has started.'}</p> : null}
      </Panel>
    );
  }

  return <SheetEditor show={show} />;
}

/** The organiser's editor of the sheet, saved whole. */
function SheetEditor({ show }: { show: EventDetail }) {
  const save = useSaveJudgingSheet(show.id);
  const [formError, setFormError] = useState('');
  const { register, control, handleSubmit, reset, setError, formState: { errors, isDirty } } = useForm<SheetValues, unknown, JudgingSheetInput>({ resolver: sheetResolver, defaultValues: { criteria: toRows(show) } });
  const rows = useFieldArray({ control, name: 'criteria' });
  const submit = handleSubmit((input) => {
    setFormError('');
    save.mutate(input, {
      onSuccess: ({ event }) => reset({ criteria: toRows(event) }),
      onError: (err) => setFormError(applyServerErrors(err, setError, serverFieldsUnder(err, ['criteria']) as Path<SheetValues>[])),
    });
  });
  const rowError = (i: number, k: keyof Row) => errors.criteria?.[i]?.[k]?.message;

  return (
    <Panel title="Judging sheet">
      <p className="mb-3 text-graphite">Each criterion is scored from 0 to its points, times its weight. Ties are broken by the criteria with a tie-break place, 1 first. The sheet is fixed once judging starts.</p>
      <form onSubmit={submit} noValidate>
      <ol className="flex flex-col gap-3">
        {rows.fields.map((field, i) => (
          // The name has its own line and the number columns may shrink (minmax(0, …)), so the row's Remove
          // stays inside the panel however narrow it is: inputs alone would push the last column out.
          <li key={field.id} className="grid grid-cols-[minmax(0,1fr)_minmax(0,1fr)_minmax(0,1fr)_auto] items-end gap-2 border-b border-rule pb-3">
            <TextField label={`Criterion ${i + 1}`} className="col-span-4" {...register(`criteria.${i}.name`)} error={rowError(i, 'name')} />
            <TextField label="Points" inputMode="numeric" {...register(`criteria.${i}.maxPoints`)} error={rowError(i, 'maxPoints')} />
            <TextField label="Weight" inputMode="decimal" {...register(`criteria.${i}.weight`)} error={rowError(i, 'weight')} />
            <TextField label="Tie-break place" inputMode="numeric" {...register(`criteria.${i}.tieBreakOrder`)} error={rowError(i, 'tieBreakOrder')} />
            <Button type="button" variant="quiet" onClick={() => rows.remove(i)} aria-label={`Remove criterion ${i + 1}`}>
              Remove
            </Button>
          </li>
        ))}
      </ol>
      <div className="mt-3 flex flex-wrap gap-2">
        <Button type="button" variant="secondary" onClick={() => rows.append({ name: '', maxPoints: '10', weight: '1', tieBreakOrder: '' })}>
          Add a criterion
        </Button>
        <Button type="submit" busy={save.isPending}>
          Save the sheet
        </Button>
      </div>
      </form>
      {save.isSuccess && !isDirty ? <Notice tone="ok">Saved.</Notice> : null}
      {errors.criteria?.message ? <Notice tone="danger">{errors.criteria.message}</Notice> : null}
      {formError ? <Notice tone="danger">{formError}</Notice> : null}
    </Panel>
  );
}
