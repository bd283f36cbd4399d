import { useFieldArray } from 'react-hook-form';
import { CREDIT_LIMITS, CREDIT_ROLES, CreditsSchema, type Credit, type OwnerBuild } from '@shared/schemas/build';
import { Button } from '@client/components/ui/button';
import { GrowingTextField } from '@client/components/ui/growing-text-field';
import { useSaveCredits } from '../../api/save-credits';
import { useEditorForm } from '../editor/use-editor-form';
import { SectionForm } from '../editor/section-form';
import { withoutTrailingBlankRows } from '../editor/form-values';
import { errorAt } from '../editor/fields';

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
      <p className="text-sm text-graphite">Who did what ({CREDIT_ROLES.filter((r) => r !== 'other').join(', ')}…). Shown on the public page and the card.</p>
      {fields.length === 0 ? <p className="text-sm text-graphite">No credits yet.</p> : null}
      <ol className="flex flex-col gap-3">
        {fields.map((field, i) => (
          // Role and name each take the row's width and wrap (a role runs to 60 characters), Remove beside the role.
          <li key={field.id} className="grid min-w-0 grid-cols-[minmax(0,1fr)_auto] items-start gap-2 border-b border-rule pb-3">
            <GrowingTextField label="Role" placeholder="e.g. paint" maxLength={CREDIT_LIMITS.role} {...register(`credits.${i}.role`)} error={errorAt(errors, `credits.${i}.role`)} />
            <Button type="button" variant="quiet" className="mt-6" aria-label={`Remove credit ${i + 1}`} onClick={() => remove(i)}>
              Remove
            </Button>
            <GrowingTextField label="Name" className="col-span-2" placeholder="Shop or person" maxLength={CREDIT_LIMITS.name} {...register(`credits.${i}.name`)} error={errorAt(errors, `credits.${i}.name`)} />
          </li>
        ))}
      </ol>
      {fields.length < CREDIT_LIMITS.count ? (
        <Button type="button" variant="secondary" className="self-start" onClick={() => append({ role: '', name: '' })}>
          Add a credit
        </Button>
      ) : null}
    </SectionForm>
  );
}
