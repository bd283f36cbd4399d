import { stringify } from 'csv-stringify/sync';
import { ENTRY_STATUS_LABELS } from '@shared/constants';
import { currencyDecimals } from '@shared/calc/money';
import { PAYMENT_ISSUE_LABELS, PAYMENT_STATE_LABELS, type EntryTableRow } from '@shared/schemas/show-day';

const major = (minor: number | null, currency: string) => (minor === null ? null : minor / 10 ** currencyDecimals(currency));

/**
 * The entries as CSV for a spreadsheet: UTF-8 with a byte-order mark (so spreadsheets do not guess
 * another encoding), a header row, numbers written as bare numbers, and any text cell starting with
 * = + - @ (or a tab / carriage return) prefixed with a quote by csv-stringify's `escape_formulas`,
 * the guard OWASP's "CSV Injection" page describes.
 */
export function entriesCsv(rows: EntryTableRow[]): string {
  return stringify(
    rows.map((r) => ({
      number: r.number,
      title: r.buildTitle,
      code: r.buildCode,
      owner: r.ownerName,
      email: r.contact.email,
      phone: r.contact.phone ?? '',
      class: r.className,
      status: ENTRY_STATUS_LABELS[r.status],
      payment: PAYMENT_STATE_LABELS[r.payment],
      currency: r.currency,
      fee: major(r.feeAmount, r.currency),
      paid: major(r.paidAmount, r.currency),
      refundDue: major(r.refundDue, r.currency),
      refunded: r.refund ? major(r.refund.amount, r.currency) : null,
      refundedAt: r.refund?.at ?? '',
      refundRef: r.refund?.ref ?? '',
      attention: r.paymentIssues.map((i) => `${PAYMENT_ISSUE_LABELS[i.reason]} (${major(i.amount, i.currency)} ${i.currency}${i.refund ? ', refunded' : ''})`).join('; '),
      checkedInAt: r.checkedInAt ?? '',
      waitingPlace: r.waitingPosition,
      vin: r.privateFields.vin ?? '',
      plate: r.privateFields.plate ?? '',
    })),
    {
      bom: true,
      header: true,
      escape_formulas: true,
      columns: [
        { key: 'number', header: 'Number' },
        { key: 'title', header: 'Build' },
        { key: 'code', header: 'Card code' },
        { key: 'owner', header: 'Entrant' },
        { key: 'email', header: 'E-mail' },
        { key: 'phone', header: 'Phone' },
        { key: 'class', header: 'Class' },
        { key: 'status', header: 'Status' },
        { key: 'payment', header: 'Payment' },
        { key: 'currency', header: 'Currency' },
        { key: 'fee', header: 'Fee' },
        { key: 'paid', header: 'Paid' },
        { key: 'refundDue', header: 'Refund due' },
        { key: 'refunded', header: 'Refunded' },
        { key: 'refundedAt', header: 'Refunded at (UTC)' },
        { key: 'refundRef', header: 'Refund reference' },
        { key: 'attention', header: 'Payment needs attention' },
        { key: 'checkedInAt', header: 'Checked in at (UTC)' },
        { key: 'waitingPlace', header: 'Waiting-list place' },
        { key: 'vin', header: 'VIN' },
        { key: 'plate', header: 'Plate' },
      ],
    },
  );
}
