import { useState } from 'react';
import { ADDRESS_HASH_SHOWN, votingLimitsExplained, type PeoplesChoice } from '@shared/schemas/peoples-choice';
import { countOf, formatDateTime } from '@shared/words';
import { Button } from '@client/components/ui/button';
import { ConfirmDialog } from '@client/components/ui/confirm-dialog';
import { Notice } from '@client/components/ui/notice';
import { useVoidBurst } from '../api/void-burst';

type Burst = PeoplesChoice['bursts'][number];
const short = (hash: string) => hash.slice(0, ADDRESS_HASH_SHOWN);

/** Bursts of new voters from one address, each voidable on its own, and plain words on what the limits can and cannot stop. */
export function VoteBurstsSection({ eventId, pc }: { eventId: number; pc: PeoplesChoice }) {
  const voidBurst = useVoidBurst(eventId);
  const [toVoid, setToVoid] = useState<Burst | null>(null);
  const words = votingLimitsExplained(pc.limits);
  return (
    <section aria-labelledby="vote-bursts">
      <h3 id="vote-bursts" className="font-display uppercase">Bursts of new voters</h3>
      {voidBurst.isSuccess ? <Notice tone="ok">{countOf(voidBurst.data.voided, 'vote')} of the burst voided; the address’s other votes still count.</Notice> : null}
      {voidBurst.error ? <Notice tone="danger">{voidBurst.error.message}</Notice> : null}
      {pc.bursts.length === 0 ? <p className="text-graphite">No bursts so far.</p> : null}
      <ul className="divide-y divide-rule">
        {pc.bursts.map((b) => (
          <li key={`${b.addressHash}-${b.from}`} className="flex flex-wrap items-center justify-between gap-2 py-2">
            <span>
              <code className="font-mono">{short(b.addressHash)}</code> · {countOf(b.votes, 'new voter')} from {formatDateTime(b.from)} to {formatDateTime(b.to)}
              {b.voided ? <span className="text-graphite"> ({b.voided === b.votes ? 'all' : b.voided} voided)</span> : null}
            </span>
            {b.votes > b.voided ? (
              <Button variant="secondary" onClick={() => setToVoid(b)} aria-label={`Void the burst of ${short(b.addressHash)} from ${formatDateTime(b.from)}`}>
                Void this burst
              </Button>
            ) : null}
          </li>
        ))}
      </ul>
      <div className="mt-3 text-sm text-graphite">
        <p className="font-semibold">What the limits stop</p>
        <ul className="list-disc pl-5">{words.stops.map((w) => <li key={w}>{w}</li>)}</ul>
        <p className="mt-2 font-semibold">What they cannot stop</p>
        <ul className="list-disc pl-5">{words.cannotStop.map((w) => <li key={w}>{w}</li>)}</ul>
      </div>
      <ConfirmDialog
        open={toVoid !== null}
        title="Void this burst?"
        confirmLabel="Void the burst"
        busy={voidBurst.isPending}
        onCancel={() => setToVoid(null)}
        onConfirm={() => {
          if (toVoid) voidBurst.mutate({ addressHash: toVoid.addressHash, from: toVoid.from, to: toVoid.to }, { onSettled: () => setToVoid(null) });
        }}
      >
        {toVoid ? <p>{countOf(toVoid.votes - toVoid.voided, 'vote')} from address {short(toVoid.addressHash)} between {formatDateTime(toVoid.from)} and {formatDateTime(toVoid.to)} will stop counting. Its other votes keep counting. This is written in the show’s audit trail.</p> : null}
      </ConfirmDialog>
    </section>
  );
}
