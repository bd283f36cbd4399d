import { useFieldArray } from 'react-hook-form';
import { ExtraSectionSchema, type ExtraSection } from '@shared/schemas/build-sections';
import type { OwnerBuild } from '@shared/schemas/build';
import { Button } from '@client/components/ui/button';
import { GrowingTextField } from '@client/components/ui/growing-text-field';
import { useSaveSection } from '../../api/save-section';
import { useEditorForm } from '../editor/use-editor-form';
import { MADE_BY_BLANKS, withBlanks } from '../editor/form-values';
import { SectionForm } from '../editor/section-form';
import { errorAt, LIST_ROW as ROW } from '../editor/fields';

const fromBuild = (b: OwnerBuild) => {
  const values = withBlanks<ExtraSection>(b.sections.extra, MADE_BY_BLANKS);
  return { ...values, lines: values.lines ?? [] };
};
const FIELDS = Object.keys(ExtraSectionSchema.shape);

export function ExtraForm({ build }: { build: OwnerBuild }) {
  const mutation = useSaveSection(build.id, 'extra');
  const { form, panel } = useEditorForm<ExtraSection, ExtraSection>({ formKey: 'extra', schema: ExtraSectionSchema, fromBuild, mutation, fields: FIELDS });
  const { register, control, formState: { errors } } = form;
  const { fields, append, remove } = useFieldArray({ control, name: 'lines' });
  return (
    <SectionForm id="extra" title="Extra lines" {...panel}>
      <p className="text-sm text-graphite">For what the form lacks: a label and a value per line. Who made a part and why goes with its section above.</p>
      <ol className="flex flex-col gap-3">
        {fields.map((field, i) => (
          <li key={field.id} className={ROW}>
            <GrowingTextField label="Label" placeholder="e.g. Wiring" {...register(`lines.${i}.label`)} error={errorAt(errors, `lines.${i}.label`)} />
            <GrowingTextField label="Value" {...register(`lines.${i}.value`)} error={errorAt(errors, `lines.${i}.value`)} />
            <Button type="button" variant="quiet" className="justify-self-start sm:mt-6" aria-label={`Remove line ${i + 1}`} onClick={() => remove(i)}>
              Remove
            </Button>
          </li>
        ))}
      </ol>
      {fields.length < 30 ? (
        <Button type="button" variant="secondary" className="self-start" onClick={() => append({ label: '', value: '' })}>
          Add a line
        </Button>
      ) : null}
    </SectionForm>
  );
}
