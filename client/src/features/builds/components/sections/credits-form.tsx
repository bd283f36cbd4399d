import { useFieldArray } from 'react-hook-form';
import { CREDIT_ROLES, CreditsSchema, type Credit, type OwnerBuild } from '@shared/schemas/build';
import { Button } from '@client/components/ui/button';
import { TextField } from '@client/components/ui/text-field';
import { useSaveCredits } from '../../api/save-credits';
import { useEditorForm } from '../editor/use-editor-form';
import { SectionForm } from '../editor/section-form';
import { errorAt } from '../editor/fields';

type CreditValues = { credits: Credit[] };
const fromBuild = (b: OwnerBuild): CreditValues => ({ credits: b.credits.map((c) => ({ ...c })) });

/** Sent as typed: the schema trims, and an emptied box clears the saved value. */
const asSent = <V,>(v: V) => v;

export function CreditsForm({ build }: { build: OwnerBuild }) {
  const mutation = useSaveCredits(build.id);
  const { form, onSubmit, formError, status, saving } = useEditorForm<CreditValues, CreditValues>({ formKey: 'credits', schema: CreditsSchema, fromBuild, clean: asSent, mutation, fields: ['credits'] });
  const { register, control, formState: { errors } } = form;
  const { fields, append, remove } = useFieldArray({ control, name: 'credits' });
  return (
    <SectionForm id="credits" title="Credits" status={status} formError={formError} saving={saving} onSubmit={onSubmit}>
      <p className="text-sm text-graphite">Who did what: paint, body, chassis, engine build, upholstery. Shown on the public page and the card.</p>
      <datalist id="credit-roles">
        {CREDIT_ROLES.map((r) => (
          <option key={r} value={r} />
        ))}
      </datalist>
      {fields.length === 0 ? <p className="text-sm text-graphite">No credits yet.</p> : null}
      <ol className="flex flex-col gap-3">
        {fields.map((field, i) => (
          <li key={field.id} className="grid gap-2 border-b border-rule pb-3 sm:grid-cols-[1fr_2fr_auto] sm:items-end">
            <TextField label="Role" list="credit-roles" placeholder="e.g. paint" {...register(`credits.${i}.role`)} error={errorAt(errors, `credits.${i}.role`)} />
            <TextField label="Name" placeholder="Shop or person" {...register(`credits.${i}.name`)} error={errorAt(errors, `credits.${i}.name`)} />
            <Button type="button" variant="quiet" onClick={() => remove(i)}>
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
