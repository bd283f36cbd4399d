import { useState } from 'react';
import { ENTRY_STATUS_LABELS } from '@shared/constants';
import { formatMoney } from '@shared/calc/money';
import type { EventDetail, OrganiserEntry } from '@shared/schemas/event';
import { Button } from '@client/components/ui/button';
import { ConfirmDialog } from '@client/components/ui/confirm-dialog';
import { Notice } from '@client/components/ui/notice';
import { Panel } from '@client/components/ui/panel';
import { EmptyState, LoadingState } from '@client/components/ui/states';
import { useShowEntries } from '../api/show-entries';
import { useWithdrawEntry } from '../api/my-entries';

/** Every entry of the show for its organisers: number, car, owner, class, status, money; withdraw with the refund the rule gives. */
export function EntriesPanel({ show }: { show: EventDetail }) {
  const entries = useShowEntries(show.id);
  const withdraw = useWithdrawEntry();
  const [asking, setAsking] = useState<OrganiserEntry | null>(null);
  const list = entries.data?.entries ?? [];
  const placed = list.filter((e) => e.number !== null && e.status !== 'withdrawn').length;
  return (
    <Panel title={`Entries (${placed}${show.capacity ? ` of ${show.capacity}` : ''})`}>
      {entries.isPending ? <LoadingState /> : list.length === 0 ? <EmptyState title="No entries yet" /> : (
        <div className="overflow-x-auto">
          <table className="w-full min-w-[40rem] text-left">
            <thead className="text-sm text-graphite">
              <tr><th className="py-1">No.</th><th>Car</th><th>Owner</th><th>Class</th><th>Status</th><th>Fee</th><th /></tr>
            </thead>
            <tbody>
              {list.map((e) => (
                <tr key={e.id} className="border-t border-rule">
                  <td className="py-2 font-display text-lg">{e.number ?? '—'}</td>
                  <td><a href={`/c/${e.buildCode}`} className="underline">{e.buildTitle}</a></td>
                  <td>{e.ownerName}</td>
                  <td>{e.className}</td>
                  <td>
                    {ENTRY_STATUS_LABELS[e.status]}
                    {e.waitingPosition ? ` (${e.waitingPosition} in line${e.offerExpiresAt ? ', offered a place' : ''})` : ''}
                    {e.status === 'withdrawn' && e.refundDue ? ` · refund ${formatMoney(e.refundDue, e.currency)}` : ''}
                  </td>
                  <td>{e.feeAmount === 0 ? 'Free' : `${formatMoney(e.feeAmount, e.currency)}${e.paidAt ? ' paid' : ''}`}</td>
                  <td>
                    {e.status !== 'withdrawn' && show.abilities.manage ? (
                      <Button type="button" variant="quiet" onClick={() => setAsking(e)}>
                        Withdraw
                      </Button>
                    ) : null}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      {withdraw.isError ? <Notice tone="danger">{withdraw.error.message}</Notice> : null}
      <ConfirmDialog
        open={asking !== null}
        title="Withdraw this entry?"
        confirmLabel="Withdraw"
        busy={withdraw.isPending}
        onCancel={() => setAsking(null)}
        onConfirm={() => asking && withdraw.mutate(asking.id, { onSettled: () => setAsking(null), onSuccess: () => void entries.refetch() })}
      >
        {asking ? <p>{asking.buildTitle} leaves the show; the owner is told by e-mail, with the refund the show’s rule gives. Its place goes to the first on the waiting list.</p> : null}
      </ConfirmDialog>
    </Panel>
  );
}
