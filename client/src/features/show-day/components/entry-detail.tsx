import { Fragment, useState } from 'react';
import { ENTRY_STATUS_LABELS } from '@shared/constants';
import { formatMoney } from '@shared/calc/money';
import type { EventClass } from '@shared/schemas/show-classes';
import { auditActionLabel, PAYMENT_ISSUE_LABELS, PAYMENT_STATE_LABELS, type EntryTableRow } from '@shared/schemas/show-day';
import { useActOnEntry, type EntryActionInput } from '../api/act-on-entry';
import { useEntryAudit } from '../api/get-entry-audit';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/notice';

/** before → after, field by field, in words a person reads. */
function changeText(before: unknown, after: unknown): string {
  const b = (before ?? {}) as Record<string, unknown>;
  const a = (after ?? {}) as Record<string, unknown>;
  const show = (k: string, v: unknown) => (k === 'status' && typeof v === 'string' && v in ENTRY_STATUS_LABELS ? ENTRY_STATUS_LABELS[v as keyof typeof ENTRY_STATUS_LABELS] : v === null || v === undefined ? '—' : String(v));
  return Object.keys(a)
    .filter((k) => !k.endsWith('Id') && k !== 'paymentRef')
    .map((k) => (k in b ? `${k}: ${show(k, b[k])} → ${show(k, a[k])}` : `${k}: ${show(k, a[k])}`))
    .join('; ');
}

/** One entry opened from the table: the entrant's contact, the build's private fields, the actions and the history. */
export function EntryDetail({ eventId, row, classes, onClose }: { eventId: number; row: EntryTableRow; classes: EventClass[]; onClose: () => void }) {
  const act = useActOnEntry(eventId);
  const audit = useEntryAudit(row.id);
  const [classId, setClassId] = useState(String(row.classId));
  const [note, setNote] = useState('');
  const run = (input: EntryActionInput, question?: string) => {
    if (question && !window.confirm(question)) return;
    act.mutate(input);
  };
  const open = row.status !== 'withdrawn';

  return (
    <aside role="dialog" aria-label={`Entry ${row.number ?? ''} ${row.buildTitle}`} className="fixed inset-y-0 right-0 z-20 w-full max-w-md overflow-y-auto border-l-2 border-ink bg-paper p-5 shadow-xl">
      <div className="flex items-start justify-between gap-2">
        <h2 className="font-display text-2xl uppercase">{row.number ? `No. ${row.number} · ` : ''}{row.buildTitle}</h2>
        <Button variant="quiet" onClick={onClose}>Close</Button>
      </div>
      <dl className="mt-3 grid grid-cols-[8rem_1fr] gap-x-3 gap-y-1 text-sm">
        <dt className="text-graphite">Entrant</dt><dd>{row.ownerName}</dd>
        <dt className="text-graphite">E-mail</dt><dd><a className="underline" href={`mailto:${row.contact.email}`}>{row.contact.email}</a></dd>
        <dt className="text-graphite">Phone</dt><dd>{row.contact.phone ?? '—'}</dd>
        <dt className="text-graphite">VIN</dt><dd>{row.privateFields.vin ?? '—'}</dd>
        <dt className="text-graphite">Plate</dt><dd>{row.privateFields.plate ?? '—'}</dd>
        <dt className="text-graphite">Status</dt><dd>{ENTRY_STATUS_LABELS[row.status]}</dd>
        <dt className="text-graphite">Payment</dt><dd>{PAYMENT_STATE_LABELS[row.payment]} · fee {formatMoney(row.feeAmount, row.currency)}{row.refundDue && !row.refund ? ` · refund due ${formatMoney(row.refundDue, row.currency)}` : ''}</dd>
        {row.refund ? (
          <>
            <dt className="text-graphite">Refund</dt>
            <dd>{formatMoney(row.refund.amount, row.currency)} sent on {new Date(row.refund.at).toLocaleDateString()} (ref. {row.refund.ref}). It cannot be sent twice.</dd>
          </>
        ) : null}
        {row.paymentIssues.map((i) => (
          <Fragment key={i.id}>
            <dt className="font-semibold text-danger">Check payment</dt>
            <dd>{PAYMENT_ISSUE_LABELS[i.reason]}: {formatMoney(i.amount, i.currency)} on {new Date(i.at).toLocaleDateString()}{i.refund ? `, refunded (ref. ${i.refund.ref})` : ''}.</dd>
          </Fragment>
        ))}
      </dl>
      {act.error ? <Notice tone="danger"><p>{act.error.message}</p></Notice> : null}
      {open ? (
        <div className="mt-4 space-y-4">
          <div className="flex items-end gap-2">
            <label className="flex flex-1 flex-col gap-1">
              <span className="text-sm font-semibold">Class</span>
              <select aria-label="Move to class" value={classId} onChange={(e) => setClassId(e.target.value)} className="min-h-11 border border-rule bg-white px-2">
                {classes.map((c) => <option key={c.id} value={c.id}>{c.name}</option>)}
              </select>
            </label>
            <Button variant="secondary" disabled={Number(classId) === row.classId} busy={act.isPending} onClick={() => run({ kind: 'class', entryId: row.id, classId: Number(classId) })}>Change class</Button>
          </div>
          {row.payment === 'unpaid' && row.status === 'awaiting_payment' ? (
            <div className="flex items-end gap-2">
              <label className="flex flex-1 flex-col gap-1">
                <span className="text-sm font-semibold">How was it paid?</span>
                <input aria-label="Payment note" value={note} onChange={(e) => setNote(e.target.value)} placeholder="Cash at the gate, bank transfer…" className="min-h-11 border border-rule bg-white px-3" />
              </label>
              <Button busy={act.isPending} onClick={() => run({ kind: 'mark-paid', entryId: row.id, note })}>Mark paid</Button>
            </div>
          ) : null}
          {row.status === 'waiting_list' ? <Button busy={act.isPending} onClick={() => run({ kind: 'move-up', entryId: row.id }, `Give ${row.buildTitle} a place now, ahead of the waiting list's order and above capacity if the class is full?`)}>Move up from the waiting list</Button> : null}
          <Button variant="danger" busy={act.isPending} onClick={() => run({ kind: 'withdraw', entryId: row.id }, `Withdraw ${row.buildTitle}? The show's refund rule decides what is paid back, and the entrant is told by e-mail.`)}>Withdraw</Button>
        </div>
      ) : null}
      <h3 className="mt-6 font-display text-lg uppercase">History</h3>
      <ol className="mt-2 space-y-2 text-sm" aria-label="History">
        {audit.data?.map((line) => (
          <li key={line.id} className="border-b border-rule pb-2">
            <span className="font-semibold">{auditActionLabel(line.action)}</span> · {line.who ?? 'Placard'} · <time dateTime={line.at}>{new Date(line.at).toLocaleString()}</time>
            <div className="text-graphite">{changeText(line.before, line.after)}</div>
          </li>
        ))}
      </ol>
    </aside>
  );
}
