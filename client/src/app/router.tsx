import type { ComponentType } from 'react';
import { createBrowserRouter, Navigate, useParams, type RouteObject } from 'react-router-dom';
import { AppLayout } from '@client/components/layouts/app-layout';
import { RequireUser } from '@client/components/layouts/require-user';
import { ServerPage } from './server-page';
import { SignInPage } from '@client/features/session/components/sign-in-page';
import { NotFoundPage } from './not-found-page';
import { RouteError } from './route-error';
import { LoadingState } from '@client/components/ui/states';
import { JudgeLayout } from '@client/features/judging/components/judge-layout';
import { JudgeHomePage } from '@client/features/judging/components/judge-home-page';
import { JudgeCarsPage } from '@client/features/judging/components/judge-cars-page';
import { ScoreSheetPage } from '@client/features/judging/components/score-sheet-page';
import { GatePage } from '@client/features/show-day/components/gate-page';

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

export const router = createBrowserRouter([
  // The judge's screens are in the main bundle and outside the app layout: they must open from the
  // device's copy with no signal, so nothing on them waits for the session or a lazy chunk.
  {
    path: '/judge',
    element: <JudgeLayout />,
    errorElement: <RouteError />,
    children: [
      { index: true, element: <RequireUser><JudgeHomePage /></RequireUser>, errorElement: <RouteError /> },
      { path: ':eventId', element: <JudgeCarsPage />, errorElement: <RouteError /> },
      { path: ':eventId/cars/:entryId', element: <ScoreSheetPage />, errorElement: <RouteError /> },
    ],
  },
  // The gate, like the judge's screens: in the main bundle and outside the app layout, so it reloads with no signal.
  { path: '/gate/:id', element: <main id="main" className="min-h-screen bg-paper px-3 pb-24 pt-3 text-ink"><GatePage /></main>, errorElement: <RouteError /> },
  {
    element: <AppLayout />,
    errorElement: <RouteError />,
    // Shown while a lazy screen's code arrives on a first visit straight to its address.
    hydrateFallbackElement: <LoadingState />,
    children: [
      { path: '/', element: <ServerPage />, errorElement: <RouteError /> },
      { path: '/c', element: <ServerPage />, errorElement: <RouteError /> },
      { path: '/sign-in', element: <SignInPage />, errorElement: <RouteError /> },
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
