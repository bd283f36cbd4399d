import { spreadsheetCsv } from '../../spreadsheet-csv';
import { ENTRY_STATUS_LABELS } from '@shared/constants';
import { currencyDecimals } from '@shared/calc/money';
import { formatInZone } from '@shared/calc/time-zone';
import { PAYMENT_METHOD_LABELS, paymentMethodOf } from '@shared/schemas/money-totals';
import { PAYMENT_ISSUE_LABELS, PAYMENT_STATE_LABELS, type EntryTableRow } from '@shared/schemas/show-day';

const major = (minor: number | null, currency: string) => (minor === null ? null : minor / 10 ** currencyDecimals(currency));

/**
 * The entries as CSV for a spreadsheet: UTF-8 with a byte-order mark (so spreadsheets do not guess
 * another encoding), a header row, numbers written as bare numbers, and any text cell starting with
 * = + - @ (or a tab / carriage return) prefixed with a quote by csv-stringify's `escape_formulas`,
 * the guard OWASP's "CSV Injection" page describes.
 */
export function entriesCsv(rows: EntryTableRow[], show: { timeZone: string; paymentNotes: Map<number, string> }): string {
  // Times a spreadsheet reads as the show lived them: the show's own zone, named in the header.
  const local = (iso: string | null) => (iso ? formatInZone(iso, show.timeZone, { year: 'numeric', month: '2-digit', day: '2-digit', hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }, 'sv-SE') : '');
  const method = (r: EntryTableRow) => {
    const m = r.paidAmount !== null ? paymentMethodOf(r.paymentRef) : null;
    return m ? PAYMENT_METHOD_LABELS[m] : '';
  };
  const cells = rows.map((r) => ({
    number: r.number,
    title: r.buildTitle,
    code: r.buildCode,
    year: r.modelYear,
    body: r.bodyOrigin ?? '',
    owner: r.ownerName,
    email: r.contact.email,
    phone: r.contact.phone ?? '',
    class: r.className,
    status: ENTRY_STATUS_LABELS[r.status],
    payment: PAYMENT_STATE_LABELS[r.payment],
    enteredAt: local(r.createdAt),
    method: method(r),
    note: show.paymentNotes.get(r.id) ?? '',
    reference: r.paymentRef ?? '',
    currency: r.currency,
    fee: major(r.feeAmount, r.currency),
    paid: major(r.paidAmount, r.currency),
    refundDue: major(r.refundDue, r.currency),
    refunded: r.refund ? major(r.refund.amount, r.currency) : null,
    refundedAt: local(r.refund?.at ?? null),
    refundRef: r.refund?.ref ?? '',
    attention: r.paymentIssues.map((i) => `${PAYMENT_ISSUE_LABELS[i.reason]} (${major(i.amount, i.currency)} ${i.currency}${i.refund ? ', refunded' : ''})`).join('; '),
    checkedInAt: local(r.checkedInAt),
    waitingPlace: r.waitingPosition,
    vin: r.privateFields.vin ?? '',
    plate: r.privateFields.plate ?? '',
  }));
  return spreadsheetCsv(cells, {
    number: 'Number',
    title: 'Build',
    code: 'Card code',
    year: 'Year',
    body: 'Make and model',
    owner: 'Entrant',
    email: 'E-mail',
    phone: 'Phone',
    class: 'Class',
    status: 'Status',
    payment: 'Payment',
    enteredAt: `Entered (${show.timeZone})`,
    method: 'Payment method',
    note: 'Payment note',
    reference: 'Payment reference',
    currency: 'Currency',
    fee: 'Fee',
    paid: 'Paid',
    refundDue: 'Refund due',
    refunded: 'Refunded',
    refundedAt: `Refunded (${show.timeZone})`,
    refundRef: 'Refund reference',
    attention: 'Payment needs attention',
    checkedInAt: `Checked in (${show.timeZone})`,
    waitingPlace: 'Waiting-list place',
    vin: 'VIN',
    plate: 'Plate',
  });
}
