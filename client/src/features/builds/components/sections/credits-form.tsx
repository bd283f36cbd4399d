import { useFieldArray } from 'react-hook-form';
import { CREDIT_ROLES, CreditsSchema, type Credit, type OwnerBuild } from '@shared/schemas/build';
import { Button } from '@client/components/ui/button';
import { TextField } from '@client/components/ui/text-field';
import { GrowingTextField } from '@client/components/ui/growing-text-field';
import { useSaveCredits } from '../../api/save-credits';
import { useEditorForm } from '../editor/use-editor-form';
import { SectionForm } from '../editor/section-form';
import { withoutTrailingBlankRows } from '../editor/form-values';
import { errorAt, LIST_ROW as ROW } from '../editor/fields';

type CreditValues = { credits: Credit[] };
const fromBuild = (b: OwnerBuild): CreditValues => ({ credits: b.credits.map((c) => ({ ...c })) });

/** Sent as typed (the schema trims), less a row just added and still blank. */
const asSent = (v: CreditValues): CreditValues => ({ credits: withoutTrailingBlankRows(v.credits) });

export function CreditsForm({ build }: { build: OwnerBuild }) {
  const mutation = useSaveCredits(build.id);
  const { form, panel } = useEditorForm<CreditValues, CreditValues>({ formKey: 'credits', schema: CreditsSchema, fromBuild, clean: asSent, mutation, fields: ['credits'] });
  const { register, control, formState: { errors } } = form;
  const { fields, append, remove } = useFieldArray({ control, name: 'credits' });
  return (
    <SectionForm id="credits" title="Credits" {...panel}>
      <p className="text-sm text-graphite">Who did what: paint, body, chassis, engine build, upholstery. Shown on the public page and the card.</p>
      <datalist id="credit-roles">
        {CREDIT_ROLES.map((r) => (
          <option key={r} value={r} />
        ))}
      </datalist>
      {fields.length === 0 ? <p className="text-sm text-graphite">No credits yet.</p> : null}
      <ol className="flex flex-col gap-3">
        {fields.map((field, i) => (
          <li key={field.id} className={ROW}>
            <TextField label="Role" list="credit-roles" placeholder="e.g. paint" {...register(`credits.${i}.role`)} error={errorAt(errors, `credits.${i}.role`)} />
            <GrowingTextField label="Name" placeholder="Shop or person" {...register(`credits.${i}.name`)} error={errorAt(errors, `credits.${i}.name`)} />
            <Button type="button" variant="quiet" className="justify-self-start sm:mt-6" aria-label={`Remove credit ${i + 1}`} onClick={() => remove(i)}>
              Remove
            </Button>
          </li>
        ))}
      </ol>
      {fields.length < 40 ? (
        <Button type="button" variant="secondary" className="self-start" onClick={() => append({ role: '', name: '' })}>
          Add a credit
        </Button>
      ) : null}
    </SectionForm>
  );
}
