import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useNavigate } from 'react-router-dom';
import { BUILD_STYLES, BUILD_STYLE_LABELS, BuildCreateSchema, type BuildCreateInput } from '@shared/schemas/build';
import { applyServerErrors } from '@client/lib/form-errors';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/notice';
import { SelectField } from '@client/components/ui/select-field';
import { TextField } from '@client/components/ui/text-field';
import { useCreateBuild } from '../api/create-build';
import { asNumber } from './editor/form-values';

type Values = { title: string; modelYear?: number; bodyOrigin: string; style: string };

/** Title is all it takes; the rest of the sheet is filled in the editor. */
export function CreateBuildForm({ onCancel }: { onCancel?: () => void }) {
  const create = useCreateBuild();
  const navigate = useNavigate();
  const [formError, setFormError] = useState('');
  const { register, handleSubmit, setError, formState: { errors } } = useForm<Values>({
    resolver: (values, ctx, opts) => zodResolver(BuildCreateSchema)({ ...values, style: values.style || undefined, bodyOrigin: values.bodyOrigin || undefined } as never, ctx, opts as never) as never,
    defaultValues: { title: '', bodyOrigin: '', style: '' },
  });
  const onSubmit = handleSubmit((input) => {
    setFormError('');
    create.mutate(input as unknown as BuildCreateInput, {
      onSuccess: ({ build }) => navigate(`/builds/${build.id}`),
      onError: (err) => setFormError(applyServerErrors(err, setError, ['title', 'modelYear', 'bodyOrigin', 'style'])),
    });
  });
  return (
    <form onSubmit={onSubmit} noValidate aria-label="New build" className="flex flex-col gap-4">
      {formError ? <Notice tone="danger">{formError}</Notice> : null}
      <TextField label="Title" placeholder="e.g. The long-roof wagon" {...register('title')} error={errors.title?.message} />
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label="Model year" inputMode="numeric" {...register('modelYear', asNumber as never)} error={errors.modelYear?.message} />
        <SelectField label="Style" placeholder="Not said" options={BUILD_STYLES.map((s) => ({ value: s, label: BUILD_STYLE_LABELS[s] }))} {...register('style')} error={errors.style?.message} />
      </div>
      <TextField label="Body origin" hint="e.g. 1936 three-window coupe body, steel" {...register('bodyOrigin')} error={errors.bodyOrigin?.message} />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" busy={create.isPending}>
          Start the build sheet
        </Button>
        {onCancel ? (
          <Button type="button" variant="secondary" onClick={onCancel}>
            Cancel
          </Button>
        ) : null}
      </div>
    </form>
  );
}
