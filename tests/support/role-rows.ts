import { adminOnly, everyone, ownOrganiser, ownStaff, ownVolunteers, signedIn, type Fixtures, type Row } from './roles';

/**
 * Rows for the routes the first table left out: auth, invites, the mailbox, slots, publish, close and cancel, bookings,
 * the waiting list, volunteers and benches, triage runs and placements, items' start and safety checks, follow-ups,
 * re-booking and the toolkit. Where a permitted caller would change something for good, the row sends a body or an id
 * that the route refuses after its role check (400 or 404), so every caller meets the same state.
 */
const WRONG_TOKEN = 'wrong-token-of-the-right-length-0000000000';
const organiserOr = (status: number) => ({ ...ownOrganiser, organiser: status, admin: status });
const staffOr = (status: number) => ({ ...ownStaff, host: status, organiser: status, admin: status });
const volunteersOr = (status: number) => ({
  ...ownVolunteers,
  fixer: status,
  host: status,
  organiser: status,
  otherOrganiser: status,
  admin: status,
});
/** Fixers and organisers (not hosts): the parts drawer. */
const partsPeople = (status: number) => ({ ...volunteersOr(status), host: 403 });

export const moreRows: Row[] = [
  // Accounts and sign-in. Logging out is tested last, on its own.
  ['GET', () => '/api/auth/csrf', everyone(200)],
  ['POST', () => '/api/auth/login', everyone(400), {}],
  ['POST', () => '/api/auth/signup', everyone(400), {}],
  ['POST', () => '/api/auth/verify-email', everyone(400), {}],
  ['POST', () => '/api/auth/password-reset', everyone(400), {}],
  ['POST', () => '/api/auth/password-reset/confirm', everyone(400), {}],
  ['POST', () => '/api/auth/first-admin', everyone(400), {}],
  ['POST', () => '/api/auth/password', signedIn(400), {}],
  ['POST', () => '/api/auth/login/code', everyone(400), {}],
  ['GET', () => '/api/auth/two-factor', signedIn(200)],
  // Set-up only stores a secret that is not on until a code confirms it.
  ['POST', () => '/api/auth/two-factor/setup', adminOnly],
  ['POST', () => '/api/auth/two-factor/enable', { ...adminOnly, admin: 400 }, {}],
  ['POST', () => '/api/auth/two-factor/disable', signedIn(400), {}],
  ['PUT', () => '/api/auth/me/language', signedIn(400), {}],
  // Invitations: the token is the key, whoever holds it.
  ['GET', () => '/api/invites/nope', everyone(404)],
  ['POST', () => '/api/invites/nope/accept', signedIn(404)],
  ['POST', () => '/api/invites/nope/signup', { ...everyone(409), anonymous: 400 }, {}],
  // The caught mail.
  ['GET', () => '/api/admin/mailbox/999999', { ...adminOnly, admin: 404 }],
  ['GET', () => '/api/admin/mailbox/999999/html', { ...adminOnly, admin: 404 }],
  ['DELETE', () => '/api/admin/mailbox', { ...adminOnly, admin: 204 }],
  // Sessions: a draft is seen by its organisers only.
  ['GET', (g) => `/api/events/${g.ownEvent}`, { ...everyone(404), organiser: 200, admin: 200 }],
  ['PATCH', (g) => `/api/events/${g.ownEvent}/slots/${g.ownSlot}`, organiserOr(400), { capacity: 'many' }],
  ['DELETE', (g) => `/api/events/${g.ownEvent}/slots/999999`, organiserOr(404)],
  ['POST', (g) => `/api/events/${g.ownEvent}/close`, organiserOr(409)],
  // The other group's draft: its organiser publishes it, and then it is published already.
  [
    'POST',
    (g) => `/api/events/${g.otherEvent}/publish`,
    { ...ownOrganiser, organiser: 403, otherOrganiser: 200, admin: 409 },
  ],
  [
    'POST',
    (g) => `/api/events/${g.otherEvent}/cancel`,
    { ...ownOrganiser, organiser: 403, otherOrganiser: 400, admin: 400 },
    { reason: 'x'.repeat(501) },
  ],
  // Volunteers, rota and benches.
  ['PUT', (g) => `/api/events/${g.ownEvent}/shifts/me`, volunteersOr(400), { status: 'maybe-later' }],
  ['POST', (g) => `/api/events/${g.ownEvent}/rota/ask`, organiserOr(400), {}],
  ['PATCH', (g) => `/api/events/${g.ownEvent}/shifts/999999`, organiserOr(400), { benchId: 'left' }],
  ['PUT', (g) => `/api/events/${g.ownEvent}/benches`, organiserOr(400), {}],
  ['GET', (g) => `/api/venues/${g.ownVenue}/benches`, ownOrganiser],
  ['PUT', (g) => `/api/venues/${g.ownVenue}/benches`, organiserOr(400), {}],
  // Without a group: the venues of the groups the caller organises.
  ['GET', () => '/api/venues', { ...ownOrganiser, otherOrganiser: 200 }],
  ['PUT', () => '/api/me/profile', signedIn(400), { skills: 'all of them' }],
  ['DELETE', (g) => `/api/groups/${g.own}/members/999999`, organiserOr(404)],
  // Triage runs and placements.
  ['GET', (g) => `/api/events/${g.ownEvent}/triage-runs/999999`, organiserOr(404)],
  ['PUT', (g) => `/api/events/${g.ownEvent}/items/999999/placement`, organiserOr(400), {}],
  // Taking an item off a bench is idempotent: an item that is on none is already off.
  ['DELETE', (g) => `/api/events/${g.ownEvent}/items/999999/placement`, organiserOr(204)],
  ['POST', (g) => `/api/events/${g.ownEvent}/items/999999/lock`, organiserOr(400), {}],
  // A visitor's booking: the manage token is the key, whoever holds it.
  ['POST', () => '/api/bookings', everyone(400), {}],
  // A fresh link: an empty form is refused; a good one answers 202 whoever sends it.
  ['POST', () => '/api/bookings/new-link', everyone(400), {}],
  ['GET', (g) => `/api/bookings/${g.reference}?token=${g.manageToken}`, everyone(200)],
  ['GET', (g) => `/api/bookings/${g.reference}?token=${WRONG_TOKEN}`, everyone(404)],
  ['DELETE', (g) => `/api/bookings/${g.reference}?token=${WRONG_TOKEN}`, everyone(404)],
  ['POST', (g) => `/api/bookings/${g.reference}/move?token=${WRONG_TOKEN}`, everyone(404), { slotId: 1 }],
  ['POST', (g) => `/api/bookings/${g.reference}/items/${g.item}/photos?token=${WRONG_TOKEN}`, everyone(404)],
  ['GET', (g) => `/api/bookings/${g.reference}/calendar?token=${g.manageToken}`, everyone(200)],
  // Personal data (issue 14): the copy with the token; erasure with a wrong token and no organiser role is not found.
  ['GET', (g) => `/api/bookings/${g.reference}/personal-data?token=${g.manageToken}`, everyone(200)],
  ['DELETE', (g) => `/api/bookings/${g.reference}/personal-data?token=${WRONG_TOKEN}`, everyone(404)],
  ['GET', () => '/api/me/personal-data', signedIn(200)],
  // Without `confirm: true` nothing is closed: 400 for anyone signed in.
  ['DELETE', () => '/api/me/account', signedIn(400)],
  ['GET', (g) => `/api/public/groups/${g.own}/privacy`, everyone(200)],
  ['GET', () => '/api/photos/999999', everyone(404)],
  ['POST', (g) => `/api/events/${g.liveEvent}/waitlist`, everyone(400), {}],
  ['GET', () => '/api/waiting-list/nope', everyone(404)],
  ['POST', () => '/api/waiting-list/nope/claim', everyone(404)],
  ['POST', () => '/api/rebook/1.nope', everyone(404), { slotId: 1 }],
  // The day itself: items of our group's session.
  ['GET', (g) => `/api/items/${g.item}`, ownVolunteers],
  ['GET', (g) => `/api/items/${g.item}/similar`, ownVolunteers],
  ['POST', (g) => `/api/items/${g.item}/safety-checks`, volunteersOr(400), {}],
  // Repair photos are the fixers' and organisers'; reception takes none.
  ['POST', (g) => `/api/items/${g.item}/photos`, { ...volunteersOr(400), host: 403 }],
  ['POST', (g) => `/api/items/${g.item}/outcome`, volunteersOr(400), {}],
  ['POST', (g) => `/api/bookings/${g.reference}/check-in`, staffOr(400), { items: 'all' }],
  ['POST', (g) => `/api/events/${g.liveEvent}/walk-ins`, staffOr(400), {}],
  // An item that waits for nothing is no follow-up: only an admin's request reaches the check of the body.
  ['PATCH', (g) => `/api/follow-ups/${g.item}`, { ...ownOrganiser, organiser: 403, admin: 400 }, {}],
  // The open data file of items without power, beside the main one (tests/api/roles.test.ts has that one).
  ['GET', (g) => `/api/exports/open-repair-data-unpowered.csv?groupId=${g.own}`, ownOrganiser],
  // An admin merges a history-only group (made by a network import) into another.
  ['POST', () => `/api/admin/groups/999999/merge`, { ...adminOnly, admin: 404 }, (g: Fixtures) => ({ into: g.own })],
  // Bringing in earlier records: organisers of the group, or admins (a whole network's file: admins only).
  ['GET', (g) => `/api/imports?groupId=${g.own}`, ownOrganiser],
  ['GET', () => '/api/imports', adminOnly],
  ['GET', () => '/api/imports/999999', signedIn(404)],
  ['POST', () => '/api/imports/preview', signedIn(400), {}],
  ['POST', () => '/api/imports', { ...adminOnly, organiser: 400, admin: 400 }, (g: Fixtures) => ({ groupId: g.own })],
  // The toolkit: knowledge and the parts drawer.
  ['PUT', () => '/api/knowledge/999999/writeup', volunteersOr(400), {}],
  ['GET', (g) => `/api/groups/${g.own}/knowledge-sharing`, ownOrganiser],
  ['GET', (g) => `/api/groups/${g.own}/salvage/substitutes?type=resistor`, partsPeople(200)],
  ['PATCH', (g) => `/api/salvage/${g.salvage}`, partsPeople(400), {}],
  ['POST', (g) => `/api/salvage/${g.salvage}/take`, partsPeople(400), { quantity: 0 }],
  // Repairs are the fixers' and organisers'; this item's visitor has not checked in yet.
  ['POST', (g) => `/api/items/${g.item}/start`, { ...volunteersOr(409), host: 403 }],
  // A part that is not there: nobody but an admin gets past the group check, and deleting it is idempotent.
  ['DELETE', () => '/api/salvage/999999', { ...everyone(403), anonymous: 401, admin: 204 }],
  ['DELETE', (g) => `/api/salvage/${g.salvage}`, { ...ownOrganiser, organiser: 204, admin: 204 }],
];

/** Runs after every other row: it ends each caller's sign-in. */
export const lastRows: Row[] = [['POST', () => '/api/auth/logout', everyone(204)]];
