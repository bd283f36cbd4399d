import { formatDateTime } from '@shared/words';
import { Link, useParams } from 'react-router-dom';
import { useMail } from '../api/list-mail';
import { useMailMessage } from '../api/get-mail';
import { PageHeader } from '@client/components/ui/page-header';
import { EmptyState, ErrorState, LoadingState } from '@client/components/ui/states';
import { Panel } from '@client/components/ui/panel';
import { UndeliveredMailList } from './undelivered-mail';

/** Links in caught mail become clickable so a newcomer can follow a reset link. */
function Linkified({ text }: { text: string }) {
  const parts = text.split(/(https?:\/\/[^\s]+)/g);
  return (
    <pre className="whitespace-pre-wrap break-words font-sans">
      {parts.map((p, i) =>
        /^https?:\/\//.test(p) ? (
          <a key={i} href={p} className="text-signal-ink underline underline-offset-4">
            {p}
          </a>
        ) : (
          p
        ),
      )}
    </pre>
  );
}

export function MailListPage() {
  const { data, isPending, error, refetch } = useMail();
  return (
    <div>
      <PageHeader title="Caught mail">Demo mode: every e-mail Placard sends is caught here instead of being delivered.</PageHeader>
      <UndeliveredMailList />
      {isPending ? <LoadingState label="Loading mail…" /> : null}
      {error ? <ErrorState error={error} onRetry={() => void refetch()} /> : null}
      {data && data.mail.length === 0 ? <EmptyState title="No mail yet">Ask for a password reset and the e-mail shows up here.</EmptyState> : null}
      {data && data.mail.length > 0 ? (
        <ul className="divide-y divide-rule border border-rule bg-white/60">
          {data.mail.map((m) => (
            <li key={m.id}>
              <Link to={`/admin/mail/${m.id}`} className="flex min-h-11 flex-wrap items-baseline justify-between gap-2 px-4 py-3 hover:bg-paper">
                <span className="font-semibold">{m.subject}</span>
                <span className="text-sm text-graphite">
                  to {m.to} · {formatDateTime(m.receivedAt)}
                </span>
              </Link>
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}

export function MailMessagePage() {
  const id = Number(useParams().id);
  const { data, isPending, error, refetch } = useMailMessage(id);
  return (
    <div>
      <p className="mb-4">
        <Link to="/admin/mail" className="underline underline-offset-4">← All caught mail</Link>
      </p>
      {isPending ? <LoadingState /> : null}
      {error ? <ErrorState error={error} onRetry={() => void refetch()} /> : null}
      {data ? <PageHeader title={data.mail.subject} /> : null}
      {data ? (
        <Panel title="Message">
          <dl className="mb-4 grid grid-cols-[auto_1fr] gap-x-4 text-sm">
            <dt className="text-graphite">From</dt>
            <dd>{data.mail.from}</dd>
            <dt className="text-graphite">To</dt>
            <dd>{data.mail.to}</dd>
            <dt className="text-graphite">Received</dt>
            <dd>{formatDateTime(data.mail.receivedAt)}</dd>
          </dl>
          <Linkified text={data.mail.text} />
        </Panel>
      ) : null}
    </div>
  );
}
