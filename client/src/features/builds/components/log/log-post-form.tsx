import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { LOG_PHOTOS_MAX, LogPostCreateSchema, type OwnLogPost } from '@shared/schemas/build-log';
import type { OwnerBuild } from '@shared/schemas/build';
import { resolverFor } from '@client/lib/form-resolver';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/notice';
import { SelectField } from '@client/components/ui/select-field';
import { TextField } from '@client/components/ui/text-field';
import { TextAreaField } from '@client/components/ui/text-area-field';
import { useCreateLogPost } from '../../api/create-log-post';
import { useUpdateLogPost } from '../../api/update-log-post';
import { placeServerErrors } from '../editor/form-values';
import { errorAt } from '../editor/fields';
import { PhotoImage } from '../photos/photo-image';

/** The form keeps the linked measurement as one choice ("dyno:12", "weigh-in:4" or ""); the schema gets the two ids. */
type Values = { postedOn: string; title: string; body: string; status: 'draft' | 'published'; photoIds: string[]; measurement: string };

const toInput = (v: Values) => {
  const [kind, id] = v.measurement.split(':');
  return {
    postedOn: v.postedOn,
    title: v.title,
    body: v.body,
    status: v.status,
    photoIds: (v.photoIds || []).map(Number),
    dynoRunId: kind === 'dyno' ? Number(id) : null,
    weighInId: kind === 'weigh-in' ? Number(id) : null,
  };
};

// A photo deleted since the post was written is dropped here, so it cannot hold the save back unseen.
const valuesOf = (post: OwnLogPost | null, photoIds: number[]): Values => ({
  postedOn: post?.postedOn ?? new Date().toISOString().slice(0, 10),
  title: post?.title ?? '',
  body: post?.body ?? '',
  status: post?.status ?? 'draft',
  photoIds: (post?.photoIds ?? []).filter((id) => photoIds.includes(id)).map(String),
  measurement: post?.dynoRunId ? `dyno:${post.dynoRunId}` : post?.weighInId ? `weigh-in:${post.weighInId}` : '',
});

/** Writes a new post or edits one: date, words, draft or published, photos of the build and one measurement. */
export function LogPostForm({ build, post, onDone }: { build: OwnerBuild; post: OwnLogPost | null; onDone: () => void }) {
  const create = useCreateLogPost(build.id);
  const update = useUpdateLogPost(build.id);
  const [formError, setFormError] = useState('');
  const { register, handleSubmit, setError, formState: { errors } } = useForm<Values, unknown, ReturnType<typeof LogPostCreateSchema.parse>>({
    resolver: resolverFor(LogPostCreateSchema, toInput),
    defaultValues: valuesOf(post, build.photos.map((p) => p.id)),
  });
  const fields = ['postedOn', 'title', 'body', 'status', 'photoIds', 'dynoRunId', 'weighInId'];
  const onSubmit = handleSubmit((input) => {
    setFormError('');
    const done = { onSuccess: onDone, onError: (err: Error) => setFormError(placeServerErrors(err, setError, fields)) };
    if (post) update.mutate({ postId: post.id, input }, done);
    else create.mutate(input, done);
  });
  const measurements = [
    ...build.dynoRuns.map((r) => ({ value: `dyno:${r.id}`, label: `Dyno run of ${r.date}` })),
    ...build.weighIns.map((w) => ({ value: `weigh-in:${w.id}`, label: `Weigh-in of ${w.date}` })),
  ];
  const heading = post ? `Edit “${post.title}”` : 'Write a post';
  return (
    <form onSubmit={onSubmit} noValidate aria-label={heading} className="flex flex-col gap-4 border border-ink p-3">
      <h3 className="font-display text-base uppercase tracking-wide">{heading}</h3>
      {formError ? <Notice tone="danger">{formError}</Notice> : null}
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label="Date" type="date" {...register('postedOn')} error={errorAt(errors, 'postedOn')} />
        <SelectField label="Shown" options={[{ value: 'draft', label: 'Draft: only you see it' }, { value: 'published', label: 'Published on the build page' }]} {...register('status')} error={errorAt(errors, 'status')} />
      </div>
      <TextField label="Title" {...register('title')} error={errorAt(errors, 'title')} />
      <TextAreaField
        label="Text"
        rows={6}
        {...register('body')}
        error={errorAt(errors, 'body')}
        hint="A blank line starts a new paragraph. *Stars* around words set them in italics; a web address becomes a link."
      />
      {build.photos.length ? (
        <fieldset className="flex flex-col gap-2">
          <legend className="text-sm font-semibold">Photos (up to {LOG_PHOTOS_MAX}; add new ones under Photos)</legend>
          <ul className="grid grid-cols-3 gap-2 sm:grid-cols-4">
            {build.photos.map((p) => (
              <li key={p.id}>
                <label className="flex min-h-11 cursor-pointer flex-col gap-1 text-sm">
                  <PhotoImage photo={p} sizes="120px" alt={p.caption || 'Photo of the build'} className="aspect-[4/3] w-full object-cover" />
                  <span className="flex items-center gap-2">
                    <input type="checkbox" value={String(p.id)} {...register('photoIds')} className="h-5 w-5" />
                    <span className="truncate">{p.caption || 'No caption'}</span>
                  </span>
                </label>
              </li>
            ))}
          </ul>
          {errorAt(errors, 'photoIds') ? <p role="alert" className="text-sm text-danger">{errorAt(errors, 'photoIds')}</p> : null}
        </fieldset>
      ) : (
        <p className="text-sm text-graphite">Photos added under Photos can be shown with a post.</p>
      )}
      {measurements.length ? (
        <SelectField label="About a measurement" placeholder="None" options={measurements} {...register('measurement')} error={errorAt(errors, 'dynoRunId') ?? errorAt(errors, 'weighInId')} />
      ) : null}
      <div className="flex flex-wrap gap-2">
        <Button type="submit" busy={create.isPending || update.isPending}>
          {post ? 'Save the post' : 'Add the post'}
        </Button>
        <Button type="button" variant="quiet" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
