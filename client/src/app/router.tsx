import { lazy, Suspense, type ComponentType } from 'react';
import { createBrowserRouter, redirect, type LoaderFunction, type LoaderFunctionArgs } from 'react-router';
import { Spinner } from '../components/ui/feedback';
import type { OnDemandNamespace } from '../../../shared/i18n/namespaces';
import { allow, meQuery, type Allow } from '../lib/auth';
import { loadNamespaces } from '../lib/i18n';
import { requireRole } from '../lib/guards';
import { queryClient } from '../lib/query-client';
import { landingPath } from '../lib/roles';
import { paths } from '../config/paths';
import { AppShell } from './app-shell';

/**
 * A route module exports its page component and, when the page reads data, a `loader` that warms the query cache
 * (docs/decisions/008). A guarded page checks the role before its loader runs. A module may export an
 * `ErrorBoundary` that says in its own words why its data failed; without one the enclosing `RouteError` does.
 */
type RouteModule = { loader?: LoaderFunction; ErrorBoundary?: ComponentType } & Record<string, unknown>;

const withGuard = (check: Allow | undefined, loader: LoaderFunction | undefined): LoaderFunction | undefined =>
  check
    ? async (args: LoaderFunctionArgs) => {
        await requireRole(check, args);
        return loader ? loader(args) : null;
      }
    : loader;

/**
 * Every page loads on demand: the first load on a phone carries the shell and the page asked for, nothing else. A page
 * names the on-demand catalog namespaces its words are in (shared/i18n/namespaces.ts); they come beside its module.
 */
const page = (
  load: () => Promise<RouteModule>,
  name: string,
  check?: Allow,
  namespaces: readonly OnDemandNamespace[] = [],
) => ({
  lazy: async () => {
    const [m] = await Promise.all([load(), loadNamespaces(namespaces)]);
    return { Component: m[name] as ComponentType, loader: withGuard(check, m.loader), ErrorBoundary: m.ErrorBoundary };
  },
});

// What went wrong is told by a module of its own, fetched only when something does go wrong.
const RouteError = lazy(() => import('./route-error').then((m) => ({ default: m.RouteError })));
const routeError = (
  <Suspense fallback={<Spinner />}>
    <RouteError />
  </Suspense>
);

const start = async () => {
  const user = await queryClient.ensureQueryData(meQuery);
  return redirect(user ? landingPath(user) : paths.signIn());
};

export const router = createBrowserRouter([
  // Pages for a TV and for the printer: no header, no menu.
  {
    path: 'events/:eventId/hall',
    errorElement: routeError,
    hydrateFallbackElement: <Spinner />,
    ...page(() => import('../routes/event-day/hall-display'), 'HallDisplayPage', undefined, ['desk']),
  },
  {
    path: 'events/:eventId/report',
    errorElement: routeError,
    hydrateFallbackElement: <Spinner />,
    ...page(() => import('../routes/impact/report'), 'EventReportPage', allow.organiser, ['figures']),
  },
  {
    path: 'groups/:groupId/report',
    errorElement: routeError,
    hydrateFallbackElement: <Spinner />,
    ...page(() => import('../routes/impact/report'), 'GroupReportPage', allow.organiser, ['figures']),
  },
  {
    path: 'embed/impact',
    errorElement: routeError,
    hydrateFallbackElement: <Spinner />,
    ...page(() => import('../routes/impact/embed'), 'ImpactWidgetPage'),
  },
  {
    path: 'events/:eventId/tags',
    errorElement: routeError,
    hydrateFallbackElement: <Spinner />,
    ...page(() => import('../routes/event-day/tags'), 'TagSheetPage', allow.staff, ['desk']),
  },
  {
    element: <AppShell />,
    errorElement: routeError,
    hydrateFallbackElement: <Spinner />,
    children: [
      {
        // A page that fails to load says so inside the shell, keeping the menu.
        errorElement: routeError,
        children: [
          { index: true, ...page(() => import('../routes/home'), 'HomePage') },
          { path: 'safety', ...page(() => import('../routes/safety'), 'SafetyPage') },
          { path: 'sign-in', ...page(() => import('../routes/auth/sign-in'), 'SignInPage', undefined, ['account']) },
          {
            path: 'volunteer',
            ...page(() => import('../routes/auth/volunteer'), 'VolunteerPage', undefined, ['account']),
          },
          {
            path: 'verify-email',
            ...page(() => import('../routes/auth/email-links'), 'VerifyEmailPage', undefined, ['account']),
          },
          {
            path: 'forgot-password',
            ...page(() => import('../routes/auth/email-links'), 'ForgotPasswordPage', undefined, ['account']),
          },
          {
            path: 'reset-password',
            ...page(() => import('../routes/auth/email-links'), 'ResetPasswordPage', undefined, ['account']),
          },
          { path: 'setup', ...page(() => import('../routes/auth/setup'), 'SetupPage', undefined, ['account']) },
          { path: 'join/:token', ...page(() => import('../routes/auth/join'), 'JoinPage', undefined, ['account']) },
          { path: 'start', loader: start },
          {
            path: 'bench',
            ...page(() => import('../routes/workbench/bench'), 'BenchPage', allow.fixerOrHost, ['bench', 'organise']),
          },
          {
            path: 'me/skills',
            ...page(() => import('../routes/skills/my-skills'), 'MySkillsPage', allow.fixer, ['bench', 'organise']),
          },
          {
            path: 'groups/:groupId/skills',
            ...page(() => import('../routes/skills/skills-matrix'), 'SkillsMatrixPage', allow.organiser, ['organise']),
          },
          {
            path: 'events/:eventId/board',
            ...page(() => import('../routes/triage/board'), 'TriageBoardPage', allow.organiser, ['organise']),
          },
          {
            path: 'events/:eventId/board/runs/:runId',
            ...page(() => import('../routes/triage/run'), 'TriageRunPage', allow.organiser, ['organise']),
          },
          {
            path: 'events/:eventId/rota',
            ...page(() => import('../routes/rota/rota'), 'RotaPage', allow.organiser, ['organise']),
          },
          {
            path: 'events/:eventId/benches',
            ...page(() => import('../routes/benches/benches'), 'BenchesPage', allow.organiser, ['organise']),
          },
          { path: 'desk', ...page(() => import('../routes/event-day/desk'), 'DeskHomePage', allow.staff, ['desk']) },
          {
            path: 'desk/:eventId',
            ...page(() => import('../routes/event-day/desk'), 'DeskPage', allow.staff, ['desk']),
          },
          {
            path: 'items/:itemId',
            ...page(() => import('../routes/event-day/item'), 'ItemPage', allow.itemReader, ['bench']),
          },
          { path: 't/:code', ...page(() => import('../routes/event-day/tag'), 'TagPage', undefined, ['desk']) },
          {
            path: 'groups/:groupId/impact',
            ...page(() => import('../routes/impact/dashboard'), 'GroupImpactPage', allow.organiser, [
              'organise',
              'figures',
            ]),
          },
          {
            path: 'admin/impact',
            ...page(() => import('../routes/impact/dashboard'), 'NetworkImpactPage', allow.admin, ['figures']),
          },
          {
            path: 'impact/records',
            ...page(() => import('../routes/impact/records'), 'ImpactRecordsPage', allow.organiser, ['figures']),
          },
          {
            path: 'groups/:groupId/import',
            ...page(() => import('../routes/impact/import'), 'GroupImportPage', allow.organiser, [
              'organise',
              'figures',
            ]),
          },
          {
            path: 'groups/:groupId/follow-ups',
            ...page(() => import('../routes/impact/follow-ups'), 'FollowUpsPage', allow.organiser, [
              'organise',
              'figures',
            ]),
          },
          {
            path: 'impact',
            ...page(() => import('../routes/impact/public'), 'PublicImpactPage', undefined, ['figures']),
          },
          {
            path: 'impact/groups/:groupId',
            ...page(() => import('../routes/impact/public'), 'PublicImpactPage', undefined, ['figures']),
          },
          {
            path: 'toolkit/knowledge',
            ...page(() => import('../routes/toolkit/knowledge'), 'KnowledgePage', allow.volunteer, ['bench']),
          },
          {
            path: 'toolkit/calculators',
            ...page(() => import('../routes/toolkit/calculators'), 'CalculatorsPage', undefined, ['bench']),
          },
          {
            path: 'groups/:groupId/salvage',
            ...page(() => import('../routes/toolkit/salvage'), 'SalvagePage', allow.volunteer, ['organise', 'bench']),
          },
          {
            path: 'rebook/:token',
            ...page(() => import('../routes/impact/rebook'), 'RebookPage', undefined, ['account']),
          },
          {
            path: 'events/:eventId/live',
            ...page(() => import('../routes/event-day/live'), 'LiveViewPage', allow.organiser, ['organise', 'desk']),
          },
          { path: 'events', ...page(() => import('../routes/events/list'), 'EventsPage') },
          { path: 'events/:eventId', ...page(() => import('../routes/events/detail'), 'EventPage') },
          { path: 'events/:eventId/book', ...page(() => import('../routes/events/book'), 'BookingPage') },
          {
            path: 'events/:eventId/manage',
            ...page(() => import('../routes/events/manage'), 'ManageEventPage', allow.organiser, ['organise']),
          },
          { path: 'bookings/new-link', ...page(() => import('../routes/bookings/new-link'), 'FreshLinkPage') },
          { path: 'bookings/:reference', ...page(() => import('../routes/bookings/manage'), 'ManageBookingPage') },
          { path: 'waiting-list/:token', ...page(() => import('../routes/bookings/claim'), 'ClaimOfferPage') },
          { path: 'b/:reference', ...page(() => import('../routes/bookings/claim'), 'BookingCodePage') },
          {
            path: 'groups/:groupId/people',
            ...page(() => import('../routes/groups/people'), 'GroupPeoplePage', allow.organiser, ['organise']),
          },
          {
            path: 'groups/:groupId/events',
            ...page(() => import('../routes/groups/events'), 'GroupEventsPage', allow.organiser, ['organise']),
          },
          {
            path: 'groups/:groupId/events/new',
            ...page(() => import('../routes/groups/new-event'), 'NewEventPage', allow.organiser, ['organise']),
          },
          { path: 'groups/:groupId/privacy', ...page(() => import('../routes/privacy/group'), 'GroupPrivacyPage') },
          {
            path: 'me/data',
            ...page(() => import('../routes/privacy/account'), 'MyDataPage', allow.signedIn, ['account']),
          },
          {
            path: 'groups/:groupId/settings',
            ...page(() => import('../routes/groups/settings'), 'GroupSettingsPage', allow.organiser, ['organise']),
          },
          {
            path: 'admin/categories',
            ...page(() => import('../routes/admin/categories'), 'AdminCategoriesPage', allow.admin, [
              'admin',
              'organise',
            ]),
          },
          {
            path: 'admin',
            ...page(() => import('../routes/admin/overview'), 'AdminOverviewPage', allow.admin, ['admin']),
          },
          {
            path: 'admin/mailbox/:mailId?',
            ...page(() => import('../routes/admin/mailbox'), 'MailboxPage', allow.admin, ['admin']),
          },
          { path: '*', ...page(() => import('../routes/not-found'), 'NotFoundPage') },
        ],
      },
    ],
  },
]);
