import { MAKE_AN_ACCOUNT } from '@shared/words';
import { useRef } from 'react';
import { Link, NavLink, Outlet } from 'react-router-dom';
import { useScreenHeading } from './use-screen-heading';
import { useSession } from '@client/features/session/api/get-session';
import { useSignOut } from '@client/features/session/api/sign-out';
import { VerifyEmailBanner } from '@client/features/account/components/verify-email-banner';

const navClass = ({ isActive }: { isActive: boolean }) =>
  `inline-flex min-h-11 items-center px-2 font-display uppercase tracking-wide hover:text-signal-ink ${isActive ? 'text-signal-ink underline decoration-2 underline-offset-8' : ''}`;

/** Header, navigation that follows what the person may do, and the page. */
export function AppLayout() {
  const { data: session } = useSession();
  const signOut = useSignOut();
  const user = session?.user;
  const main = useRef<HTMLElement>(null);
  useScreenHeading(main);

  return (
    <div className="flex min-h-screen flex-col">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:bg-paper focus:p-2">
        Skip to content
      </a>
      <header className="border-b-2 border-ink">
        <div className="mx-auto flex max-w-5xl flex-wrap items-center justify-between gap-x-6 gap-y-1 px-4 py-2">
          <Link to="/" reloadDocument className="font-display text-2xl font-semibold uppercase tracking-[0.2em]">
            Placard<span className="text-signal">.</span>
          </Link>
          <nav aria-label="Main" className="flex flex-wrap items-center gap-x-3">
            <NavLink to="/" end reloadDocument className={navClass}>
              Home
            </NavLink>
            <NavLink to="/c" reloadDocument className={navClass}>
              Builds
            </NavLink>
            {user ? (
              <>
                <NavLink to="/builds" className={navClass}>
                  My builds
                </NavLink>
                <NavLink to="/shows" className={navClass}>
                  Shows
                </NavLink>
                <NavLink to="/entries" className={navClass}>
                  Entries
                </NavLink>
                <NavLink to="/account" className={navClass}>
                  Account
                </NavLink>
                {user.abilities.manageAccounts ? (
                  <NavLink to="/admin/accounts" className={navClass}>
                    Accounts
                  </NavLink>
                ) : null}
                {user.abilities.readCaughtMail ? (
                  <NavLink to="/admin/mail" className={navClass}>
                    Caught mail
                  </NavLink>
                ) : null}
                <button
                  type="button"
                  className="inline-flex min-h-11 items-center px-2 font-display uppercase tracking-wide hover:text-signal-ink"
                  disabled={signOut.isPending}
                  onClick={() => signOut.mutate(undefined, { onSuccess: () => window.location.assign('/') })}
                >
                  Sign out
                </button>
              </>
            ) : (
              <>
                <NavLink to="/sign-in" className={navClass}>
                  Sign in
                </NavLink>
                <NavLink to="/sign-up" className={navClass}>
                  {MAKE_AN_ACCOUNT}
                </NavLink>
              </>
            )}
          </nav>
        </div>
      </header>
      {user && !user.emailVerified ? <VerifyEmailBanner user={user} demoMode={session.demoMode} /> : null}
      <main id="main" ref={main} className="mx-auto w-full min-w-0 max-w-5xl flex-1 px-4 py-6">
        <Outlet />
      </main>
      <footer className="border-t border-rule px-4 py-4 text-center text-sm text-graphite">
        Placard — build sheets, windshield cards and shows.
        {user ? <span className="ml-2">Signed in as {user.name}.</span> : null}
      </footer>
    </div>
  );
}
