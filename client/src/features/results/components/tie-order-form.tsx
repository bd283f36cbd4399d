import { useState } from 'react';
import type { ResultsReview } from '@shared/schemas/judging';
import { ordinal } from '@shared/schemas/results';
import { Button } from '@client/components/ui/button';
import { TextField } from '@client/components/ui/text-field';
import { Notice } from '@client/components/ui/notice';
import { ApiError } from '@client/lib/api';
import { useAddTieBreak } from '../api/add-tie-break';

type Tie = ResultsReview['ties'][number];

/** Puts the cars of one flagged tie in order by hand (Earlier / Later), with the reason the organiser gives. */
export function TieOrderForm({ eventId, tie, label }: { eventId: number; tie: Tie; label: string }) {
  const add = useAddTieBreak(eventId);
  const [order, setOrder] = useState(tie.cars);
  const [reason, setReason] = useState('');
  const fields = add.error instanceof ApiError ? add.error.fields : {};
  const move = (i: number, by: -1 | 1) => setOrder((o) => {
    const next = [...o];
    [next[i], next[i + by]] = [next[i + by]!, next[i]!];
    return next;
  });
  return (
    <form
      className="flex flex-col gap-2 border border-caution p-3"
      aria-label={`Order the tie for ${label}`}
      onSubmit={(e) => {
        e.preventDefault();
        add.mutate({ entryIds: order.map((c) => c.entryId), reason });
      }}
    >
      <p className="font-semibold">
        {label}: cars {tie.numbers.join(', ')} share {ordinal(tie.place)} place. The scores and the tie-break lines cannot separate them.
      </p>
      <ol className="flex flex-col gap-1">
        {order.map((c, i) => (
          <li key={c.entryId} className="flex flex-wrap items-center gap-2">
            <span className="w-12 font-display text-lg tabular-nums">{ordinal(tie.place + i)}</span>
            <span className="min-w-40 flex-1">
              {c.number} · {c.title}
            </span>
            <Button type="button" variant="quiet" disabled={i === 0} onClick={() => move(i, -1)} aria-label={`Move ${c.number} up`}>
              Earlier
            </Button>
            <Button type="button" variant="quiet" disabled={i === order.length - 1} onClick={() => move(i, 1)} aria-label={`Move ${c.number} down`}>
              Later
            </Button>
          </li>
        ))}
      </ol>
      <TextField label="Reason for this order" value={reason} maxLength={500} onChange={(e) => setReason(e.target.value)} error={fields.reason} hint="Recorded with your name in the show’s audit lines." />
      {add.error && !fields.reason ? <Notice tone="danger">{fields.entryIds ?? add.error.message}</Notice> : null}
      <div>
        <Button type="submit" busy={add.isPending}>
          Save this order
        </Button>
      </div>
    </form>
  );
}
