import { useEffect, useRef, useState } from 'react';
import { countOf, formatDate, formatDateTime } from '@shared/words';
import { useUser } from '../api/get-user';
import { useSetUserDisabled } from '../api/set-user-disabled';
import { useSendUserReset } from '../api/send-user-reset';
import { Button } from '@client/components/ui/button';
import { ConfirmDialog } from '@client/components/ui/confirm-dialog';
import { ErrorState, LoadingState } from '@client/components/ui/states';

/** One account opened from the list: its builds, last sign-in, and what the site admin can do to it. */
export function AccountPanel({ id, selfId, onClose }: { id: number; selfId: number; onClose: () => void }) {
  const { data, isPending, error, refetch } = useUser(id, true);
  const setDisabled = useSetUserDisabled();
  const sendReset = useSendUserReset();
  const [confirming, setConfirming] = useState(false);
  const heading = useRef<HTMLHeadingElement>(null);
  const loaded = Boolean(data);
  // On a phone the panel opens below the list: bring it into view and give the keyboard its heading.
  useEffect(() => {
    if (!loaded) return;
    heading.current?.scrollIntoView({ block: 'start' });
    heading.current?.focus();
  }, [loaded]);

  if (isPending) return <LoadingState label="Opening the account…" />;
  if (error) return <ErrorState error={error} onRetry={() => void refetch()} />;
  const { user, builds } = data;
  const disabled = Boolean(user.disabledAt);
  const isSelf = user.id === selfId;

  return (
    <section aria-labelledby="account-panel-title" className="mt-6 border-2 border-ink bg-white/70 p-4">
      <div className="flex flex-wrap items-start justify-between gap-3">
        <div>
          <h2 id="account-panel-title" ref={heading} tabIndex={-1} className="font-display text-2xl uppercase">{user.name}</h2>
          <p className="text-graphite">{user.email}</p>
        </div>
        <Button variant="secondary" onClick={onClose}>Close</Button>
      </div>
      <dl className="mt-3 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
        <dt className="font-semibold">Status</dt>
        <dd>{disabled ? `Disabled since ${formatDate(user.disabledAt!)}` : 'Active'}</dd>
        <dt className="font-semibold">Joined</dt>
        <dd>{formatDate(user.createdAt)}</dd>
        <dt className="font-semibold">Last sign-in</dt>
        <dd>{user.lastSignInAt ? formatDateTime(user.lastSignInAt) : 'Never'}</dd>
      </dl>

      <h3 className="mt-4 font-display text-lg uppercase">{countOf(builds.length, 'build')}</h3>
      {builds.length === 0 ? <p className="text-graphite">No builds yet.</p> : null}
      <ul className="divide-y divide-rule">
        {builds.map((b) => (
          <li key={b.id} className="flex flex-wrap items-baseline justify-between gap-2 py-2">
            <span>
              {b.title} <span className="text-sm text-graphite">· {b.published ? 'published' : 'draft'} · changed {formatDate(b.updatedAt)}</span>
            </span>
            {b.published && !disabled ? (
              <a className="underline" href={b.publicUrl} target="_blank" rel="noreferrer">Public page</a>
            ) : null}
          </li>
        ))}
      </ul>

      <div className="mt-4 flex flex-wrap gap-3">
        <Button
          variant={disabled ? 'primary' : 'danger'}
          disabled={isSelf || setDisabled.isPending}
          title={isSelf ? 'You cannot disable your own account.' : undefined}
          onClick={() => (disabled ? setDisabled.mutate({ id: user.id, disabled: false }, { onSuccess: () => void refetch() }) : setConfirming(true))}
        >
          {disabled ? 'Enable the account' : 'Disable the account'}
        </Button>
        {/* A reset link could not get a disabled account back in, so none is offered (the server refuses one too). */}
        {disabled ? null : (
          <Button variant="secondary" disabled={sendReset.isPending} onClick={() => sendReset.mutate(user.id)}>
            Send a password-reset e-mail
          </Button>
        )}
      </div>
      {disabled ? (
        <p className="mt-2 text-graphite">
          No password-reset e-mail while the account is disabled: enable it first. If they sign in with their password, they are told the account is turned off.
        </p>
      ) : null}
      <div aria-live="polite" className="mt-2">
        {sendReset.isSuccess && !disabled ? <p className="text-ok">A reset link went to {sendReset.data.sentTo}.</p> : null}
        {sendReset.error ? <p className="text-danger">{sendReset.error.message}</p> : null}
        {setDisabled.error ? <p className="text-danger">{setDisabled.error.message}</p> : null}
      </div>

      <ConfirmDialog
        open={confirming}
        title={`Disable ${user.name}?`}
        confirmLabel="Disable"
        busy={setDisabled.isPending}
        onCancel={() => setConfirming(false)}
        onConfirm={() =>
          setDisabled.mutate({ id: user.id, disabled: true }, { onSuccess: () => { setConfirming(false); void refetch(); } })
        }
      >
        They are signed out everywhere at once, cannot sign in, and the public pages of their {countOf(builds.filter((b) => b.published).length, 'published build')} go
        offline. Nothing is deleted: enabling the account brings everything back.
      </ConfirmDialog>
    </section>
  );
}
