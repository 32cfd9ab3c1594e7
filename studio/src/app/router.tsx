import { createBrowserRouter, RouterProvider } from 'react-router-dom';
import { AppLayout } from '@/components/layouts/app-layout';
import { RouteErrorView } from '@/components/error-view';
import { paths } from '@/config/paths';
import { RequireAdmin, RequireSignIn } from '@/components/route-guards';
import { HeaderActions, NavbarExtra } from './layout-slots';

// Routes load lazily so a reader never downloads the editor's code.
const router = createBrowserRouter([
  {
    element: <AppLayout headerActions={<HeaderActions />} navbarExtra={(close) => <NavbarExtra onNavigate={close} />} />,
    errorElement: <RouteErrorView />,
    children: [
      { path: paths.home, lazy: async () => ({ Component: (await import('./routes/home')).HomeRoute }) },
      { path: paths.status, lazy: async () => ({ Component: (await import('./routes/status')).StatusRoute }) },
      // Public calculator: viewers use it too, signed in or not.
      { path: paths.fitCalculator, lazy: async () => ({ Component: (await import('./routes/fit-calculator')).FitCalculatorRoute }) },
      { path: paths.fitFinder, lazy: async () => ({ Component: (await import('./routes/fit-finder')).FitFinderRoute }) },
      // Published guides: anyone may read them, signed in or not.
      { path: paths.guideIndex, lazy: async () => ({ Component: (await import('./routes/guides')).GuideIndexRoute }) },
      { path: paths.publicGuide.path, lazy: async () => ({ Component: (await import('./routes/guides')).PublicGuideRoute }) },
      { path: paths.guideRevisions.path, lazy: async () => ({ Component: (await import('./routes/guide-revisions')).GuideRevisionsRoute }) },
      { path: paths.guideRevision.path, lazy: async () => ({ Component: (await import('./routes/guide-revisions')).GuideRevisionRoute }) },
      { path: paths.guideCompare.path, lazy: async () => ({ Component: (await import('./routes/guide-revisions')).GuideCompareRoute }) },
      { path: paths.search, lazy: async () => ({ Component: (await import('./routes/search')).SearchRoute }) },
      // Accounts: open to everyone (the e-mailed links land on these).
      { path: paths.signIn, lazy: async () => ({ Component: (await import('./routes/accounts')).SignInRoute }) },
      { path: paths.signUp, lazy: async () => ({ Component: (await import('./routes/accounts')).SignUpRoute }) },
      { path: paths.verifyEmail, lazy: async () => ({ Component: (await import('./routes/accounts')).VerifyEmailRoute }) },
      { path: paths.confirmEmail, lazy: async () => ({ Component: (await import('./routes/accounts')).ConfirmEmailRoute }) },
      { path: paths.forgotPassword, lazy: async () => ({ Component: (await import('./routes/accounts')).ForgotPasswordRoute }) },
      { path: paths.resetPassword, lazy: async () => ({ Component: (await import('./routes/accounts')).ResetPasswordRoute }) },
      { path: paths.acceptInvitation, lazy: async () => ({ Component: (await import('./routes/accounts')).AcceptInvitationRoute }) },
      {
        path: paths.invitationOptOut,
        lazy: async () => ({ Component: (await import('./routes/invitation-opt-out')).InvitationOptOutRoute }),
      },
      { path: paths.unsubscribe, lazy: async () => ({ Component: (await import('./routes/unsubscribe')).UnsubscribeRoute }) },
      {
        path: paths.mailPreferences,
        lazy: async () => ({ Component: (await import('./routes/mail-preferences')).MailPreferencesRoute }),
      },
      // Creator pages: signed-out visitors are sent to sign in and back (?next=). Add workshop pages here.
      {
        element: <RequireSignIn />,
        children: [
          { path: paths.account, lazy: async () => ({ Component: (await import('./routes/accounts')).AccountRoute }) },
          { path: paths.workshops, lazy: async () => ({ Component: (await import('./routes/workshops')).WorkshopsRoute }) },
          { path: paths.workshop.path, lazy: async () => ({ Component: (await import('./routes/workshops')).WorkshopOverviewRoute }) },
          {
            path: paths.workshopSettings.path,
            lazy: async () => ({ Component: (await import('./routes/workshops')).WorkshopSettingsRoute }),
          },
          {
            path: paths.workshopMembers.path,
            lazy: async () => ({ Component: (await import('./routes/workshops')).WorkshopMembersRoute }),
          },
          // Fit data: builds, parts, assemblies and their checklists.
          { path: paths.builds.path, lazy: async () => ({ Component: (await import('./routes/builds')).BuildsRoute }) },
          { path: paths.build.path, lazy: async () => ({ Component: (await import('./routes/build')).BuildRoute }) },
          { path: paths.parts.path, lazy: async () => ({ Component: (await import('./routes/parts')).PartsRoute }) },
          { path: paths.part.path, lazy: async () => ({ Component: (await import('./routes/part')).PartRoute }) },
          { path: paths.assembly.path, lazy: async () => ({ Component: (await import('./routes/assembly')).AssemblyRoute }) },
          { path: paths.footage.path, lazy: async () => ({ Component: (await import('./routes/footage')).FootagePlayerRoute }) },
          { path: paths.guide.path, lazy: async () => ({ Component: (await import('./routes/guide')).GuideRoute }) },
          {
            path: paths.workshopFitReports.path,
            lazy: async () => ({ Component: (await import('./routes/fit-reports')).WorkshopFitReportsRoute }),
          },
        ],
      },
      {
        element: <RequireAdmin />,
        children: [
          { path: paths.adminUsers, lazy: async () => ({ Component: (await import('./routes/admin')).AdminUsersRoute }) },
          { path: paths.adminWorkshops, lazy: async () => ({ Component: (await import('./routes/admin')).AdminWorkshopsRoute }) },
        ],
      },
      { path: '*', lazy: async () => ({ Component: (await import('./routes/not-found')).NotFoundRoute }) },
    ],
  },
]);

export function AppRouter() {
  return <RouterProvider router={router} />;
}
