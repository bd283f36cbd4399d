import { useState } from 'react';
import type { ShowResultRules } from '@shared/schemas/judging';
import { PRINT_PAPERS, PRINT_PAPER_LABELS, ResultRulesUpdateSchema, type PrintPaper } from '@shared/schemas/results';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/notice';
import { SelectField } from '@client/components/ui/select-field';
import { useSaveResultRules } from '../api/save-result-rules';

/** Trimming drops the single highest and lowest sheet once a car has this many finished sheets. */
const TRIM_FROM = 5;

function Check({ label, checked, onChange, disabled }: { label: string; checked: boolean; onChange: (v: boolean) => void; disabled: boolean }) {
  return (
    <label className="inline-flex min-h-11 items-center gap-3">
      <input type="checkbox" className="h-5 w-5" checked={checked} disabled={disabled} onChange={(e) => onChange(e.target.checked)} />
      {label}
    </label>
  );
}

/** How the show turns sheets into places: set before publishing, fixed after. */
export function ResultRulesForm({ eventId, rules, locked }: { eventId: number; rules: ShowResultRules; locked: boolean }) {
  const save = useSaveResultRules(eventId);
  const [draft, setDraft] = useState(rules);
  const set = <K extends keyof ShowResultRules>(key: K, value: ShowResultRules[K]) => setDraft((d) => ({ ...d, [key]: value }));
  const parsed = ResultRulesUpdateSchema.safeParse(draft);
  return (
    <form
      className="flex flex-col gap-2"
      aria-label="Result rules"
      onSubmit={(e) => {
        e.preventDefault();
        if (parsed.success) save.mutate(parsed.data);
      }}
    >
      <SelectField
        label="Places per class"
        className="max-w-48"
        disabled={locked}
        value={String(draft.placesPerClass)}
        options={Array.from({ length: 10 }, (_, i) => ({ value: String(i + 1), label: i === 0 ? '1st only' : `1st to ${i + 1}` }))}
        onChange={(e) => set('placesPerClass', Number(e.target.value))}
      />
      <Check label={`Trimmed mean: drop the single highest and lowest sheet when a car has ${TRIM_FROM} or more`} checked={draft.trimFromSheets !== null} disabled={locked} onChange={(v) => set('trimFromSheets', v ? TRIM_FROM : null)} />
      <Check label="Award best of show" checked={draft.bestOfShow} disabled={locked} onChange={(v) => set('bestOfShow', v)} />
      <Check label="Best of show also keeps its class place" checked={draft.bestOfShowKeepsClassPlace} disabled={locked || !draft.bestOfShow} onChange={(v) => set('bestOfShowKeepsClassPlace', v)} />
      <Check label="Entrants see the judges’ comments" checked={draft.shareCommentsWithEntrants} disabled={locked} onChange={(v) => set('shareCommentsWithEntrants', v)} />
      <SelectField
        label="Paper for the results sheet and certificates"
        className="max-w-72"
        disabled={locked}
        value={draft.printPaper}
        options={PRINT_PAPERS.map((p) => ({ value: p, label: PRINT_PAPER_LABELS[p] }))}
        onChange={(e) => set('printPaper', e.target.value as PrintPaper)}
      />
      {save.isError ? <Notice tone="danger">{save.error.message}</Notice> : null}
      {save.isSuccess && !save.isPending ? <Notice tone="ok">Rules saved.</Notice> : null}
      {locked ? <p className="text-graphite">The results are published with these rules; they no longer change.</p> : (
        <div>
          <Button type="submit" variant="secondary" busy={save.isPending} disabled={!parsed.success}>
            Save the rules
          </Button>
        </div>
      )}
    </form>
  );
}
