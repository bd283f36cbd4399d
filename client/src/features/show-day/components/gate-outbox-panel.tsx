import type { QueuedCheckIn } from '../offline/gate-store';

/** What this phone checked in with no signal: how many are not sent yet, and any the server answered with a problem. */
export function GateOutboxPanel({ queue }: { queue: Record<string, QueuedCheckIn> }) {
  const all = Object.values(queue).sort((a, b) => a.item.sequence - b.item.sequence);
  if (!all.length) return null;
  const pending = all.filter((q) => q.state === 'pending').length;
  const problems = all.filter((q) => q.state === 'twice' || q.state === 'refused');
  return (
    <section aria-label="Check-ins on this phone" className="mt-4 border-2 border-ink bg-white p-3">
      <p role="status" className="text-xl font-semibold">
        {pending ? `${pending} check-in${pending === 1 ? '' : 's'} not yet sent` : 'Everything is sent.'}
      </p>
      {problems.length ? (
        <ul className="mt-2 space-y-2">
          {problems.map((q) => (
            <li key={q.item.clientId} className="border-l-8 border-danger bg-danger/10 p-2">
              <p className="font-semibold">{q.state === 'twice' ? 'Checked in twice' : 'Not checked in'}: No. {q.item.number} {q.title}</p>
              <p>{q.message}</p>
            </li>
          ))}
        </ul>
      ) : null}
    </section>
  );
}
