import { BUILD_STYLES, BUILD_STYLE_LABELS, BuildOverviewSchema, type BuildUpdateInput, type OwnerBuild } from '@shared/schemas/build';
import { TextAreaField } from '@client/components/ui/text-area-field';
import { TextField } from '@client/components/ui/text-field';
import { useUpdateBuild } from '../../api/update-build';
import { useEditorForm } from '../editor/use-editor-form';
import { cleanValues } from '../editor/form-values';
import { SectionForm } from '../editor/section-form';
import { Choice, FigureField, NumberField, errorAt } from '../editor/fields';
import { SectionNumbers } from '../numbers/numbers-panel';
import { HistoryFor } from '../records/history-list';

type OverviewValues = { title: string; modelYear?: number | null; bodyOrigin: string; style: string; story: string; weight?: BuildUpdateInput['weight'] };

const fromBuild = (b: OwnerBuild): OverviewValues => ({
  title: b.overview.title,
  modelYear: b.overview.modelYear ?? undefined,
  bodyOrigin: b.overview.bodyOrigin ?? '',
  style: b.overview.style ?? '',
  story: b.overview.story ?? '',
  weight: b.overview.weight ?? undefined,
});
const FIELDS = Object.keys(BuildOverviewSchema.shape);

/** A PATCH says what to clear: an emptied year, style or weight is sent as null, emptied text as ''. */
const clean = (v: OverviewValues) => {
  const c = cleanValues(v) as Partial<OverviewValues>;
  return { title: c.title ?? '', modelYear: c.modelYear ?? null, bodyOrigin: v.bodyOrigin ?? '', style: c.style || null, story: v.story ?? '', weight: c.weight ?? null };
};

export function OverviewForm({ build }: { build: OwnerBuild }) {
  const mutation = useUpdateBuild(build.id);
  const { form, panel } = useEditorForm<OverviewValues, BuildUpdateInput>({ formKey: 'overview', schema: BuildOverviewSchema, fromBuild, clean, mutation, fields: FIELDS });
  const { register, control, formState: { errors } } = form;
  const f = { register, errors, form: 'overview' as const };
  return (
    <SectionForm id="overview" title="Overview" {...panel} below={<SectionNumbers section="overview" />}>
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label="Title" className="sm:col-span-2" {...register('title')} error={errorAt(errors, 'title')} />
        <NumberField {...f} name="modelYear" label="Model year" />
        <Choice {...f} name="style" label="Style" options={BUILD_STYLES} labels={BUILD_STYLE_LABELS} />
        <TextField label="Body origin" className="sm:col-span-2" hint="e.g. 1936 three-window coupe body, steel" {...register('bodyOrigin')} error={errorAt(errors, 'bodyOrigin')} />
        <div className="sm:col-span-2">
          <FigureField control={control} form="overview" name="weight" label="Weight" kind="mass" hint="A weigh-in can fill this in as measured." />
          <HistoryFor build={build} path="overview.weight" />
        </div>
      </div>
      <TextAreaField label="The story" rows={6} hint="How it started, what it became; the public page shows it." {...register('story')} error={errorAt(errors, 'story')} />
    </SectionForm>
  );
}
