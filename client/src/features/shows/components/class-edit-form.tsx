import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { ClassUpdateSchema, type ClassUpdateInput, type EventClass } from '@shared/schemas/show-classes';
import { applyServerErrors } from '@client/lib/form-errors';
import { numberOrNull, resolverFor } from '@client/lib/form-resolver';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/notice';
import { TextField } from '@client/components/ui/text-field';
import { useUpdateClass } from '../api/update-class';

/** The boxes as typed: capacity is text, empty for no limit. */
type EditClassValues = { name: string; capacity: string };
const editResolver = resolverFor(ClassUpdateSchema, (v: EditClassValues) => ({ name: v.name, capacity: numberOrNull(v.capacity) }));

/** Rename a class or change how many cars it takes; the server refuses a capacity below the cars already in it. */
export function ClassEditForm({ showId, eventClass, onDone }: { showId: number; eventClass: EventClass; onDone: () => void }) {
  const update = useUpdateClass(showId);
  const [formError, setFormError] = useState('');
  const { register, handleSubmit, setError, formState: { errors } } = useForm<EditClassValues, unknown, ClassUpdateInput>({
    resolver: editResolver,
    defaultValues: { name: eventClass.name, capacity: eventClass.capacity === null ? '' : String(eventClass.capacity) },
  });
  const onSubmit = handleSubmit((input) => {
    setFormError('');
    update.mutate({ classId: eventClass.id, input }, { onSuccess: onDone, onError: (err) => setFormError(applyServerErrors(err, setError, ['name', 'capacity'])) });
  });
  return (
    <form onSubmit={onSubmit} noValidate aria-label={`Edit ${eventClass.name}`} className="grid w-full gap-3 md:grid-cols-[2fr_1fr_auto_auto] md:items-end">
      {formError ? <div className="md:col-span-4"><Notice tone="danger">{formError}</Notice></div> : null}
      <TextField label="Class name" {...register('name')} error={errors.name?.message} />
      <TextField label="Capacity" inputMode="numeric" hint="Empty: no limit" {...register('capacity')} error={errors.capacity?.message} />
      <Button type="submit" busy={update.isPending}>
        Save class
      </Button>
      <Button type="button" variant="quiet" onClick={onDone}>
        Cancel
      </Button>
    </form>
  );
}
