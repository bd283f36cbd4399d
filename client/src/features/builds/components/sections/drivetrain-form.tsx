import { DrivetrainSectionSchema, LIMITED_SLIP_TYPES, TRANSMISSION_TYPES, type DrivetrainSection } from '@shared/schemas/build-sections';
import type { OwnerBuild } from '@shared/schemas/build';
import { LIMITED_SLIP_LABELS, TRANSMISSION_LABELS } from '@shared/build-sheet/choice-labels';
import { useSaveSection } from '../../api/save-section';
import { useEditorForm } from '../editor/use-editor-form';
import { MADE_BY_BLANKS, withBlanks } from '../editor/form-values';
import { SectionForm } from '../editor/section-form';
import { Choice, FigureField, MadeByFields, NumberField, TextInput } from '../editor/fields';
import { GearsInput } from '../editor/gears-input';
import { SectionNumbers } from '../numbers/numbers-panel';

const TEXT = ['transmissionType', 'transmission', 'clutch', 'driveshaft', 'axle', 'limitedSlip', ...MADE_BY_BLANKS];
const fromBuild = (b: OwnerBuild) => {
  const values = withBlanks<DrivetrainSection>(b.sections.drivetrain, TEXT);
  return { ...values, gears: values.gears ?? [] };
};
const FIELDS = Object.keys(DrivetrainSectionSchema.shape);

export function DrivetrainForm({ build }: { build: OwnerBuild }) {
  const mutation = useSaveSection(build.id, 'drivetrain');
  const { form, panel } = useEditorForm<DrivetrainSection, DrivetrainSection>({ formKey: 'drivetrain', schema: DrivetrainSectionSchema, fromBuild, mutation, fields: FIELDS });
  const { register, control, formState: { errors } } = form;
  const f = { register, errors, form: 'drivetrain' as const };
  return (
    <SectionForm id="drivetrain" title="Drivetrain" {...panel} below={<SectionNumbers section="drivetrain" />}>
      <div className="grid gap-4 sm:grid-cols-2">
        <Choice {...f} name="transmissionType" label="Transmission type" options={TRANSMISSION_TYPES} labels={TRANSMISSION_LABELS} />
        <TextInput {...f} name="transmission" label="Transmission" hint="e.g. five-speed manual, overdrive fifth" />
      </div>
      <GearsInput control={control} name="gears" errors={errors} />
      <div className="grid gap-4 sm:grid-cols-2">
        <NumberField {...f} name="finalDrive" label="Final drive ratio" hint="e.g. 3.73" />
        <Choice {...f} name="limitedSlip" label="Differential" options={LIMITED_SLIP_TYPES} labels={LIMITED_SLIP_LABELS} />
        <TextInput {...f} name="axle" label="Rear axle" />
        <NumberField {...f} name="axleSplines" label="Axle splines" />
        <TextInput {...f} name="clutch" label="Clutch" />
        <TextInput {...f} name="driveshaft" label="Driveshaft" />
        <FigureField control={control} form="drivetrain" name="topSpeed" label="Top speed" kind="speed" />
        <NumberField {...f} name="quarterMileEt" label="Quarter mile, elapsed time (s)" hint="From a time slip." />
        <FigureField control={control} form="drivetrain" name="quarterMileTrap" label="Quarter mile, trap speed" kind="speed" />
      </div>
      <MadeByFields register={register} errors={errors} control={control} />
    </SectionForm>
  );
}
