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
import { VolunteerHome } from './routes/volunteer-home';
import { GroupPeoplePage } from './routes/groups/people';
import { AdminOverviewPage } from './routes/admin/overview';
import { MailboxPage } from './routes/admin/mailbox';
import { hasRole } from './lib/roles';
import { EventsPage } from './routes/events/list';
import { EventPage } from './routes/events/detail';
import { BookingPage } from './routes/events/book';
import { ManageEventPage } from './routes/events/manage';
import { ManageBookingPage } from './routes/bookings/manage';
import { BookingCodePage, ClaimOfferPage } from './routes/bookings/claim';
import { GroupEventsPage } from './routes/groups/events';
import { NewEventPage } from './routes/groups/new-event';
import { GroupSettingsPage } from './routes/groups/settings';
import { AdminCategoriesPage } from './routes/admin/categories';

const organiser = (u: SessionUser) => u.admin || u.roles.some((r) => r.role === 'organiser');

function StartRedirect() {
  const { data: user, isPending } = useUser();
  if (isPending) return <Spinner />;
  return <Navigate to={user ? landingPath(user) : '/sign-in'} replace />;
}

export const router = createBrowserRouter([
  {
    element: <AppShell />,
    errorElement: <RouteError />,
    children: [
      { index: true, element: <HomePage /> },
      { path: 'safety', element: <SafetyPage /> },
      { path: 'sign-in', element: <SignInPage /> },
      { path: 'volunteer', element: <VolunteerPage /> },
      { path: 'verify-email', element: <VerifyEmailPage /> },
      { path: 'forgot-password', element: <ForgotPasswordPage /> },
      { path: 'reset-password', element: <ResetPasswordPage /> },
      { path: 'setup', element: <SetupPage /> },
      { path: 'start', element: <StartRedirect /> },
      { path: 'bench', element: <RequireRole allow={(u) => hasRole(u, 'fixer')}><VolunteerHome role="fixer" /></RequireRole> },
      { path: 'desk', element: <RequireRole allow={(u) => hasRole(u, 'host')}><VolunteerHome role="host" /></RequireRole> },
      { path: 'events', element: <EventsPage /> },
      { path: 'events/:eventId', element: <EventPage /> },
      { path: 'events/:eventId/book', element: <BookingPage /> },
      { path: 'events/:eventId/manage', element: <RequireRole allow={organiser}><ManageEventPage /></RequireRole> },
      { path: 'bookings/:reference', element: <ManageBookingPage /> },
      { path: 'waiting-list/:token', element: <ClaimOfferPage /> },
      { path: 'b/:reference', element: <BookingCodePage /> },
      { path: 'groups/:groupId/people', element: <RequireRole allow={organiser}><GroupPeoplePage /></RequireRole> },
      { path: 'groups/:groupId/events', element: <RequireRole allow={organiser}><GroupEventsPage /></RequireRole> },
      { path: 'groups/:groupId/events/new', element: <RequireRole allow={organiser}><NewEventPage /></RequireRole> },
      { path: 'groups/:groupId/settings', element: <RequireRole allow={organiser}><GroupSettingsPage /></RequireRole> },
      { path: 'admin/categories', element: <RequireRole allow={(u) => u.admin}><AdminCategoriesPage /></RequireRole> },
      { path: 'admin', element: <RequireRole allow={(u) => u.admin}><AdminOverviewPage /></RequireRole> },
      { path: 'admin/mailbox/:mailId?', element: <RequireRole allow={(u) => u.admin}><MailboxPage /></RequireRole> },
      { path: '*', element: <NotFoundPage /> },
    ],
  },
]);
