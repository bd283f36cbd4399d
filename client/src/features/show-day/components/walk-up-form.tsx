import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { formatMoney } from '@shared/calc/money';
import { WalkUpSchema, type GateCard, type WalkUpInput } from '@shared/schemas/show-day';
import { applyServerErrors } from '@client/lib/form-errors';
import { gateCardUrl, useEnterWalkUp } from '../api/enter-walk-up';

const field = 'min-h-12 w-full border-2 border-ink bg-white px-3 text-xl';

/** A car that was not entered: entered here, given a number, paid in cash and checked in; then its card to print. Needs a signal (the number and the place are the server's). */
export function WalkUpForm({ eventId, classes, fee, onEntered }: { eventId: number; classes: Array<{ classId: number; name: string }>; fee: { amount: number; currency: string } | null; onEntered: (card: GateCard) => void }) {
  const walkUp = useEnterWalkUp(eventId);
  const [message, setMessage] = useState('');
  const [entered, setEntered] = useState<number | null>(null);
  const { register, handleSubmit, setError, reset, formState: { errors } } = useForm<WalkUpInput>({ resolver: zodResolver(WalkUpSchema), defaultValues: { title: '', entrantName: '', email: '', classId: classes[0]?.classId } });
  const onSubmit = handleSubmit((input) => {
    setMessage('');
    walkUp.mutate(input, {
      onSuccess: (card) => {
        setEntered(card.entry?.number ?? null);
        reset();
        onEntered(card);
      },
      onError: (err) => setMessage(applyServerErrors(err, setError, ['title', 'entrantName', 'email', 'classId'])),
    });
  });
  const error = (text?: string) => (text ? <span role="alert" className="text-base text-danger">{text}</span> : null);
  return (
    <details className="mt-4 border-2 border-ink bg-white p-3">
      <summary className="min-h-12 cursor-pointer font-display text-xl uppercase">Walk-up entry</summary>
      <form onSubmit={onSubmit} noValidate className="mt-3 space-y-3">
        <label className="block">Car<input {...register('title')} aria-invalid={errors.title ? true : undefined} className={field} />{error(errors.title?.message)}</label>
        <label className="block">Entrant’s name<input {...register('entrantName')} aria-invalid={errors.entrantName ? true : undefined} className={field} />{error(errors.entrantName?.message)}</label>
        <label className="block">E-mail (if they want it)<input type="email" {...register('email')} className={field} />{error(errors.email?.message)}</label>
        <label className="block">
          Class
          <select {...register('classId', { valueAsNumber: true })} className={field}>
            {classes.map((c) => <option key={c.classId} value={c.classId}>{c.name}</option>)}
          </select>
          {error(errors.classId?.message)}
        </label>
        {message ? <p role="alert" className="border-l-8 border-danger p-2 text-xl font-semibold">{message}</p> : null}
        <button type="submit" disabled={walkUp.isPending} className="min-h-12 w-full border-2 border-ink bg-ink px-4 font-display text-xl uppercase text-paper disabled:opacity-50">
          {fee ? `Take ${formatMoney(fee.amount, fee.currency)} cash and enter` : 'Enter and check in'}
        </button>
      </form>
      {entered ? (
        <a href={gateCardUrl(eventId, entered)} target="_blank" rel="noreferrer" className="mt-3 inline-flex min-h-12 items-center border-2 border-ink px-4 font-display text-xl uppercase">
          Print card No. {entered}
        </a>
      ) : null}
    </details>
  );
}
