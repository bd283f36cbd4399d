import { Fragment, useEffect, useRef, useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { ASKABLE_PRIVATE_FIELD_LABELS, ASKABLE_PRIVATE_FIELDS, ENTRY_STATUS_LABELS } from '@shared/constants';
import { auditChangeWords, auditTimeWords } from '@shared/audit-words';
import { formatInZone } from '@shared/calc/time-zone';
import { formatMoney } from '@shared/calc/money';
import { waitingListWords } from '@shared/words';
import type { EventClass } from '@shared/schemas/show-classes';
import { auditActionLabel, ChangeClassSchema, MarkPaidSchema, PAYMENT_ISSUE_LABELS, PAYMENT_STATE_LABELS, type ChangeClassInput, type EntryTableRow, type MarkPaidInput } from '@shared/schemas/show-day';
import { applyServerErrors } from '@client/lib/form-errors';
import { useChangeEntryClass } from '../api/change-entry-class';
import { useEntryAudit } from '../api/get-entry-audit';
import { useMarkEntryPaid } from '../api/mark-entry-paid';
import { useMoveEntryUp } from '../api/move-entry-up';
import { useWithdrawListedEntry } from '../api/withdraw-listed-entry';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/notice';
import { ConfirmDialog } from '@client/components/ui/confirm-dialog';

/** Moves the entry to another class of the show; the button wakes only when another class is picked. */
function ChangeClassForm({ eventId, row, classes, onError }: { eventId: number; row: EntryTableRow; classes: EventClass[]; onError: (message: string) => void }) {
  const change = useChangeEntryClass(eventId);
  const { register, control, handleSubmit, setError, formState: { errors } } = useForm<ChangeClassInput>({ resolver: zodResolver(ChangeClassSchema), defaultValues: { classId: row.classId } });
  const picked = useWatch({ control, name: 'classId' });
  const onSubmit = handleSubmit(({ classId }) => {
    onError('');
    change.mutate({ entryId: row.id, classId }, { onError: (err) => onError(applyServerErrors(err, setError, ['classId'])) });
  });
  return (
    <form onSubmit={onSubmit} noValidate className="flex items-end gap-2">
      <label className="flex flex-1 flex-col gap-1">
        <span className="text-sm font-semibold">Class</span>
        <select aria-label="Move to class" aria-invalid={errors.classId ? true : undefined} {...register('classId', { valueAsNumber: true })} className="min-h-11 border border-rule bg-white px-2">
          {classes.map((c) => <option key={c.id} value={c.id}>{c.name}</option>)}
        </select>
        {errors.classId ? <span role="alert" className="text-sm text-danger">{errors.classId.message}</span> : null}
      </label>
      <Button type="submit" variant="secondary" disabled={Number(picked) === row.classId} busy={change.isPending}>Change class</Button>
    </form>
  );
}

/** Marks an unpaid entry paid by hand (cash, a transfer), with a note saying how. */
function MarkPaidForm({ eventId, row, onError }: { eventId: number; row: EntryTableRow; onError: (message: string) => void }) {
  const markPaid = useMarkEntryPaid(eventId);
  const { register, handleSubmit, setError, formState: { errors } } = useForm<MarkPaidInput>({ resolver: zodResolver(MarkPaidSchema), defaultValues: { note: '' } });
  const onSubmit = handleSubmit(({ note }) => {
    onError('');
    markPaid.mutate({ entryId: row.id, note }, { onError: (err) => onError(applyServerErrors(err, setError, ['note'])) });
  });
  return (
    <form onSubmit={onSubmit} noValidate className="flex items-end gap-2">
      <label className="flex flex-1 flex-col gap-1">
        <span className="text-sm font-semibold">How was it paid?</span>
        <input aria-label="Payment note" aria-invalid={errors.note ? true : undefined} {...register('note')} placeholder="Cash at the gate, bank transfer…" className="min-h-11 border border-rule bg-white px-3" />
        {errors.note ? <span role="alert" className="text-sm text-danger">{errors.note.message}</span> : null}
      </label>
      <Button type="submit" busy={markPaid.isPending}>Mark paid</Button>
    </form>
  );
}

/** One entry opened from the table: the entrant's contact, the build's private fields, the actions and the history. */
type Question = { title: string; text: string; confirmLabel: string; danger: boolean; act: () => void };

export function EntryDetail({ eventId, row, classes, timeZone, onClose }: { eventId: number; row: EntryTableRow; classes: EventClass[]; timeZone: string; onClose: () => void }) {
  // Dates read in the show's time zone, the same for every organiser wherever their browser is.
  const day = (iso: string) => formatInZone(iso, timeZone, { day: 'numeric', month: 'short', year: 'numeric' });
  const moveUp = useMoveEntryUp(eventId);
  const withdraw = useWithdrawListedEntry(eventId);
  const audit = useEntryAudit(row.id);
  // An error that names no field of a form (or comes from a button without one) shows at the top.
  const [formError, setFormError] = useState('');
  const buttonError = moveUp.error ?? withdraw.error;
  // The product's own dialog asks before a step the entrant is told about, as everywhere else.
  const [question, setQuestion] = useState<Question | null>(null);
  const answerYes = () => {
    if (!question) return;
    setFormError('');
    question.act();
    setQuestion(null);
  };
  const open = row.status !== 'withdrawn';
  // A modal dialog: the keyboard stays inside while it is open (the table behind is inert), Escape
  // closes it, and the focus goes back to the entry's button it was opened from.
  const ref = useRef<HTMLDialogElement>(null);
  useEffect(() => {
    const dialog = ref.current;
    const opener = document.activeElement instanceof HTMLElement ? document.activeElement : null;
    if (dialog && !dialog.open) dialog.showModal();
    return () => {
      dialog?.close();
      opener?.focus();
    };
  }, []);

  return (
    <dialog
      ref={ref}
      aria-label={`Entry ${row.number ?? ''} ${row.buildTitle}`}
      onCancel={(e) => {
        e.preventDefault();
        // The question dialog inside cancels itself; React passes its cancel up the tree too.
        if (e.target === e.currentTarget) onClose();
      }}
      className="fixed inset-y-0 right-0 left-auto m-0 h-full max-h-none w-full max-w-md overflow-y-auto border-0 border-l-2 border-ink bg-paper p-5 text-ink shadow-xl backdrop:bg-ink/30"
    >
      <div className="flex items-start justify-between gap-2">
        <h2 className="font-display text-2xl uppercase">{row.number ? `No. ${row.number} · ` : ''}{row.buildTitle}</h2>
        <Button variant="quiet" onClick={onClose}>Close</Button>
      </div>
      <dl className="mt-3 grid grid-cols-[8rem_1fr] gap-x-3 gap-y-1 text-sm">
        <dt className="text-graphite">Entrant</dt><dd>{row.ownerName}</dd>
        <dt className="text-graphite">E-mail</dt><dd><a className="underline" href={`mailto:${row.contact.email}`}>{row.contact.email}</a></dd>
        <dt className="text-graphite">Phone</dt><dd>{row.contact.phone ?? '—'}</dd>
        {ASKABLE_PRIVATE_FIELDS.map((field) => (
          <Fragment key={field}>
            <dt className="text-graphite">{ASKABLE_PRIVATE_FIELD_LABELS[field]}</dt>
            <dd>{row.sharedFields.includes(field) ? (row.privateFields[field] ?? '—') : <span className="text-graphite">Not asked for at entry</span>}</dd>
          </Fragment>
        ))}
        <dt className="text-graphite">Status</dt><dd>{ENTRY_STATUS_LABELS[row.status]}</dd>
        {row.status === 'waiting_list' ? (
          <>
            <dt className="text-graphite">Waiting list</dt><dd>{waitingListWords(row, timeZone)}</dd>
          </>
        ) : null}
        <dt className="text-graphite">Payment</dt><dd>{PAYMENT_STATE_LABELS[row.payment]} · fee {formatMoney(row.feeAmount, row.currency)}{row.refundDue && !row.refund ? ` · refund due ${formatMoney(row.refundDue, row.currency)}` : ''}</dd>
        {row.refund ? (
          <>
            <dt className="text-graphite">Refund</dt>
            <dd>{formatMoney(row.refund.amount, row.currency)} sent on {day(row.refund.at)} (ref. {row.refund.ref}). It cannot be sent twice.</dd>
          </>
        ) : null}
        {row.paymentIssues.map((i) => (
          <Fragment key={i.id}>
            <dt className="font-semibold text-danger">Check payment</dt>
            <dd>{PAYMENT_ISSUE_LABELS[i.reason]}: {formatMoney(i.amount, i.currency)} on {day(i.at)}{i.refund ? `, refunded (ref. ${i.refund.ref})` : ''}.</dd>
          </Fragment>
        ))}
      </dl>
      {formError || buttonError ? <Notice tone="danger"><p>{formError || buttonError?.message}</p></Notice> : null}
      {open ? (
        <div className="mt-4 space-y-4">
          <ChangeClassForm eventId={eventId} row={row} classes={classes} onError={setFormError} />
          {row.payment === 'unpaid' && row.status === 'awaiting_payment' ? <MarkPaidForm eventId={eventId} row={row} onError={setFormError} /> : null}
          {row.status === 'waiting_list' ? <Button busy={moveUp.isPending} onClick={() => setQuestion({ title: 'Move up from the waiting list?', text: `Give ${row.buildTitle} a place now, ahead of the waiting list's order and above capacity if the class is full?`, confirmLabel: 'Give it a place', danger: false, act: () => moveUp.mutate({ entryId: row.id }) })}>Move up from the waiting list</Button> : null}
          <Button variant="danger" busy={withdraw.isPending} onClick={() => setQuestion({ title: `Withdraw ${row.buildTitle}?`, text: "The show's refund rule decides what is paid back, and the entrant is told by e-mail.", confirmLabel: 'Withdraw', danger: true, act: () => withdraw.mutate({ entryId: row.id }) })}>Withdraw</Button>
        </div>
      ) : null}
      <ConfirmDialog open={question !== null} title={question?.title ?? ''} confirmLabel={question?.confirmLabel ?? ''} danger={question?.danger ?? true} onConfirm={answerYes} onCancel={() => setQuestion(null)}>
        <p>{question?.text}</p>
      </ConfirmDialog>
      <h3 className="mt-6 font-display text-lg uppercase">History</h3>
      <ol className="mt-2 space-y-2 text-sm" aria-label="History">
        {audit.data?.map((line) => (
          <li key={line.id} className="border-b border-rule pb-2">
            <span className="font-semibold">{auditActionLabel(line.action)}</span> · {line.who ?? 'Placard'} · <time dateTime={line.at}>{auditTimeWords(line.at, timeZone)}</time>
            <div className="text-graphite">{auditChangeWords(line.before, line.after, { currency: row.currency, timeZone }).join('; ')}</div>
          </li>
        ))}
      </ol>
    </dialog>
  );
}
