import { BRAKE_TYPES, BrakesSectionSchema, CALIPER_KINDS, MAX_PISTONS_PER_SIDE, MM_RANGES, RADIUS_MODELS, type BrakesSection } from '@shared/schemas/build-sections';
import { pistonDiameters } from '@shared/build-sheet/engineering-figures';
import { LengthMmField } from '../editor/length-mm-field';
import { SectionNumbers } from '../numbers/numbers-panel';
import type { OwnerBuild } from '@shared/schemas/build';
import { BRAKE_TYPE_LABELS } from '@shared/build-sheet/choice-labels';
import { useSaveSection } from '../../api/save-section';
import { useEditorForm } from '../editor/use-editor-form';
import { MADE_BY_BLANKS, cleanValues, withBlanks } from '../editor/form-values';
import { FieldGroup, SectionForm } from '../editor/section-form';
import { Choice, FigureField, MadeByFields, NumberField, TextInput } from '../editor/fields';

const END_TEXT = ['type', 'caliper', 'pad', 'caliperKind'];
const TEXT = [...END_TEXT.map((k) => `front.${k}`), ...END_TEXT.map((k) => `rear.${k}`), 'masterCylinder', 'booster', 'parkingBrake', 'hydraulics.radiusModel', ...MADE_BY_BLANKS];
const CALIPER_LABELS = { opposed: 'Opposed (fixed)', floating: 'Floating (sliding)' };
const RADIUS_LABELS = { mean: 'Mean radius (uniform wear, default)', 'uniform-pressure': 'Uniform pressure' };
type End = NonNullable<BrakesSection['front']>;
/** A sheet from before the per-piston sizes kept one size for every piston: the boxes show it per piston. */
const perPiston = (e: End | undefined): End | undefined => {
  if (!e || e.pistonDiametersMm?.length || e.pistonDiameterMm === undefined) return e;
  const { pistonDiameterMm: _old, ...rest } = e;
  const sizes = pistonDiameters(e);
  return sizes ? { ...rest, pistonDiametersMm: sizes } : e;
};
const fromBuild = (b: OwnerBuild) => {
  const v = withBlanks<BrakesSection>(b.sections.brakes, TEXT);
  return { ...v, front: perPiston(v.front), rear: perPiston(v.rear), showFigures: v.showFigures ?? false };
};
/** Boxes left empty after the last piston typed are not pistons. */
const clean = (values: BrakesSection) => {
  const out = cleanValues(values) as BrakesSection;
  for (const end of ['front', 'rear'] as const) {
    const e = out[end];
    if (!e?.pistonDiametersMm) continue;
    const sizes = [...e.pistonDiametersMm];
    while (sizes.length && sizes[sizes.length - 1] === undefined) sizes.pop();
    if (sizes.length) e.pistonDiametersMm = sizes;
    else delete e.pistonDiametersMm;
  }
  // An end left with nothing in it says nothing (else an untouched panel would count as an edit).
  return cleanValues(out) as BrakesSection;
};
const FIELDS = Object.keys(BrakesSectionSchema.shape);

export function BrakesForm({ build }: { build: OwnerBuild }) {
  const mutation = useSaveSection(build.id, 'brakes');
  const { form, panel } = useEditorForm<BrakesSection, BrakesSection>({ formKey: 'brakes', schema: BrakesSectionSchema, fromBuild, clean, mutation, fields: FIELDS });
  const { register, control, formState: { errors } } = form;
  const f = { register, errors, form: 'brakes' as const };
  return (
    <SectionForm id="brakes" title="Brakes" caution {...panel} below={<SectionNumbers section="brakes" />}>
      {(['front', 'rear'] as const).map((end) => (
        <FieldGroup key={end} title={end === 'front' ? 'Front brakes' : 'Rear brakes'}>
          <Choice {...f} name={`${end}.type`} label="Type" options={BRAKE_TYPES} labels={BRAKE_TYPE_LABELS} />
          <NumberField {...f} name={`${end}.caliperPistons`} label="Caliper pistons" />
          <FigureField control={control} form="brakes" name={`${end}.rotorDiameter`} label="Rotor or drum diameter" kind="length" />
          <FigureField control={control} form="brakes" name={`${end}.rotorThickness`} label="Rotor thickness" kind="length" />
          <TextInput {...f} name={`${end}.caliper`} label="Calipers" />
          <TextInput {...f} name={`${end}.pad`} label="Pads" />
          <Choice {...f} name={`${end}.caliperKind`} label="Caliper kind" options={CALIPER_KINDS} labels={CALIPER_LABELS} />
          <fieldset className="grid gap-2 sm:col-span-2 sm:grid-cols-3">
            <legend className="mb-1 text-sm text-graphite">Piston diameters: one side of an opposed caliper (the other side mirrors it), or every piston of a floating one. Leave the rest empty.</legend>
            {Array.from({ length: MAX_PISTONS_PER_SIDE }, (_, i) => (
              <LengthMmField key={i} control={control} name={`${end}.pistonDiametersMm.${i}`} range={MM_RANGES.pistonNumber(end === 'front' ? 'Front' : 'Rear', i + 1)} />
            ))}
          </fieldset>
          <LengthMmField control={control} name={`${end}.padHeightMm`} range={MM_RANGES.padHeight(end === 'front' ? 'Front' : 'Rear')} />
          <NumberField {...f} name={`${end}.padMu`} label="Pad friction coefficient (μ)" hint="Street pads are about 0.35 to 0.45." />
        </FieldGroup>
      ))}
      <div className="grid gap-4 sm:grid-cols-2">
        <TextInput {...f} name="masterCylinder" label="Master cylinder" />
        <TextInput {...f} name="booster" label="Booster" />
        <TextInput {...f} name="parkingBrake" label="Parking brake" />
      </div>
      <FieldGroup title="Pedal and master cylinder">
        <NumberField {...f} name="hydraulics.pedalRatio" label="Pedal ratio" hint="Pivot to pad ÷ pivot to pushrod." />
        <FigureField control={control} form="brakes" name="hydraulics.pedalForce" label="Pedal force" kind="force" />
        <NumberField {...f} name="hydraulics.boosterAssist" label="Booster assist ratio" hint="1 or empty with no booster." />
        <LengthMmField control={control} name="hydraulics.masterBoreMm" range={MM_RANGES.masterBore} />
        <LengthMmField control={control} name="hydraulics.rearMasterBoreMm" range={MM_RANGES.rearMasterBore} />
        <NumberField {...f} name="hydraulics.balanceFrontPercent" label="Balance bar, front share (%)" hint="With two master cylinders; 50 is centred." />
        <FigureField control={control} form="brakes" name="hydraulics.valveKnee" label="Proportioning valve knee" kind="pressure" />
        <NumberField {...f} name="hydraulics.valveSlope" label="Proportioning valve slope" />
        <Choice {...f} name="hydraulics.radiusModel" label="Effective radius" options={RADIUS_MODELS} labels={RADIUS_LABELS} placeholder="Mean radius (default)" />
      </FieldGroup>
      <label className="flex min-h-11 items-center gap-3">
        <input type="checkbox" className="h-5 w-5 accent-ink" {...register('showFigures')} />
        <span>Show the brake split on the public page and the data-sheet card (as an estimate, with the engineering caution)</span>
      </label>
      <MadeByFields register={register} errors={errors} control={control} />
    </SectionForm>
  );
}
