import { Link, useNavigate, useParams } from 'react-router-dom';
import { EVENT_ROLE_LABELS } from '@shared/constants';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/notice';
import { PageHeader } from '@client/components/ui/page-header';
import { ErrorState, LoadingState } from '@client/components/ui/states';
import { useSession } from '@client/features/session/api/get-session';
import { useAcceptInvitation } from '../api/accept-invitation';
import { useInvitation } from '../api/get-invitation';

/** Where an invitation link lands: signed in, accept; otherwise sign in or make an account, then come back. */
export function InvitationPage() {
  const token = useParams().token ?? '';
  const invitation = useInvitation(token);
  const session = useSession();
  const accept = useAcceptInvitation(token);
  const navigate = useNavigate();
  if (invitation.isPending || session.isPending) return <LoadingState />;
  if (invitation.error)
    return (
      <div className="max-w-xl">
        <PageHeader title="Invitation" />
        <ErrorState error={invitation.error} />
      </div>
    );
  const inv = invitation.data.invitation;
  const back = encodeURIComponent(`/invitations/${token}`);
  const role = EVENT_ROLE_LABELS[inv.role].toLowerCase();
  return (
    <div className="max-w-xl">
      <PageHeader title={`Join ${inv.eventName}`}>You are invited as {role}.</PageHeader>
      {inv.state !== 'open' ? (
        <Notice tone="caution">{inv.state === 'used' ? 'This invitation was already used.' : inv.state === 'expired' ? 'This invitation has expired: ask the organiser for a new one.' : 'The organiser withdrew this invitation.'}</Notice>
      ) : session.data?.user ? (
        <div className="flex flex-col gap-3">
          <p>Signed in as {session.data.user.name}. Accepting gives this account the {role} role in the show.</p>
          <div>
            <Button type="button" busy={accept.isPending} onClick={() => accept.mutate(undefined, { onSuccess: ({ eventId }) => navigate(`/shows/${eventId}`) })}>
              Accept as {role}
            </Button>
          </div>
          {accept.isError ? <Notice tone="danger">{accept.error.message}</Notice> : null}
        </div>
      ) : (
        <div className="flex flex-wrap gap-3">
          <Link to={`/sign-in?next=${back}`} className="inline-flex min-h-11 items-center border-2 border-ink bg-ink px-4 font-display uppercase tracking-wide text-paper hover:border-signal hover:bg-signal">
            Sign in to accept
          </Link>
          <Link to={`/sign-up?next=${back}`} className="inline-flex min-h-11 items-center border-2 border-ink px-4 font-display uppercase tracking-wide hover:bg-ink hover:text-paper">
            Make an account
          </Link>
        </div>
      )}
    </div>
  );
}
