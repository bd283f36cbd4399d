import { countOf } from '@shared/words';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { ClassInputSchema, type ClassInput } from '@shared/schemas/show-classes';
import { type EventDetail } from '@shared/schemas/show';
import type { EventClass } from '@shared/schemas/show-classes';
import { ConfirmDialog } from '@client/components/ui/confirm-dialog';
import { applyServerErrors } from '@client/lib/form-errors';
import { numberOrNull, resolverFor } from '@client/lib/form-resolver';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/notice';
import { Panel } from '@client/components/ui/panel';
import { TextField } from '@client/components/ui/text-field';
import { useCreateClass } from '../api/create-class';
import { useDeleteClass } from '../api/delete-class';
import { useUpdateClass } from '../api/update-class';
import { ClassEditForm } from './class-edit-form';

/** The boxes as typed: capacity is text, empty for no limit. */
type NewClassValues = { name: string; capacity: string; description: string };
const EMPTY: NewClassValues = { name: '', capacity: '', description: '' };
const classResolver = resolverFor(ClassInputSchema, (v: NewClassValues) => ({ name: v.name, description: v.description, capacity: numberOrNull(v.capacity) }));

function NewClassForm({ showId }: { showId: number }) {
  const create = useCreateClass(showId);
  const [formError, setFormError] = useState('');
  const { register, handleSubmit, reset, setError, formState: { errors } } = useForm<NewClassValues, unknown, ClassInput>({ resolver: classResolver, defaultValues: EMPTY });
  const onSubmit = handleSubmit((input) => {
    setFormError('');
    create.mutate(input, { onSuccess: () => reset(EMPTY), onError: (err) => setFormError(applyServerErrors(err, setError, ['name', 'capacity', 'description'])) });
  });
  return (
    <form onSubmit={onSubmit} noValidate className="mt-4 grid gap-3 md:grid-cols-[2fr_1fr_auto] md:items-end">
      {formError ? <div className="md:col-span-3"><Notice tone="danger">{formError}</Notice></div> : null}
      <TextField label="New class" {...register('name')} error={errors.name?.message} />
      <TextField label="Capacity" inputMode="numeric" hint="Empty: no limit" {...register('capacity')} error={errors.capacity?.message} />
      <Button type="submit" busy={create.isPending}>
        Add class
      </Button>
      <TextField label="Description (optional)" {...register('description')} error={errors.description?.message} className="md:col-span-3" />
    </form>
  );
}

/** The show's classes in order; organisers add, rename, reorder and remove them (a class with entries stays). */
export function ClassesPanel({ show }: { show: EventDetail }) {
  const update = useUpdateClass(show.id);
  const remove = useDeleteClass(show.id);
  const editable = show.abilities.manage && show.status !== 'archived';
  const move = (id: number, to: number) => update.mutate({ classId: id, input: { position: to } });
  const [editingId, setEditingId] = useState<number | null>(null);
  // Removing is asked first: a class removed by a slip takes its description and place in the order with it.
  const [removing, setRemoving] = useState<EventClass | null>(null);

  return (
    <Panel title="Classes">
      {show.classes.length === 0 ? <p className="text-graphite">No classes yet: entries open only once there is at least one.</p> : null}
      <ol className="divide-y divide-rule">
        {show.classes.map((c, i) => (
          <li key={c.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
            {editingId === c.id ? <ClassEditForm showId={show.id} eventClass={c} onDone={() => setEditingId(null)} /> : <>
            <div>
              <p className="font-semibold">{c.name}</p>
              <p className="text-sm text-graphite">{c.capacity ? `Up to ${countOf(c.capacity, 'car')}` : 'No limit'}{c.description ? ` · ${c.description}` : ''}</p>
            </div>
            {editable ? (
              <div className="flex flex-wrap gap-1">
                <Button type="button" variant="quiet" onClick={() => setEditingId(c.id)} aria-label={`Edit ${c.name}`}>
                  Edit
                </Button>
                <Button type="button" variant="quiet" disabled={i === 0} onClick={() => move(c.id, i - 1)} aria-label={`Move ${c.name} earlier`}>
                  Earlier
                </Button>
                <Button type="button" variant="quiet" disabled={i === show.classes.length - 1} onClick={() => move(c.id, i + 1)} aria-label={`Move ${c.name} later`}>
                  Later
                </Button>
                <Button type="button" variant="quiet" onClick={() => setRemoving(c)} aria-label={`Remove ${c.name}`}>
                  Remove
                </Button>
              </div>
            ) : null}
            </>}
          </li>
        ))}
      </ol>
      {update.isError ? <Notice tone="danger">{update.error.message}</Notice> : null}
      {remove.isError ? <Notice tone="danger">{remove.error.message}</Notice> : null}
      {editable ? <NewClassForm showId={show.id} /> : null}
      <ConfirmDialog
        open={removing !== null}
        title={`Remove ${removing?.name ?? 'this class'}?`}
        confirmLabel="Remove class"
        cancelLabel="Keep it"
        busy={remove.isPending}
        onCancel={() => setRemoving(null)}
        onConfirm={() => {
          if (removing) remove.mutate(removing.id, { onSettled: () => setRemoving(null) });
        }}
      >
        A class with entries stays; an empty one is removed from the show.
      </ConfirmDialog>
    </Panel>
  );
}
