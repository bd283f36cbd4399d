import { useState } from 'react';
import { Link } from 'react-router-dom';
import { ENTRY_STATUS_LABELS } from '@shared/constants';
import { formatMoney } from '@shared/calc/money';
import type { MyEntry } from '@shared/schemas/event';
import { Button } from '@client/components/ui/button';
import { ConfirmDialog } from '@client/components/ui/confirm-dialog';
import { Notice } from '@client/components/ui/notice';
import { PageHeader } from '@client/components/ui/page-header';
import { EmptyState, ErrorState, LoadingState } from '@client/components/ui/states';
import { useAcceptOffer, useMyEntries, useWithdrawEntry } from '../api/my-entries';
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
      return e.refundDue ? `Withdrawn. Refund due: ${formatMoney(e.refundDue, e.currency)}.` : 'Withdrawn.';
  }
}

/** Every entry of the signed-in owner across shows: status, number, class and what to do next. */
export function MyEntriesPage() {
  const { data, isPending, error, refetch } = useMyEntries();
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
      {data.entries.length === 0 ? <EmptyState title="No entries yet">Enter a published build in a show that is taking entries.</EmptyState> : null}
      <ul className="flex flex-col gap-3">
        {data.entries.map((e) => (
          <li key={e.id} className="grid gap-2 border border-rule bg-white/60 p-4 sm:grid-cols-[5rem_1fr_auto] sm:items-center">
            <p className="font-display text-4xl" aria-label={e.number ? `Number ${e.number}` : 'No number yet'}>{e.number ?? '—'}</p>
            <div>
              <p className="text-sm uppercase tracking-wide text-signal">{ENTRY_STATUS_LABELS[e.status]}</p>
              <h2 className="font-display text-xl uppercase">{e.buildTitle}</h2>
              <p className="text-graphite">
                <a href={e.event.publicUrl} className="underline">{e.event.name}</a> · {e.className} · {showTime(e.event.startsAt, e.event.timeZone)}, {e.event.venueName}
              </p>
              <p className="mt-1">{nextStep(e)}</p>
            </div>
            <div className="flex flex-wrap gap-2">
              {e.status === 'waiting_list' && e.offerExpiresAt ? (
                <Button type="button" busy={accept.isPending} onClick={() => accept.mutate(e.id)}>
                  Take the place
                </Button>
              ) : null}
              {(e.status === 'confirmed' || e.status === 'checked_in') && !over(e) ? (
                <Link to={`/builds/${e.buildId}/card`} className="inline-flex min-h-11 items-center border-2 border-ink px-4 font-display uppercase tracking-wide hover:bg-ink hover:text-paper">
                  Print the card
                </Link>
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
