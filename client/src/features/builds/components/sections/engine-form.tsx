import { useWatch } from 'react-hook-form';
import { ASPIRATIONS, ENGINE_LAYOUTS, EngineSectionSchema, type EngineSection } from '@shared/schemas/build-sections';
import type { OwnerBuild } from '@shared/schemas/build';
import { ASPIRATION_LABELS, ENGINE_LAYOUT_LABELS } from '@shared/build-sheet/choice-labels';
import { useSaveSection } from '../../api/save-section';
import { useEditorForm } from '../editor/use-editor-form';
import { MADE_BY_BLANKS, withBlanks } from '../editor/form-values';
import { SectionForm, FieldGroup } from '../editor/section-form';
import { Choice, FigureField, MadeByFields, NumberField, TextInput } from '../editor/fields';
import { SectionNumbers } from '../numbers/numbers-panel';

const TEXT = ['layout', 'aspiration', 'blockMaterial', 'headMaterial', 'superchargerType', 'pulley', 'fuel', 'induction', 'ignition', 'cooling', 'exhaust', ...MADE_BY_BLANKS];
const fromBuild = (b: OwnerBuild) => withBlanks<EngineSection>(b.sections.engine, TEXT);
const FIELDS = Object.keys(EngineSectionSchema.shape);

export function EngineForm({ build }: { build: OwnerBuild }) {
  const mutation = useSaveSection(build.id, 'engine');
  const { form, panel } = useEditorForm<EngineSection, EngineSection>({ formKey: 'engine', schema: EngineSectionSchema, fromBuild, mutation, fields: FIELDS });
  const { register, control, formState: { errors } } = form;
  const aspiration = useWatch({ control, name: 'aspiration' });
  const f = { register, errors, form: 'engine' as const };
  return (
    <SectionForm id="engine" title="Engine" {...panel} below={<SectionNumbers section="engine" />}>
      <div className="grid gap-4 sm:grid-cols-2">
        <Choice {...f} name="layout" label="Layout" options={ENGINE_LAYOUTS} labels={ENGINE_LAYOUT_LABELS} />
        <NumberField {...f} name="cylinders" label="Cylinders" />
        <FigureField control={control} form="engine" name="bore" label="Bore" kind="length" />
        <FigureField control={control} form="engine" name="stroke" label="Stroke" kind="length" />
        <FigureField control={control} form="engine" name="displacement" label="Displacement (as stated)" kind="volume" hint="Leave empty to go by bore × stroke." />
        <NumberField {...f} name="revLimit" label="Rev limit (rpm)" />
        <TextInput {...f} name="blockMaterial" label="Block material" />
        <TextInput {...f} name="headMaterial" label="Head material" />
      </div>
      <FieldGroup title="Aspiration and fuel">
        <Choice {...f} name="aspiration" label="Aspiration" options={ASPIRATIONS} labels={ASPIRATION_LABELS} />
        {aspiration === 'supercharged' ? <TextInput {...f} name="superchargerType" label="Supercharger type" /> : null}
        {aspiration === 'supercharged' ? <TextInput {...f} name="pulley" label="Pulley" /> : null}
        {aspiration === 'turbocharged' ? <NumberField {...f} name="turboCount" label="Turbos" /> : null}
        {aspiration && aspiration !== 'natural' ? <FigureField control={control} form="engine" name="boost" label="Boost" kind="pressure" /> : null}
        <TextInput {...f} name="fuel" label="Fuel" />
        <TextInput {...f} name="induction" label="Induction" />
        <TextInput {...f} name="ignition" label="Ignition" />
        <TextInput {...f} name="cooling" label="Cooling" />
        <TextInput {...f} name="exhaust" label="Exhaust" />
      </FieldGroup>
      <FieldGroup title="Power and torque">
        <FigureField control={control} form="engine" name="flywheelPower" label="Flywheel power" kind="power" />
        <NumberField {...f} name="flywheelPowerRpm" label="at rpm" />
        <FigureField control={control} form="engine" name="flywheelTorque" label="Flywheel torque" kind="torque" />
        <NumberField {...f} name="flywheelTorqueRpm" label="at rpm" />
        <FigureField control={control} form="engine" name="wheelPower" label="Wheel power" kind="power" />
        <NumberField {...f} name="wheelPowerRpm" label="at rpm" />
        <FigureField control={control} form="engine" name="wheelTorque" label="Wheel torque" kind="torque" />
        <NumberField {...f} name="wheelTorqueRpm" label="at rpm" />
      </FieldGroup>
      <MadeByFields register={register} errors={errors} control={control} />
    </SectionForm>
  );
}
