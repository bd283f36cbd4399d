import { formatDateTime } from '@shared/words';
import { Notice } from '@client/components/ui/notice';
import { useUndeliveredMail } from '../api/list-undelivered-mail';

/** Mail the mail server did not take: said plainly, with why, so nobody waits for a reset link that is not coming. */
export function UndeliveredMailList() {
  const { data } = useUndeliveredMail();
  if (!data || data.mail.length === 0) return null;
  return (
    <section aria-labelledby="undelivered" className="mb-6">
      <Notice tone="danger">
        <h2 id="undelivered" className="font-display text-lg uppercase">Not delivered ({data.mail.length})</h2>
        <ul className="mt-2 flex flex-col gap-2">
          {data.mail.map((m) => (
            <li key={m.id} className="break-words">
              <span className="font-semibold">{m.subject}</span> to {m.to} · queued {formatDateTime(m.queuedAt)} ·{' '}
              {m.status === 'retrying' ? `still trying (${m.attempts} ${m.attempts === 1 ? 'retry' : 'retries'} so far)` : 'given up after every retry'}
              {m.lastError ? <span className="block text-sm">Mail server: {m.lastError}</span> : null}
            </li>
          ))}
        </ul>
      </Notice>
    </section>
  );
}
