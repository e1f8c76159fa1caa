import { createBrowserRouter, Navigate } from 'react-router';
import type { SessionUser } from '../../shared/schemas/auth';
import { AppShell } from './components/layouts/app-shell';
import { RequireRole } from './components/layouts/require-role';
import { Spinner } from './components/ui/feedback';
import { useUser } from './features/auth/api/get-me';
import { landingPath } from './lib/roles';
import { HomePage } from './routes/home';
import { NotFoundPage, RouteError } from './routes/not-found';
import { SafetyPage } from './routes/safety';
import { SignInPage } from './routes/auth/sign-in';
import { VolunteerPage } from './routes/auth/volunteer';
import { ForgotPasswordPage, ResetPasswordPage, VerifyEmailPage } from './routes/auth/email-links';
import { SetupPage } from './routes/auth/setup';
import { hasRole } from './lib/roles';
import { EventPage } from './routes/events/detail';
import { ManageBookingPage } from './routes/bookings/manage';
import { BookingCodePage, ClaimOfferPage } from './routes/bookings/claim';

/** Pages most visitors never open load on demand, keeping the first load small on a phone. */
const page = (
  load: () => Promise<Record<string, React.ComponentType>>,
  name: string,
  allow?: (u: SessionUser) => boolean,
) => ({
  lazy: async () => {
    const Component = (await load())[name];
    return {
      Component: allow
        ? () => (
            <RequireRole allow={allow}>
              <Component />
            </RequireRole>
          )
        : Component,
    };
  },
});

const organiser = (u: SessionUser) => u.admin || u.roles.some((r) => r.role === 'organiser');
const admin = (u: SessionUser) => u.admin;
const volunteer = (u: SessionUser) => u.admin || u.roles.length > 0;
const staff = (u: SessionUser) => u.admin || hasRole(u, 'host') || hasRole(u, 'organiser');

function StartRedirect() {
  const { data: user, isPending } = useUser();
  if (isPending) return <Spinner />;
  return <Navigate to={user ? landingPath(user) : '/sign-in'} replace />;
}

export const router = createBrowserRouter([
  // Pages for a TV and for the printer: no header, no menu.
  {
    path: 'events/:eventId/hall',
    errorElement: <RouteError />,
    hydrateFallbackElement: <Spinner />,
    ...page(() => import('./routes/event-day/hall-display'), 'HallDisplayPage'),
  },
  {
    path: 'events/:eventId/report',
    errorElement: <RouteError />,
    hydrateFallbackElement: <Spinner />,
    ...page(() => import('./routes/impact/report'), 'EventReportPage', organiser),
  },
  {
    path: 'groups/:groupId/report',
    errorElement: <RouteError />,
    hydrateFallbackElement: <Spinner />,
    ...page(() => import('./routes/impact/report'), 'GroupReportPage', organiser),
  },
  {
    path: 'embed/impact',
    errorElement: <RouteError />,
    hydrateFallbackElement: <Spinner />,
    ...page(() => import('./routes/impact/embed'), 'ImpactWidgetPage'),
  },
  {
    path: 'events/:eventId/tags',
    errorElement: <RouteError />,
    hydrateFallbackElement: <Spinner />,
    ...page(
      () => import('./routes/event-day/tags'),
      'TagSheetPage',
      (u) => staff(u),
    ),
  },
  {
    element: <AppShell />,
    errorElement: <RouteError />,
    hydrateFallbackElement: <Spinner />,
    children: [
      { index: true, element: <HomePage /> },
      { path: 'safety', element: <SafetyPage /> },
      { path: 'sign-in', element: <SignInPage /> },
      { path: 'volunteer', element: <VolunteerPage /> },
      { path: 'verify-email', element: <VerifyEmailPage /> },
      { path: 'forgot-password', element: <ForgotPasswordPage /> },
      { path: 'reset-password', element: <ResetPasswordPage /> },
      { path: 'setup', element: <SetupPage /> },
      { path: 'join/:token', ...page(() => import('./routes/auth/join'), 'JoinPage') },
      { path: 'start', element: <StartRedirect /> },
      {
        path: 'bench',
        ...page(
          () => import('./routes/volunteers/bench'),
          'BenchPage',
          (u) => hasRole(u, 'fixer') || hasRole(u, 'host'),
        ),
      },
      {
        path: 'me/skills',
        ...page(
          () => import('./routes/volunteers/my-skills'),
          'MySkillsPage',
          (u) => hasRole(u, 'fixer'),
        ),
      },
      {
        path: 'groups/:groupId/skills',
        ...page(() => import('./routes/volunteers/skills-matrix'), 'SkillsMatrixPage', organiser),
      },
      { path: 'events/:eventId/board', ...page(() => import('./routes/triage/board'), 'TriageBoardPage', organiser) },
      { path: 'events/:eventId/rota', ...page(() => import('./routes/triage/rota'), 'RotaPage', organiser) },
      { path: 'events/:eventId/benches', ...page(() => import('./routes/triage/benches'), 'BenchesPage', organiser) },
      { path: 'desk', ...page(() => import('./routes/event-day/desk'), 'DeskHomePage', staff) },
      { path: 'desk/:eventId', ...page(() => import('./routes/event-day/desk'), 'DeskPage', staff) },
      {
        path: 'items/:itemId',
        ...page(
          () => import('./routes/event-day/item'),
          'ItemPage',
          (u) => staff(u) || hasRole(u, 'fixer'),
        ),
      },
      { path: 't/:code', ...page(() => import('./routes/event-day/tag'), 'TagPage') },
      {
        path: 'groups/:groupId/impact',
        ...page(() => import('./routes/impact/dashboard'), 'GroupImpactPage', organiser),
      },
      { path: 'admin/impact', ...page(() => import('./routes/impact/dashboard'), 'NetworkImpactPage', admin) },
      { path: 'impact/records', ...page(() => import('./routes/impact/records'), 'ImpactRecordsPage', organiser) },
      {
        path: 'groups/:groupId/follow-ups',
        ...page(() => import('./routes/impact/follow-ups'), 'FollowUpsPage', organiser),
      },
      { path: 'impact', ...page(() => import('./routes/impact/public'), 'PublicImpactPage') },
      { path: 'impact/groups/:groupId', ...page(() => import('./routes/impact/public'), 'PublicImpactPage') },
      { path: 'toolkit/knowledge', ...page(() => import('./routes/toolkit/knowledge'), 'KnowledgePage', volunteer) },
      { path: 'toolkit/calculators', ...page(() => import('./routes/toolkit/calculators'), 'CalculatorsPage') },
      { path: 'groups/:groupId/salvage', ...page(() => import('./routes/toolkit/salvage'), 'SalvagePage', volunteer) },
      { path: 'rebook/:token', ...page(() => import('./routes/impact/rebook'), 'RebookPage') },
      { path: 'events/:eventId/live', ...page(() => import('./routes/event-day/live'), 'LiveViewPage', organiser) },
      { path: 'events', ...page(() => import('./routes/events/list'), 'EventsPage') },
      { path: 'events/:eventId', element: <EventPage /> },
      { path: 'events/:eventId/book', ...page(() => import('./routes/events/book'), 'BookingPage') },
      { path: 'events/:eventId/manage', ...page(() => import('./routes/events/manage'), 'ManageEventPage', organiser) },
      { path: 'bookings/:reference', element: <ManageBookingPage /> },
      { path: 'waiting-list/:token', element: <ClaimOfferPage /> },
      { path: 'b/:reference', element: <BookingCodePage /> },
      { path: 'groups/:groupId/people', ...page(() => import('./routes/groups/people'), 'GroupPeoplePage', organiser) },
      { path: 'groups/:groupId/events', ...page(() => import('./routes/groups/events'), 'GroupEventsPage', organiser) },
      {
        path: 'groups/:groupId/events/new',
        ...page(() => import('./routes/groups/new-event'), 'NewEventPage', organiser),
      },
      {
        path: 'groups/:groupId/settings',
        ...page(() => import('./routes/groups/settings'), 'GroupSettingsPage', organiser),
      },
      { path: 'admin/categories', ...page(() => import('./routes/admin/categories'), 'AdminCategoriesPage', admin) },
      { path: 'admin', ...page(() => import('./routes/admin/overview'), 'AdminOverviewPage', admin) },
      { path: 'admin/mailbox/:mailId?', ...page(() => import('./routes/admin/mailbox'), 'MailboxPage', admin) },
      { path: '*', element: <NotFoundPage /> },
    ],
  },
]);
