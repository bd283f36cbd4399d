import { BodySectionSchema, type BodySection } from '@shared/schemas/build-sections';
import type { OwnerBuild } from '@shared/schemas/build';
import { useSaveSection } from '../../api/save-section';
import { useEditorForm } from '../editor/use-editor-form';
import { MADE_BY_BLANKS, withBlanks } from '../editor/form-values';
import { SectionForm } from '../editor/section-form';
import { MadeByFields, errorAt } from '../editor/fields';
import { TextAreaField } from '@client/components/ui/text-area-field';
import { TextField } from '@client/components/ui/text-field';

const TEXT = ['paint', 'bodyMods', 'glass', 'seats', 'gauges', 'safety', ...MADE_BY_BLANKS];
const fromBuild = (b: OwnerBuild) => withBlanks<BodySection>(b.sections.body, TEXT);
const FIELDS = Object.keys(BodySectionSchema.shape);

export function BodyForm({ build }: { build: OwnerBuild }) {
  const mutation = useSaveSection(build.id, 'body');
  const { form, panel } = useEditorForm<BodySection, BodySection>({ formKey: 'body', schema: BodySectionSchema, fromBuild, mutation, fields: FIELDS });
  const { register, control, formState: { errors } } = form;
  return (
    <SectionForm id="body" title="Body and interior" {...panel}>
      <div className="grid gap-4 sm:grid-cols-2">
        <TextAreaField label="Paint" rows={2} {...register('paint')} error={errorAt(errors, 'paint')} />
        <TextAreaField label="Body modifications" rows={2} hint="Chop, channel, section, shaved handles…" {...register('bodyMods')} error={errorAt(errors, 'bodyMods')} />
        <TextField label="Glass" {...register('glass')} error={errorAt(errors, 'glass')} />
        <TextField label="Seats" {...register('seats')} error={errorAt(errors, 'seats')} />
        <TextField label="Gauges" {...register('gauges')} error={errorAt(errors, 'gauges')} />
        <TextAreaField label="Safety equipment" rows={2} hint="Cage, harness, fire system" {...register('safety')} error={errorAt(errors, 'safety')} />
      </div>
      <MadeByFields register={register} errors={errors} control={control} />
    </SectionForm>
  );
}
