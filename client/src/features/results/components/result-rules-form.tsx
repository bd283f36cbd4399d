import { useState, type InputHTMLAttributes, type Ref } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import type { ShowResultRules } from '@shared/schemas/judging';
import { PRINT_PAPERS, PRINT_PAPER_LABELS, ResultRulesUpdateSchema, type PrintPaper, type ResultRulesUpdateInput } from '@shared/schemas/results';
import { applyServerErrors } from '@client/lib/form-errors';
import { resolverFor } from '@client/lib/form-resolver';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/notice';
import { SelectField } from '@client/components/ui/select-field';
import { useSaveResultRules } from '../api/save-result-rules';

/** Trimming drops the single highest and lowest sheet once a car has this many finished sheets. */
const TRIM_FROM = 5;

function Check({ label, ref, ...input }: InputHTMLAttributes<HTMLInputElement> & { label: string; ref?: Ref<HTMLInputElement> }) {
  return (
    <label className="inline-flex min-h-11 items-center gap-3">
      <input type="checkbox" className="h-5 w-5" ref={ref} {...input} />
      {label}
    </label>
  );
}

/** The rules as the boxes hold them: places as the picked option's text, trimming as a tick. */
type RulesValues = Omit<ShowResultRules, 'placesPerClass' | 'trimFromSheets' | 'printPaper'> & { placesPerClass: string; trim: boolean; printPaper: PrintPaper };

const valuesFrom = (rules: ShowResultRules): RulesValues => ({
  placesPerClass: String(rules.placesPerClass),
  trim: rules.trimFromSheets !== null,
  bestOfShow: rules.bestOfShow,
  bestOfShowKeepsClassPlace: rules.bestOfShowKeepsClassPlace,
  shareCommentsWithEntrants: rules.shareCommentsWithEntrants,
  printPaper: rules.printPaper,
});

/** How the show turns sheets into places: set before publishing, fixed after. */
export function ResultRulesForm({ eventId, rules, locked }: { eventId: number; rules: ShowResultRules; locked: boolean }) {
  const save = useSaveResultRules(eventId);
  const [formError, setFormError] = useState('');
  // A tick keeps the show's own trimming threshold; a new tick starts at TRIM_FROM.
  const [resolver] = useState(() =>
    resolverFor(ResultRulesUpdateSchema, (v: RulesValues) => ({
      placesPerClass: Number(v.placesPerClass),
      trimFromSheets: v.trim ? (rules.trimFromSheets ?? TRIM_FROM) : null,
      // A box the browser disabled may read as no value: that is "no".
      bestOfShow: Boolean(v.bestOfShow),
      bestOfShowKeepsClassPlace: Boolean(v.bestOfShowKeepsClassPlace),
      shareCommentsWithEntrants: Boolean(v.shareCommentsWithEntrants),
      printPaper: v.printPaper,
    })),
  );
  const { register, control, handleSubmit, setError, formState: { errors } } = useForm<RulesValues, unknown, ResultRulesUpdateInput>({ resolver, defaultValues: valuesFrom(rules) });
  const bestOfShow = useWatch({ control, name: 'bestOfShow' });
  const submit = handleSubmit((input) => {
    setFormError('');
    save.mutate(input, { onError: (err) => setFormError(applyServerErrors(err, setError, ['placesPerClass', 'printPaper'])) });
  });
  const otherErrors = Object.entries(errors).filter(([field]) => field !== 'placesPerClass' && field !== 'printPaper');
  return (
    <form className="flex flex-col gap-2" aria-label="Result rules" noValidate onSubmit={submit}>
      <SelectField
        label="Places per class"
        className="max-w-48"
        disabled={locked}
        {...register('placesPerClass')}
        options={Array.from({ length: 10 }, (_, i) => ({ value: String(i + 1), label: i === 0 ? '1st only' : `1st to ${i + 1}` }))}
        error={errors.placesPerClass?.message}
      />
      <Check label={`Trimmed mean: drop the single highest and lowest sheet when a car has ${TRIM_FROM} or more`} disabled={locked} {...register('trim')} />
      <Check label="Award best of show" disabled={locked} {...register('bestOfShow')} />
      <Check label="Best of show also keeps its class place" disabled={locked || !bestOfShow} {...register('bestOfShowKeepsClassPlace')} />
      <Check label="Entrants see the judges’ comments" disabled={locked} {...register('shareCommentsWithEntrants')} />
      <SelectField
        label="Paper for the results sheet and certificates"
        className="max-w-72"
        disabled={locked}
        {...register('printPaper')}
        options={PRINT_PAPERS.map((p) => ({ value: p, label: PRINT_PAPER_LABELS[p] }))}
        error={errors.printPaper?.message}
      />
      {otherErrors.map(([field, error]) => (error?.message ? <Notice key={field} tone="danger">{error.message}</Notice> : null))}
      {formError ? <Notice tone="danger">{formError}</Notice> : null}
      {save.isSuccess && !save.isPending ? <Notice tone="ok">Rules saved.</Notice> : null}
      {locked ? <p className="text-graphite">The results are published with these rules; they no longer change.</p> : (
        <div>
          <Button type="submit" variant="secondary" busy={save.isPending}>
            Save the rules
          </Button>
        </div>
      )}
    </form>
  );
}
