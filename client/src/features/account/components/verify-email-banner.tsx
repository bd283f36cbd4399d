import { useResendVerification } from '../api/resend-verification';
import type { CurrentUser } from '@shared/schemas/user';
import { Button } from '@client/components/ui/button';

/** Shown on every screen to a signed-in person whose address is not confirmed yet, with a way to get a new link. */
export function VerifyEmailBanner({ user, demoMode }: { user: CurrentUser; demoMode: boolean }) {
  const resend = useResendVerification();
  return (
    <div role="region" aria-label="Confirm your e-mail address" className="border-b-2 border-caution bg-caution/10">
      <div className="mx-auto flex max-w-5xl flex-wrap items-center justify-between gap-x-4 gap-y-2 px-4 py-2">
        <p className="text-sm">
          <strong>Confirm your e-mail address</strong> ({user.email}) with the link we sent you. Until then you can build and publish, but not enter
          shows or join a show&apos;s team.
          {demoMode ? ' Demo mode: the site admin reads caught mail.' : ''}
        </p>
        {resend.isSuccess ? (
          <p role="status" className="text-sm font-semibold">
            {resend.data.message}
          </p>
        ) : (
          <div className="flex items-center gap-2">
            {resend.isError ? (
              <p role="alert" className="text-sm text-danger">
                {resend.error.message}
              </p>
            ) : null}
            <Button variant="secondary" busy={resend.isPending} onClick={() => resend.mutate()}>
              Send the link again
            </Button>
          </div>
        )}
      </div>
    </div>
  );
}
