import { useState, type FormEvent } from 'react';
import { ClassInputSchema } from '@shared/schemas/show-classes';
import { type EventDetail } from '@shared/schemas/show';
import { fieldsFromIssues } from '@shared/errors';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/notice';
import { Panel } from '@client/components/ui/panel';
import { TextField } from '@client/components/ui/text-field';
import { useDeleteClass, useSaveClass } from '../api/save-class';
import { fieldErrors } from './show-dates';

/** The show's classes in order; organisers add, rename, reorder and remove them (a class with entries stays). */
export function ClassesPanel({ show }: { show: EventDetail }) {
  const save = useSaveClass(show.id);
  const remove = useDeleteClass(show.id);
  const [name, setName] = useState('');
  const [capacity, setCapacity] = useState('');
  const [description, setDescription] = useState('');
  const [errors, setErrors] = useState<Record<string, string>>({});
  const editable = show.abilities.manage && show.status !== 'archived';

  const add = (e: FormEvent) => {
    e.preventDefault();
    const parsed = ClassInputSchema.safeParse({ name, description, capacity: capacity ? Number(capacity) : null });
    if (!parsed.success) return setErrors(fieldsFromIssues(parsed.error.issues));
    setErrors({});
    save.mutate({ input: parsed.data }, { onSuccess: () => (setName(''), setCapacity(''), setDescription('')) });
  };
  const move = (id: number, to: number) => save.mutate({ classId: id, input: { position: to } });
  const all = { ...fieldErrors(save.error), ...errors };

  return (
    <Panel title="Classes">
      {show.classes.length === 0 ? <p className="text-graphite">No classes yet: entries open only once there is at least one.</p> : null}
      <ol className="divide-y divide-rule">
        {show.classes.map((c, i) => (
          <li key={c.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
            <div>
              <p className="font-semibold">{c.name}</p>
              <p className="text-sm text-graphite">{c.capacity ? `Up to ${c.capacity} cars` : 'No limit'}{c.description ? ` · ${c.description}` : ''}</p>
            </div>
            {editable ? (
              <div className="flex gap-1">
                <Button type="button" variant="quiet" disabled={i === 0} onClick={() => move(c.id, i - 1)} aria-label={`Move ${c.name} earlier`}>
                  Earlier
                </Button>
                <Button type="button" variant="quiet" disabled={i === show.classes.length - 1} onClick={() => move(c.id, i + 1)} aria-label={`Move ${c.name} later`}>
                  Later
                </Button>
                <Button type="button" variant="quiet" onClick={() => remove.mutate(c.id)} aria-label={`Remove ${c.name}`}>
                  Remove
                </Button>
              </div>
            ) : null}
          </li>
        ))}
      </ol>
      {remove.isError ? <Notice tone="danger">{remove.error.message}</Notice> : null}
      {editable ? (
        <form onSubmit={add} noValidate className="mt-4 grid gap-3 md:grid-cols-[2fr_1fr_auto] md:items-end">
          <TextField label="New class" value={name} onChange={(e) => setName(e.target.value)} error={all.name} />
          <TextField label="Capacity" inputMode="numeric" hint="Empty: no limit" value={capacity} onChange={(e) => setCapacity(e.target.value)} error={all.capacity} />
          <Button type="submit" busy={save.isPending}>
            Add class
          </Button>
          <TextField label="Description (optional)" value={description} onChange={(e) => setDescription(e.target.value)} error={all.description} className="md:col-span-3" />
        </form>
      ) : null}
    </Panel>
  );
}
