import type { ComponentType } from 'react';
import { createBrowserRouter, Navigate, useParams, type RouteObject } from 'react-router-dom';
import { AppLayout } from '@client/components/layouts/app-layout';
import { RequireUser } from '@client/components/layouts/require-user';
import { ServerPage } from './server-page';
import { NotFoundPage } from './not-found-page';
import { RouteError } from './route-error';
import { LoadingState } from '@client/components/ui/states';

function RedirectToGate() {
  return <Navigate replace to={`/gate/${useParams().id}`} />;
}

/**
 * A screen whose code is fetched the first time it is opened, so sign-in and the home page carry only
 * what they need (`npm run bench` prints the sizes). `signedIn` wraps it in RequireUser.
 */
function lazyScreen(path: string, load: () => Promise<ComponentType>, { signedIn = true } = {}): RouteObject {
  return {
    path,
    lazy: async () => {
      const Screen = await load();
      return { element: signedIn ? <RequireUser><Screen /></RequireUser> : <Screen /> };
    },
    errorElement: <RouteError />,
  };
}

/**
 * Each screen's code is a chunk of its own, loaded when its address is opened. For the addresses a person opens
 * cold on one bar of signal (sign-in, the judge's screens, the gate) the server names the screen's chunks in the
 * page it sends (`server/client-shell.ts`, `CLIENT_SCREENS`: keep it in step with the imports here), so they
 * download beside the entry instead of after it; `main.tsx` renders once they are in. The judges' and the gate's
 * service workers keep every chunk of their screens, so those still open with no signal.
 */
export const router = createBrowserRouter([
  // The judge's screens are outside the app layout: nothing on them waits for the session, so they open
  // from the device's copy with no signal.
  {
    path: '/judge',
    lazy: async () => ({ Component: (await import('@client/features/judging/components/judge-layout')).JudgeLayout }),
    errorElement: <RouteError />,
    children: [
      {
        index: true,
        lazy: async () => {
          const { JudgeHomePage } = await import('@client/features/judging/components/judge-home-page');
          return { element: <RequireUser><JudgeHomePage /></RequireUser> };
        },
        errorElement: <RouteError />,
      },
      { path: ':eventId', lazy: async () => ({ Component: (await import('@client/features/judging/components/judge-cars-page')).JudgeCarsPage }), errorElement: <RouteError /> },
      { path: ':eventId/cars/:entryId', lazy: async () => ({ Component: (await import('@client/features/judging/components/score-sheet-page')).ScoreSheetPage }), errorElement: <RouteError /> },
    ],
  },
  // The gate, like the judge's screens: outside the app layout, so it reloads with no signal.
  {
    path: '/gate/:id',
    lazy: async () => {
      const { GatePage } = await import('@client/features/show-day/components/gate-page');
      return { element: <main id="main" className="min-h-screen bg-paper px-3 pb-24 pt-3 text-ink"><GatePage /></main> };
    },
    errorElement: <RouteError />,
  },
  {
    element: <AppLayout />,
    errorElement: <RouteError />,
    // Shown while a lazy screen's code arrives on a first visit straight to its address.
    hydrateFallbackElement: <LoadingState />,
    children: [
      { path: '/', element: <ServerPage />, errorElement: <RouteError /> },
      { path: '/c', element: <ServerPage />, errorElement: <RouteError /> },
      lazyScreen('/sign-in', async () => (await import('@client/features/session/components/sign-in-page')).SignInPage, { signedIn: false }),
      lazyScreen('/sign-up', async () => (await import('@client/features/session/components/sign-up-page')).SignUpPage, { signedIn: false }),
      lazyScreen('/reset-password', async () => (await import('@client/features/account/components/reset-password-page')).ResetPasswordPage, { signedIn: false }),
      lazyScreen('/verify-email', async () => (await import('@client/features/account/components/verify-email-page')).VerifyEmailPage, { signedIn: false }),
      lazyScreen('/account', async () => (await import('@client/features/account/components/account-page')).AccountPage),
      lazyScreen('/builds', async () => (await import('@client/features/builds/components/my-builds-page')).MyBuildsPage),
      {
        path: '/builds/:id',
        // The editor (forms, the numbers, the dyno chart) loads only when opened, so the home page stays light.
        lazy: async () => {
          const { BuildEditorPage } = await import('@client/features/builds/components/build-editor-page');
          return { element: <RequireUser><BuildEditorPage /></RequireUser> };
        },
        errorElement: <RouteError />,
      },
      {
        path: '/builds/:id/card',
        lazy: async () => {
          const { CardDesignerPage } = await import('@client/features/cards/components/card-designer-page');
          return { element: <RequireUser><CardDesignerPage /></RequireUser> };
        },
        errorElement: <RouteError />,
      },
      // The site admin's screens (and the table library they use) load only for the site admin.
      {
        path: '/admin/accounts',
        lazy: async () => {
          const { AccountsPage } = await import('@client/features/admin/components/accounts-page');
          return { element: <RequireUser ability="manageAccounts"><AccountsPage /></RequireUser> };
        },
        errorElement: <RouteError />,
      },
      {
        path: '/admin/mail',
        lazy: async () => {
          const { MailListPage } = await import('@client/features/admin/components/mail-page');
          return { element: <RequireUser ability="readCaughtMail"><MailListPage /></RequireUser> };
        },
        errorElement: <RouteError />,
      },
      {
        path: '/admin/mail/:id',
        lazy: async () => {
          const { MailMessagePage } = await import('@client/features/admin/components/mail-page');
          return { element: <RequireUser ability="readCaughtMail"><MailMessagePage /></RequireUser> };
        },
        errorElement: <RouteError />,
      },
      lazyScreen('/shows', async () => (await import('@client/features/shows/components/shows-page')).ShowsPage),
      lazyScreen('/shows/new', async () => (await import('@client/features/shows/components/create-show-page')).CreateShowPage),
      lazyScreen('/shows/:id', async () => (await import('@client/features/shows/components/show-page')).ShowPage),
      lazyScreen('/enter/:slug', async () => (await import('@client/features/shows/components/enter-show-page')).EnterShowPage),
      lazyScreen('/entries', async () => (await import('@client/features/shows/components/my-entries-page')).MyEntriesPage),
      lazyScreen('/invitations/:token', async () => (await import('@client/features/shows/components/invitation-page')).InvitationPage, { signedIn: false }),
      // Show day: the organiser's entries table and the gate, loaded only when opened.
      {
        path: '/shows/:id/entries',
        lazy: async () => {
          const { EntriesPage } = await import('@client/features/show-day/components/entries-page');
          return { element: <RequireUser><EntriesPage /></RequireUser> };
        },
        errorElement: <RouteError />,
      },
      // The gate moved outside the app layout (below); old links still arrive.
      { path: '/shows/:id/gate', element: <RedirectToGate />, errorElement: <RouteError /> },
      lazyScreen('/shows/:id/read-out', async () => (await import('@client/features/results/components/read-out-page')).ReadOutPage),
      { path: '*', element: <NotFoundPage /> },
    ],
  },
]);
