import { WheelsSectionSchema, type WheelsSection } from '@shared/schemas/build-sections';
import type { OwnerBuild } from '@shared/schemas/build';
import { useSaveSection } from '../../api/save-section';
import { useEditorForm } from '../editor/use-editor-form';
import { MADE_BY_BLANKS, withBlanks } from '../editor/form-values';
import { FieldGroup, SectionForm } from '../editor/section-form';
import { FigureField, MadeByFields, NumberField, TextInput } from '../editor/fields';
import { SectionNumbers } from '../numbers/numbers-panel';

const END_TEXT = ['construction', 'tyreSize', 'tyre'];
const TEXT = [...END_TEXT.map((k) => `front.${k}`), ...END_TEXT.map((k) => `rear.${k}`), ...MADE_BY_BLANKS];
const fromBuild = (b: OwnerBuild) => {
  const values = withBlanks<WheelsSection>(b.sections.wheels, TEXT);
  return { ...values, raked: values.raked ?? false };
};
const FIELDS = Object.keys(WheelsSectionSchema.shape);

export function WheelsForm({ build }: { build: OwnerBuild }) {
  const mutation = useSaveSection(build.id, 'wheels');
  const { form, panel } = useEditorForm<WheelsSection, WheelsSection>({ formKey: 'wheels', schema: WheelsSectionSchema, fromBuild, mutation, fields: FIELDS });
  const { register, control, formState: { errors } } = form;
  const f = { register, errors, form: 'wheels' as const };
  return (
    <SectionForm id="wheels" title="Wheels and tyres" {...panel} below={<SectionNumbers section="wheels" />}>
      <p className="text-sm text-graphite">Staggered sizes front and rear are normal. Rim sizes are in inches, as the trade quotes them.</p>
      {(['front', 'rear'] as const).map((end) => (
        <FieldGroup key={end} title={end === 'front' ? 'Front wheels' : 'Rear wheels'}>
          <TextInput {...f} name={`${end}.tyreSize`} label="Tyre size" hint="e.g. 245/40R18, P215/65R15 or 33x12.50R15" />
          <TextInput {...f} name={`${end}.tyre`} label="Tyre (make and pattern in your words)" />
          <NumberField {...f} name={`${end}.rimDiameterIn`} label="Rim diameter (in)" />
          <NumberField {...f} name={`${end}.rimWidthIn`} label="Rim width (in)" />
          <FigureField control={control} form="wheels" name={`${end}.offset`} label="Offset (ET)" kind="length" defaultUnit="mm" hint="Positive: the mounting face sits outboard of the rim’s centreline." />
          <FigureField control={control} form="wheels" name={`${end}.backspacing`} label="Backspacing, if measured" kind="length" hint="Overrides the one worked out from the offset." />
          <TextInput {...f} name={`${end}.construction`} label="Wheel construction" hint="e.g. two-piece forged" />
          <FigureField control={control} form="wheels" name={`${end}.pressure`} label="Tyre pressure" kind="pressure" />
        </FieldGroup>
      ))}
      <label className="flex min-h-11 items-center gap-3">
        <input type="checkbox" className="h-5 w-5 accent-ink" {...register('raked')} />
        <span>Raked on purpose (a smaller tyre in front is meant, not a mismatch)</span>
      </label>
      <MadeByFields register={register} errors={errors} control={control} />
    </SectionForm>
  );
}
