import { useEffect, useRef } from 'react';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { useConfirmEmail } from '../api/confirm-email';
import { useSession } from '@client/features/session/api/get-session';
import { Notice } from '@client/components/ui/notice';
import { PageHeader } from '@client/components/ui/page-header';
import { LoadingState } from '@client/components/ui/states';
import { ApiError } from '@client/lib/api';
import { takeNextAfterSignUp } from '@client/features/session/next-after-sign-up';

const linkClass = 'inline-flex min-h-11 items-center border-2 border-ink bg-ink px-4 font-display uppercase tracking-wide text-paper hover:border-signal hover:bg-signal';

/** Where the confirmation link lands: it sends the token once, then says what happened and where to go. */
export function VerifyEmailPage() {
  const [params] = useSearchParams();
  const token = params.get('token') ?? '';
  const confirm = useConfirmEmail();
  const { data: session } = useSession();
  const navigate = useNavigate();
  const sent = useRef(false);

  useEffect(() => {
    if (sent.current) return; // React's development double effect must not spend the link twice
    sent.current = true;
    confirm.mutate(
      { token },
      // Signed in by the link (this browser signed up): straight on to where they were going.
      { onSuccess: ({ session }) => (session ? navigate(takeNextAfterSignUp(), { replace: true, state: { confirmed: true } }) : undefined) },
    );
  }, [confirm, token, navigate]);

  return (
    <div className="mx-auto max-w-md">
      <PageHeader title="Confirm your e-mail address" />
      {confirm.isSuccess ? (
        <div className="flex flex-col gap-4">
          <Notice tone="ok">
            <p>Your e-mail address is confirmed. You can enter shows and join a show&apos;s team.</p>
          </Notice>
          {session?.user ? (
            <Link to="/builds" className={linkClass}>
              Go to my builds
            </Link>
          ) : (
            <Link to="/sign-in" className={linkClass}>
              Sign in
            </Link>
          )}
        </div>
      ) : confirm.isError ? (
        <Notice tone="danger">
          <p>{confirm.error instanceof ApiError && confirm.error.fields.token ? 'This link has expired or was already used.' : confirm.error.message}</p>
          <p className="mt-1 text-sm">
            {session?.user ? 'Ask for a new link from the banner at the top of the page.' : 'Sign in, then ask for a new link from the banner at the top of the page.'}
          </p>
        </Notice>
      ) : (
        <LoadingState />
      )}
    </div>
  );
}
