import { createBrowserRouter } from 'react-router-dom';
import { AppLayout } from '@client/components/layouts/app-layout';
import { RequireUser } from '@client/components/layouts/require-user';
import { ServerPage } from './server-page';
import { SignInPage } from '@client/features/session/components/sign-in-page';
import { SignUpPage } from '@client/features/session/components/sign-up-page';
import { ResetPasswordPage } from '@client/features/account/components/reset-password-page';
import { AccountPage } from '@client/features/account/components/account-page';
import { VerifyEmailPage } from '@client/features/account/components/verify-email-page';
import { MyBuildsPage } from '@client/features/builds/components/my-builds-page';
import { ShowsPage } from '@client/features/shows/components/shows-page';
import { CreateShowPage } from '@client/features/shows/components/create-show-page';
import { ShowPage } from '@client/features/shows/components/show-page';
import { EnterShowPage } from '@client/features/shows/components/enter-show-page';
import { MyEntriesPage } from '@client/features/shows/components/my-entries-page';
import { InvitationPage } from '@client/features/shows/components/invitation-page';
import { NotFoundPage } from './not-found-page';
import { RouteError } from './route-error';
import { LoadingState } from '@client/components/ui/states';
import { JudgeLayout } from '@client/features/judging/components/judge-layout';
import { JudgeHomePage } from '@client/features/judging/components/judge-home-page';
import { JudgeCarsPage } from '@client/features/judging/components/judge-cars-page';
import { ScoreSheetPage } from '@client/features/judging/components/score-sheet-page';

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
  {
    element: <AppLayout />,
    errorElement: <RouteError />,
    // Shown while a lazy screen's code arrives on a first visit straight to its address.
    hydrateFallbackElement: <LoadingState />,
    children: [
      { path: '/', element: <ServerPage />, errorElement: <RouteError /> },
      { path: '/c', element: <ServerPage />, errorElement: <RouteError /> },
      { path: '/sign-in', element: <SignInPage />, errorElement: <RouteError /> },
      { path: '/sign-up', element: <SignUpPage />, errorElement: <RouteError /> },
      { path: '/reset-password', element: <ResetPasswordPage />, errorElement: <RouteError /> },
      { path: '/verify-email', element: <VerifyEmailPage />, errorElement: <RouteError /> },
      { path: '/account', element: <RequireUser><AccountPage /></RequireUser>, errorElement: <RouteError /> },
      { path: '/builds', element: <RequireUser><MyBuildsPage /></RequireUser>, errorElement: <RouteError /> },
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
      { path: '/shows', element: <RequireUser><ShowsPage /></RequireUser>, errorElement: <RouteError /> },
      { path: '/shows/new', element: <RequireUser><CreateShowPage /></RequireUser>, errorElement: <RouteError /> },
      { path: '/shows/:id', element: <RequireUser><ShowPage /></RequireUser>, errorElement: <RouteError /> },
      { path: '/enter/:slug', element: <RequireUser><EnterShowPage /></RequireUser>, errorElement: <RouteError /> },
      { path: '/entries', element: <RequireUser><MyEntriesPage /></RequireUser>, errorElement: <RouteError /> },
      { path: '/invitations/:token', element: <InvitationPage />, errorElement: <RouteError /> },
      // Show day: the organiser's entries table and the gate, loaded only when opened.
      {
        path: '/shows/:id/entries',
        lazy: async () => {
          const { EntriesPage } = await import('@client/features/show-day/components/entries-page');
          return { element: <RequireUser><EntriesPage /></RequireUser> };
        },
        errorElement: <RouteError />,
      },
      {
        path: '/shows/:id/gate',
        lazy: async () => {
          const { GatePage } = await import('@client/features/show-day/components/gate-page');
          return { element: <RequireUser><GatePage /></RequireUser> };
        },
        errorElement: <RouteError />,
      },
      { path: '*', element: <NotFoundPage /> },
    ],
  },
]);
