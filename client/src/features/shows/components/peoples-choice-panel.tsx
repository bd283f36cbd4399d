import { useState } from 'react';
import type { EventDetail } from '@shared/schemas/show';
import { ADDRESS_HASH_SHOWN } from '@shared/schemas/peoples-choice';
import { countOf } from '@shared/words';
import { formatInZone } from '@shared/calc/time-zone';
import { Button } from '@client/components/ui/button';
import { ConfirmDialog } from '@client/components/ui/confirm-dialog';
import { Notice } from '@client/components/ui/notice';
import { Panel } from '@client/components/ui/panel';
import { ErrorState, LoadingState } from '@client/components/ui/states';
import { useCloseVoting } from '../api/close-voting';
import { usePeoplesChoice } from '../api/get-peoples-choice';
import { useOpenVoting } from '../api/open-voting';
import { useVoidAddress } from '../api/void-address';
import { VoteBurstsSection } from './vote-bursts-section';

const short = (hash: string) => hash.slice(0, ADDRESS_HASH_SHOWN);

/** The organiser's people's choice: open and close voting, the votes per car, and voiding one address's votes. */
export function PeoplesChoicePanel({ show }: { show: EventDetail }) {
  const query = usePeoplesChoice(show.id);
  const openVoting = useOpenVoting(show.id);
  const closeVoting = useCloseVoting(show.id);
  // One window, two endpoints: pressing one forgets the other's old error.
  const windowBusy = openVoting.isPending || closeVoting.isPending;
  const windowError = openVoting.error ?? closeVoting.error;
  const voidAddress = useVoidAddress(show.id);
  const [toVoid, setToVoid] = useState<{ addressHash: string; votes: number } | null>(null);
  if (query.isPending) return <Panel title="People’s choice"><LoadingState /></Panel>;
  if (query.error) return <Panel title="People’s choice"><ErrorState error={query.error} onRetry={() => void query.refetch()} /></Panel>;
  const pc = query.data.peoplesChoice;
  const leaders = new Set(pc.leaders);
  const counted = pc.addresses.filter((a) => a.votes > a.voided);

  return (
    <Panel
      title="People’s choice"
      actions={
        pc.open ? (
          <Button variant="danger" busy={windowBusy} onClick={() => (openVoting.reset(), closeVoting.mutate())}>
            Close voting
          </Button>
        ) : pc.mayOpen ? (
          <Button busy={windowBusy} onClick={() => (closeVoting.reset(), openVoting.mutate())}>
            {pc.openedAt ? 'Reopen voting' : 'Open voting'}
          </Button>
        ) : null
      }
    >
      <div className="space-y-5">
        {pc.open ? (
          <Notice tone="ok">Voting is open{pc.openedAt ? `, since ${formatInZone(pc.openedAt, show.timeZone, { dateStyle: 'medium', timeStyle: 'short' })}` : ''}: each entered car’s public page has a vote button. One vote per visitor.</Notice>
        ) : pc.mayOpen ? (
          <p className="text-graphite">Voting is closed{pc.closedAt ? ` (closed ${formatInZone(pc.closedAt, show.timeZone, { dateStyle: 'medium', timeStyle: 'short' })})` : ''}. Open it and visitors vote on the public page of each car, one vote each.</p>
        ) : (
          <p className="text-graphite">Voting can be opened on show day and while the show is being judged.</p>
        )}
        {windowError ? <Notice tone="danger">{windowError.message}</Notice> : null}
        {voidAddress.isSuccess ? <Notice tone="ok">{countOf(voidAddress.data.voided, 'vote')} voided.</Notice> : null}
        {voidAddress.error ? <Notice tone="danger">{voidAddress.error.message}</Notice> : null}

        <section>
          <h3 className="font-display uppercase">Votes per car</h3>
          <p className="text-sm text-graphite">
            {countOf(pc.totalVotes, 'vote')} counted{pc.voidedVotes ? `, ${countOf(pc.voidedVotes, 'vote')} voided` : ''}. The most votes wins; a tie shares the award.
          </p>
          <table className="w-full text-left tabular-nums">
            <thead>
              <tr className="border-b border-ink"><th className="py-1">No.</th><th>Car</th><th>Class</th><th className="text-right">Votes</th></tr>
            </thead>
            <tbody>
              {pc.tally.map((t) => (
                <tr key={t.entryId} className="border-b border-rule">
                  <td className="py-1">{t.number}</td>
                  <td>
                    {t.title}
                    {leaders.has(t.entryId) ? <span className="ml-2 text-sm font-semibold uppercase text-signal-ink">{pc.leaders.length > 1 ? 'leading, tied' : 'leading'}</span> : null}
                  </td>
                  <td>{t.className}</td>
                  <td className="text-right">{t.votes}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </section>

        <VoteBurstsSection eventId={show.id} pc={pc} />

        <section>
          <h3 className="font-display uppercase">Votes by address</h3>
          <p className="text-sm text-graphite">Addresses are kept only as a scrambled code, shortened here. Many votes from one code may be one network stuffing the vote, or a busy show Wi-Fi: voiding an address voids its honest visitors too, so void a burst above when you can.</p>
          {pc.addresses.length === 0 ? <p className="text-graphite">No votes yet.</p> : null}
          <ul className="divide-y divide-rule">
            {pc.addresses.map((a) => (
              <li key={a.addressHash} className="flex flex-wrap items-center justify-between gap-2 py-2">
                <span>
                  <code className="font-mono">{short(a.addressHash)}</code> · {countOf(a.votes, 'vote')}
                  {a.voided ? <span className="text-graphite"> ({a.voided === a.votes ? 'all' : a.voided} voided)</span> : null}
                </span>
                {a.votes > a.voided ? (
                  <Button variant="secondary" onClick={() => setToVoid({ addressHash: a.addressHash, votes: a.votes - a.voided })} aria-label={`Void the votes of ${short(a.addressHash)}`}>
                    Void these votes
                  </Button>
                ) : null}
              </li>
            ))}
          </ul>
          {counted.length === 0 && pc.addresses.length ? <p className="text-sm text-graphite">Every address’s votes are voided.</p> : null}
        </section>
      </div>
      <ConfirmDialog
        open={toVoid !== null}
        title="Void these votes?"
        confirmLabel="Void the votes"
        busy={voidAddress.isPending}
        onCancel={() => setToVoid(null)}
        onConfirm={() => {
          if (toVoid) voidAddress.mutate({ addressHash: toVoid.addressHash }, { onSettled: () => setToVoid(null) });
        }}
      >
        {toVoid ? <p>{countOf(toVoid.votes, 'vote')} from address {short(toVoid.addressHash)} will stop counting. The visitors cannot vote again, and this is written in the show’s audit trail.</p> : null}
      </ConfirmDialog>
    </Panel>
  );
}
