import { useState } from 'react';
import { useFieldArray, useForm } from 'react-hook-form';
import type { ResultsReview } from '@shared/schemas/judging';
import { ordinal, TieBreakCreateSchema, type TieBreakCreateInput } from '@shared/schemas/results';
import { Button } from '@client/components/ui/button';
import { TextField } from '@client/components/ui/text-field';
import { Notice } from '@client/components/ui/notice';
import { ApiError } from '@client/lib/api';
import { applyServerErrors } from '@client/lib/form-errors';
import { resolverFor } from '@client/lib/form-resolver';
import { useAddTieBreak } from '../api/add-tie-break';

type Tie = ResultsReview['ties'][number];
/** The tied cars in the order the organiser puts them (the schema reads their ids), and the reason. */
type TieOrderValues = { cars: Tie['cars']; reason: string };
const tieOrderResolver = resolverFor(TieBreakCreateSchema, (v: TieOrderValues) => ({ entryIds: v.cars.map((c) => c.entryId), reason: v.reason }));

/** Puts the cars of one flagged tie in order by hand (Earlier / Later), with the reason the organiser gives. */
export function TieOrderForm({ eventId, tie, label }: { eventId: number; tie: Tie; label: string }) {
  const add = useAddTieBreak(eventId);
  const [formError, setFormError] = useState('');
  const { register, control, handleSubmit, setError, formState: { errors } } = useForm<TieOrderValues, unknown, TieBreakCreateInput>({ resolver: tieOrderResolver, defaultValues: { cars: tie.cars, reason: '' } });
  // keyName keeps rhf's own row id out of the way of the cars' fields.
  const order = useFieldArray({ control, name: 'cars', keyName: 'rowKey' });
  const submit = handleSubmit((input) => {
    setFormError('');
    add.mutate(input, {
      // The order itself has no box: a problem with it (entryIds) is said on top.
      onError: (err) => setFormError((err instanceof ApiError ? err.fields.entryIds : undefined) ?? applyServerErrors(err, setError, ['reason'])),
    });
  });
  // The schema's word on the order, when it has one (it names entryIds, not a box).
  const orderError = (errors as { entryIds?: { message?: string } }).entryIds?.message;
  return (
    <form className="flex flex-col gap-2 border border-caution p-3" aria-label={`Order the tie for ${label}`} noValidate onSubmit={submit}>
      <p className="font-semibold">
        {label}: cars {tie.numbers.join(', ')} share {ordinal(tie.place)} place. The scores and the tie-break lines cannot separate them.
      </p>
      <ol className="flex flex-col gap-1">
        {order.fields.map((c, i) => (
          <li key={c.rowKey} className="flex flex-wrap items-center gap-2">
            <span className="w-12 font-display text-lg tabular-nums">{ordinal(tie.place + i)}</span>
            <span className="min-w-40 flex-1">
              {c.number} · {c.title}
            </span>
            <Button type="button" variant="quiet" disabled={i === 0} onClick={() => order.swap(i, i - 1)} aria-label={`Move ${c.number} up`}>
              Earlier
            </Button>
            <Button type="button" variant="quiet" disabled={i === order.fields.length - 1} onClick={() => order.swap(i, i + 1)} aria-label={`Move ${c.number} down`}>
              Later
            </Button>
          </li>
        ))}
      </ol>
      <TextField label="Reason for this order" maxLength={500} {...register('reason')} error={errors.reason?.message} hint="Recorded with your name in the show’s audit lines." />
      {orderError || formError ? <Notice tone="danger">{orderError || formError}</Notice> : null}
      <div>
        <Button type="submit" busy={add.isPending}>
          Save this order
        </Button>
      </div>
    </form>
  );
}
