import { useState } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { ENTRY_STATUS_LABELS } from '@shared/constants';
import { formatMoney } from '@shared/calc/money';
import type { MyEntry } from '@shared/schemas/entry';
import { Button } from '@client/components/ui/button';
import { ConfirmDialog } from '@client/components/ui/confirm-dialog';
import { Notice } from '@client/components/ui/notice';
import { PageHeader } from '@client/components/ui/page-header';
import { EmptyState, ErrorState, LoadingState } from '@client/components/ui/states';
import { useAcceptOffer } from '../api/accept-offer';
import { useMyEntries } from '../api/list-my-entries';
import { usePayEntry } from '../api/pay-entry';
import { useWithdrawEntry } from '../api/withdraw-entry';
import { entryCardUrl } from '../api/entry-card';
import { showTime } from './show-dates';
import { OwnScores } from '@client/features/results/components/own-scores';

const over = (e: MyEntry) => e.event.status === 'results_published' || e.event.status === 'archived';

/** What the entrant does next, in words. */
function nextStep(e: MyEntry): string {
  const fee = formatMoney(e.feeAmount, e.currency);
  switch (e.status) {
    case 'awaiting_payment':
      return `Pay the entry fee of ${fee} to confirm number ${e.number}.`;
    case 'confirmed':
      return over(e) ? 'The show is over.' : `Print your card with number ${e.number} and bring the car on ${showTime(e.event.startsAt, e.event.timeZone)}.`;
    case 'checked_in':
      return over(e) ? 'The show is over.' : 'Checked in at the gate. Enjoy the show.';
    case 'waiting_list':
      return e.offerExpiresAt ? `A place is free for you: take it by ${showTime(e.offerExpiresAt, e.event.timeZone)}.` : `Number ${e.waitingPosition} on the waiting list. You get an e-mail if a place frees.`;
    case 'withdrawn':
      if (!e.refundDue) return 'Withdrawn.';
      return e.refundedAt ? `Withdrawn. ${formatMoney(e.refundDue, e.currency)} refunded to your card.` : `Withdrawn. Refund due: ${formatMoney(e.refundDue, e.currency)}.`;
  }
}

/** Every entry of the signed-in owner across shows: status, number, class and what to do next. */
export function MyEntriesPage() {
  const [params] = useSearchParams();
  const justPaid = Number(params.get('paid')) || null;
  const { data, isPending, error, refetch } = useMyEntries(justPaid);
  const pay = usePayEntry();
  const withdraw = useWithdrawEntry();
  const accept = useAcceptOffer();
  const [asking, setAsking] = useState<MyEntry | null>(null);
  if (isPending) return <LoadingState />;
  if (error) return <ErrorState error={error} onRetry={() => void refetch()} />;
  return (
    <div>
      <PageHeader title="Your entries">
        Your cars in shows. <Link to="/shows" className="underline">Find a show to enter</Link>.
      </PageHeader>
      <PaymentReturnNotice entry={data.entries.find((e) => e.id === justPaid)} />
      {data.entries.length === 0 ? <EmptyState title="No entries yet">Enter a published build in a show that is taking entries.</EmptyState> : null}
      <ul className="flex flex-col gap-3">
        {data.entries.map((e) => (
          <li key={e.id} className="grid gap-2 border border-rule bg-white/60 p-4 sm:grid-cols-[5rem_1fr_auto] sm:items-center">
            <p className="font-display text-4xl" aria-label={e.number ? `Number ${e.number}` : 'No number yet'}>{e.number ?? '—'}</p>
            <div>
              <p className="text-sm uppercase tracking-wide text-signal-ink">{ENTRY_STATUS_LABELS[e.status]}</p>
              <h2 className="font-display text-xl uppercase">{e.buildTitle}</h2>
              <p className="text-graphite">
                <a href={e.event.publicUrl} className="underline">{e.event.name}</a> · {e.className} · {showTime(e.event.startsAt, e.event.timeZone)}, {e.event.venueName}
              </p>
              <p className="mt-1">{nextStep(e)}</p>
            </div>
            <div className="flex flex-wrap gap-2">
              {e.status === 'awaiting_payment' && e.feeAmount > 0 ? (
                <Button type="button" busy={pay.isPending && pay.variables === e.id} onClick={() => pay.mutate(e.id)}>
                  Pay {formatMoney(e.feeAmount, e.currency)}
                </Button>
              ) : null}
              {e.status === 'waiting_list' && e.offerExpiresAt ? (
                <Button type="button" busy={accept.isPending} onClick={() => accept.mutate(e.id)}>
                  Take the place
                </Button>
              ) : null}
              {(e.status === 'confirmed' || e.status === 'checked_in') && !over(e) ? (
                <>
                  <a
                    href={entryCardUrl(e.id)}
                    download
                    aria-label={`Download the card for No. ${e.number}`}
                    className="inline-flex min-h-11 items-center border-2 border-ink bg-ink px-4 font-display uppercase tracking-wide text-paper hover:bg-paper hover:text-ink"
                  >
                    Card for No. {e.number}
                  </a>
                  <Link to={`/builds/${e.buildId}/card`} className="inline-flex min-h-11 items-center border-2 border-ink px-4 font-display uppercase tracking-wide hover:bg-ink hover:text-paper">
                    Change the design
                  </Link>
                </>
              ) : null}
              {e.status !== 'withdrawn' && e.status !== 'checked_in' && !over(e) ? (
                <Button type="button" variant="secondary" onClick={() => setAsking(e)}>
                  Withdraw
                </Button>
              ) : null}
            </div>
            {e.event.status === 'results_published' || e.event.status === 'archived' ? (e.status === 'confirmed' || e.status === 'checked_in' ? <OwnScores entryId={e.id} /> : null) : null}
          </li>
        ))}
      </ul>
      {pay.isError ? <Notice tone="danger">{pay.error.message}</Notice> : null}
      {accept.isError ? <Notice tone="danger">{accept.error.message}</Notice> : null}
      {withdraw.isError ? <Notice tone="danger">{withdraw.error.message}</Notice> : null}
      <ConfirmDialog
        open={asking !== null}
        title="Withdraw from the show?"
        confirmLabel="Withdraw"
        busy={withdraw.isPending}
        onCancel={() => setAsking(null)}
        onConfirm={() => asking && withdraw.mutate(asking.id, { onSettled: () => setAsking(null) })}
      >
        {asking ? <p>{asking.buildTitle} leaves {asking.event.name}. A build enters a show once, so it cannot be entered again. Any refund follows the show’s refund rule.</p> : null}
      </ConfirmDialog>
    </div>
  );
}

/** Back from the payment service: the webhook confirms the entry a moment later, so say what is happening. */
function PaymentReturnNotice({ entry }: { entry: MyEntry | undefined }) {
  if (!entry) return null;
  if (entry.paidAt) return <Notice tone="ok">Paid, thank you: number {entry.number} in {entry.event.name} is confirmed.</Notice>;
  return <Notice tone="info">Payment received by the payment service; confirming your entry…</Notice>;
}
