import { ChassisSectionSchema, FRAME_KINDS, type ChassisSection } from '@shared/schemas/build-sections';
import type { OwnerBuild } from '@shared/schemas/build';
import { FRAME_LABELS } from '@shared/build-sheet/choice-labels';
import { useSaveSection } from '../../api/save-section';
import { useEditorForm } from '../editor/use-editor-form';
import { MADE_BY_BLANKS, withBlanks } from '../editor/form-values';
import { SectionForm } from '../editor/section-form';
import { Choice, FigureField, MadeByFields, TextInput } from '../editor/fields';
import { SectionNumbers } from '../numbers/numbers-panel';
import { CgTiltFields, FourLinkFields, FrontGeometryFields, SuspensionEndFields } from './suspension-end-fields';
import { TubesFields } from './tubes-fields';

const END_TEXT = ['type', 'springType', 'dampers', 'antiRollBar', 'description'];
const TEXT = ['frame', 'frameDescription', 'cgTilt.raisedAxle', 'cgTilt.unit', ...END_TEXT.map((k) => `front.${k}`), ...END_TEXT.map((k) => `rear.${k}`), ...MADE_BY_BLANKS];
const fromBuild = (b: OwnerBuild) => {
  const values = withBlanks<ChassisSection>(b.sections.chassis, TEXT);
  return { ...values, tubes: (values.tubes ?? []).map((t) => ({ ...t, material: t.material ?? '' })), showFigures: values.showFigures ?? false };
};
const FIELDS = Object.keys(ChassisSectionSchema.shape);
const keptTilt = (b: OwnerBuild) => Object.values(b.sections.chassis?.cgTilt ?? {}).some((v) => typeof v === 'number');

export function ChassisForm({ build }: { build: OwnerBuild }) {
  const mutation = useSaveSection(build.id, 'chassis');
  const { form, panel } = useEditorForm<ChassisSection, ChassisSection>({ formKey: 'chassis', schema: ChassisSectionSchema, fromBuild, mutation, fields: FIELDS });
  const { register, control, formState: { errors } } = form;
  const f = { register, errors, form: 'chassis' as const };
  return (
    <SectionForm id="chassis" title="Chassis and suspension" caution {...panel} below={<SectionNumbers section="chassis" />}>
      <div className="grid gap-4 sm:grid-cols-2">
        <Choice {...f} name="frame" label="Frame" options={FRAME_KINDS} labels={FRAME_LABELS} />
        <TextInput {...f} name="frameDescription" label="Frame description" />
        <FigureField control={control} form="chassis" name="wheelbase" label="Wheelbase" kind="length" />
        <FigureField control={control} form="chassis" name="trackFront" label="Front track" kind="length" />
        <FigureField control={control} form="chassis" name="trackRear" label="Rear track" kind="length" />
      </div>
      <TubesFields register={register} errors={errors} control={control} />
      <SuspensionEndFields end="front" register={register} errors={errors} control={control} />
      <SuspensionEndFields end="rear" register={register} errors={errors} control={control} />
      <FrontGeometryFields register={register} errors={errors} control={control} />
      <FourLinkFields register={register} errors={errors} control={control} />
      {/* The tilt weigh-in is taken in Weigh-ins now; a sheet that kept one here still shows and edits it. */}
      {keptTilt(build) ? (
        <CgTiltFields register={register} errors={errors} control={control} />
      ) : (
        <p className="text-sm text-graphite">
          For the centre-of-gravity height, add a weigh-in with a tilted reading in <a className="underline" href="#section-weighIns">Weigh-ins</a>.
        </p>
      )}
      <label className="flex min-h-11 items-center gap-3">
        <input type="checkbox" className="h-5 w-5 accent-ink" {...register('showFigures')} />
        <span>Show the front roll-centre height, camber gain and centre-of-gravity height on the public page and the data-sheet card (as estimates, with the engineering caution)</span>
      </label>
      <MadeByFields register={register} errors={errors} control={control} />
    </SectionForm>
  );
}
