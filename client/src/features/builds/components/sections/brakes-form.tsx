import { BRAKE_TYPES, BrakesSectionSchema, type BrakesSection } from '@shared/schemas/build-sections';
import type { OwnerBuild } from '@shared/schemas/build';
import { BRAKE_TYPE_LABELS } from '@shared/build-sheet/choice-labels';
import { useSaveSection } from '../../api/save-section';
import { useEditorForm } from '../editor/use-editor-form';
import { MADE_BY_BLANKS, withBlanks } from '../editor/form-values';
import { FieldGroup, SectionForm } from '../editor/section-form';
import { Choice, FigureField, MadeByFields, NumberField, TextInput } from '../editor/fields';

const END_TEXT = ['type', 'caliper', 'pad'];
const TEXT = [...END_TEXT.map((k) => `front.${k}`), ...END_TEXT.map((k) => `rear.${k}`), 'masterCylinder', 'booster', 'parkingBrake', ...MADE_BY_BLANKS];
const fromBuild = (b: OwnerBuild) => withBlanks<BrakesSection>(b.sections.brakes, TEXT);
const FIELDS = Object.keys(BrakesSectionSchema.shape);

export function BrakesForm({ build }: { build: OwnerBuild }) {
  const mutation = useSaveSection(build.id, 'brakes');
  const { form, panel } = useEditorForm<BrakesSection, BrakesSection>({ formKey: 'brakes', schema: BrakesSectionSchema, fromBuild, mutation, fields: FIELDS });
  const { register, control, formState: { errors } } = form;
  const f = { register, errors, form: 'brakes' as const };
  return (
    <SectionForm id="brakes" title="Brakes" caution {...panel}>
      {(['front', 'rear'] as const).map((end) => (
        <FieldGroup key={end} title={end === 'front' ? 'Front brakes' : 'Rear brakes'}>
          <Choice {...f} name={`${end}.type`} label="Type" options={BRAKE_TYPES} labels={BRAKE_TYPE_LABELS} />
          <NumberField {...f} name={`${end}.caliperPistons`} label="Caliper pistons" />
          <FigureField control={control} form="brakes" name={`${end}.rotorDiameter`} label="Rotor or drum diameter" kind="length" />
          <FigureField control={control} form="brakes" name={`${end}.rotorThickness`} label="Rotor thickness" kind="length" />
          <TextInput {...f} name={`${end}.caliper`} label="Calipers" />
          <TextInput {...f} name={`${end}.pad`} label="Pads" />
        </FieldGroup>
      ))}
      <div className="grid gap-4 sm:grid-cols-2">
        <TextInput {...f} name="masterCylinder" label="Master cylinder" />
        <TextInput {...f} name="booster" label="Booster" />
        <TextInput {...f} name="parkingBrake" label="Parking brake" />
      </div>
      <MadeByFields register={register} errors={errors} control={control} />
    </SectionForm>
  );
}
