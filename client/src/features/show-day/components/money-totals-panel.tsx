import { formatMoney } from '@shared/calc/money';
import { MONEY_TOTAL_LABELS, PAYMENT_METHOD_LABELS } from '@shared/schemas/money-totals';
import { ErrorState, LoadingState } from '@client/components/ui/states';
import { useMoneyTotals } from '../api/get-money-totals';

/** Money at a glance: collected, refunded and refunds due per method, with the totals and the fees still owed. */
export function MoneyTotalsPanel({ eventId }: { eventId: number }) {
  const totals = useMoneyTotals(eventId);
  if (totals.isPending) return <LoadingState />;
  if (totals.error) return <ErrorState error={totals.error} />;
  const t = totals.data.money;
  const money = (minor: number) => formatMoney(minor, t.currency);
  return (
    <section aria-label="Money" className="my-4 border border-rule bg-white/60 p-3">
      <h2 className="font-display text-lg uppercase">Money</h2>
      <table className="w-full text-left tabular-nums">
        <thead className="text-sm text-graphite">
          <tr>
            <th className="py-1">Method</th>
            <th className="text-right">{MONEY_TOTAL_LABELS.collected}</th>
            <th className="text-right">{MONEY_TOTAL_LABELS.refunded}</th>
            <th className="text-right">{MONEY_TOTAL_LABELS.refundsDue}</th>
          </tr>
        </thead>
        <tbody>
          {t.byMethod.map((m) => (
            <tr key={m.method} className="border-t border-rule">
              <th scope="row" className="py-1 font-normal">{PAYMENT_METHOD_LABELS[m.method]}</th>
              <td className="text-right">{money(m.collected)}</td>
              <td className="text-right">{money(m.refunded)}</td>
              <td className="text-right">{money(m.refundsDue)}</td>
            </tr>
          ))}
          <tr className="border-t-2 border-ink font-semibold">
            <th scope="row" className="py-1">All</th>
            <td className="text-right">{money(t.collected)}</td>
            <td className="text-right">{money(t.refunded)}</td>
            <td className="text-right">{money(t.refundsDue)}</td>
          </tr>
        </tbody>
      </table>
      <p className="mt-2">{MONEY_TOTAL_LABELS.feesDue}: {money(t.feesDue)}</p>
    </section>
  );
}
