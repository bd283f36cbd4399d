import { useState } from 'react';
import { sheetEditable } from '@shared/event-lifecycle';
import { JudgingSheetSchema } from '@shared/schemas/show-classes';
import { type EventDetail } from '@shared/schemas/show';
import { fieldsFromIssues } from '@shared/errors';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/notice';
import { Panel } from '@client/components/ui/panel';
import { TextField } from '@client/components/ui/text-field';
import { useSaveJudgingSheet } from '../api/save-judging-sheet';
import { fieldErrors } from './show-dates';

type Row = { name: string; maxPoints: string; weight: string; tieBreakOrder: string };
const toRows = (show: EventDetail): Row[] => show.criteria.map((c) => ({ name: c.name, maxPoints: String(c.maxPoints), weight: String(c.weight), tieBreakOrder: c.tieBreakOrder ? String(c.tieBreakOrder) : '' }));

/** The judging sheet: criteria with points, weight and tie-break place; saved whole, fixed once judging starts. */
export function JudgingSheetPanel({ show }: { show: EventDetail }) {
  const save = useSaveJudgingSheet(show.id);
  const [rows, setRows] = useState<Row[]>(() => toRows(show));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const editable = show.abilities.manage && sheetEditable(show.status);
  const all = { ...fieldErrors(save.error), ...errors };
  const set = (i: number, k: keyof Row, v: string) => setRows((r) => r.map((row, j) => (j === i ? { ...row, [k]: v } : row)));
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

  const submit = () => {
    const parsed = JudgingSheetSchema.safeParse({
      criteria: rows.map((r) => ({ name: r.name, maxPoints: Number(r.maxPoints), weight: Number(r.weight), tieBreakOrder: r.tieBreakOrder ? Number(r.tieBreakOrder) : null })),
    });
    if (!parsed.success) return setErrors(fieldsFromIssues(parsed.error.issues));
    setErrors({});
    save.mutate(parsed.data, { onSuccess: ({ event }) => setRows(toRows(event)) });
  };

  return (
    <Panel title="Judging sheet">
      <p className="mb-3 text-graphite">Each criterion is scored from 0 to its points, times its weight. Ties are broken by the criteria with a tie-break place, 1 first. The sheet is fixed once judging starts.</p>
      <ol className="flex flex-col gap-3">
        {rows.map((r, i) => (
          <li key={i} className="grid gap-2 border-b border-rule pb-3 sm:grid-cols-[2fr_1fr_1fr_1fr_auto] sm:items-end">
            <TextField label={`Criterion ${i + 1}`} value={r.name} onChange={(e) => set(i, 'name', e.target.value)} error={all[`criteria.${i}.name`]} />
            <TextField label="Points" inputMode="numeric" value={r.maxPoints} onChange={(e) => set(i, 'maxPoints', e.target.value)} error={all[`criteria.${i}.maxPoints`]} />
            <TextField label="Weight" inputMode="decimal" value={r.weight} onChange={(e) => set(i, 'weight', e.target.value)} error={all[`criteria.${i}.weight`]} />
            <TextField label="Tie-break place" inputMode="numeric" value={r.tieBreakOrder} onChange={(e) => set(i, 'tieBreakOrder', e.target.value)} error={all[`criteria.${i}.tieBreakOrder`]} />
            <Button type="button" variant="quiet" onClick={() => setRows((rs) => rs.filter((_, j) => j !== i))} aria-label={`Remove criterion ${i + 1}`}>
              Remove
            </Button>
          </li>
        ))}
      </ol>
      <div className="mt-3 flex flex-wrap gap-2">
        <Button type="button" variant="secondary" onClick={() => setRows((rs) => [...rs, { name: '', maxPoints: '10', weight: '1', tieBreakOrder: '' }])}>
          Add a criterion
        </Button>
        <Button type="button" busy={save.isPending} onClick={submit}>
          Save the sheet
        </Button>
      </div>
      {save.isSuccess ? <Notice tone="ok">Saved.</Notice> : null}
      {save.isError && !Object.keys(fieldErrors(save.error)).length ? <Notice tone="danger">{save.error.message}</Notice> : null}
    </Panel>
  );
}
