import { createHmac } from 'node:crypto';
import { AxeBuilder } from '@axe-core/playwright';
import { and, asc, desc, eq, gt, isNotNull, lt } from 'drizzle-orm';
import type { Page } from 'playwright-core';
import { sha256 } from '../../server/src/auth/tokens';
import {
  bookingItems,
  bookings,
  events,
  invites,
  repairGroups,
  slots,
  waitlistEntries,
} from '../../server/src/db/schema/index';
import type { DemoApp } from './demo-app';
import { TEST_SECRET } from './server';

export type Role = 'anonymous' | 'organiser' | 'host' | 'fixer' | 'admin';
export const ROLES: Role[] = ['anonymous', 'organiser', 'host', 'fixer', 'admin'];

/** One screen to check, with the roles that can open it. */
export interface Screen {
  name: string;
  path: string;
  roles: Role[];
}

/** WCAG 2.0, 2.1 and 2.2 at levels A and AA, as axe-core tags its rules. */
export const WCAG_TAGS = ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'wcag22aa'];

const everyone: Role[] = ROLES;
const signedOut: Role[] = ['anonymous'];
const volunteers: Role[] = ['organiser', 'host', 'fixer', 'admin'];
const organisers: Role[] = ['organiser', 'admin'];
const staff: Role[] = ['organiser', 'host', 'admin'];
const itemReaders: Role[] = ['organiser', 'host', 'fixer', 'admin'];
// The demo organiser is also a fixer with the second group, so the fixer's pages are theirs too.
const fixers: Role[] = ['organiser', 'fixer'];
const fixersOrHosts: Role[] = ['organiser', 'host', 'fixer'];

/** Every route of client/src/app/router.tsx, with real ids from the demo scenario. */
export async function demoScreens(app: DemoApp): Promise<Screen[]> {
  const db = app.db.db;
  const groups = await db.select().from(repairGroups).orderBy(asc(repairGroups.id));
  const k = groups.find((g) => g.slug === 'kestlebridge-menders')!.id;
  const o = groups.find((g) => g.slug === 'orrin-vale-fixing-circle')!.id;
  const now = new Date();
  const [today] = await db
    .select()
    .from(events)
    .where(and(eq(events.groupId, k), lt(events.startsAt, now), gt(events.endsAt, now)));
  const [next] = await db
    .select()
    .from(events)
    .where(and(eq(events.groupId, k), eq(events.status, 'published'), gt(events.startsAt, now)))
    .orderBy(asc(events.startsAt))
    .limit(1);
  const [draft] = await db
    .select()
    .from(events)
    .where(and(eq(events.groupId, k), eq(events.status, 'draft')));
  const [past] = await db
    .select()
    .from(events)
    .where(and(eq(events.groupId, k), lt(events.endsAt, now)))
    .orderBy(desc(events.startsAt))
    .limit(1);
  const todayItems = await db
    .select({ id: bookingItems.id, status: bookingItems.status, tag: bookingItems.tagCode })
    .from(bookingItems)
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .where(and(eq(bookings.eventId, today.id), isNotNull(bookingItems.tagCode)))
    .orderBy(asc(bookingItems.id));
  const done = todayItems.find((i) => i.status === 'done') ?? todayItems[0];
  const open = todayItems.find((i) => i.status !== 'done') ?? todayItems[0];
  const [booking] = await db.select().from(bookings).where(eq(bookings.eventId, next.id)).limit(1);
  const manage = (ref: string) =>
    `/bookings/${ref}?token=${createHmac('sha256', TEST_SECRET).update(`manage-booking:${ref}`).digest('base64url')}`;

  // Links that only ever travel by mail: an invitation and an offered waiting-list place.
  await db.insert(invites).values({
    groupId: k,
    email: 'new.fixer@example.org',
    role: 'fixer',
    tokenHash: sha256('axe-invite-token'),
    expiresAt: new Date(now.getTime() + 7 * 86400_000),
  });
  const [slot] = await db.select().from(slots).where(eq(slots.eventId, next.id)).limit(1);
  const [cat] = await db.select({ id: bookingItems.categoryId }).from(bookingItems).limit(1);
  await db.insert(waitlistEntries).values({
    eventId: next.id,
    slotId: slot.id,
    visitorName: 'Olwen Tarrant',
    visitorEmail: 'olwen@example.org',
    request: {
      visitor: { name: 'Olwen Tarrant', email: 'olwen@example.org' },
      items: [{ categoryId: cat.id, fault: 'The zip has come off one side.', hazards: [] }],
    },
    places: 1,
    status: 'offered',
    claimTokenHash: sha256('axe-offer-token'),
    offeredAt: now,
    offerExpiresAt: new Date(now.getTime() + 3600_000),
  });

  const screens: Screen[] = [
    { name: 'home', path: '/', roles: everyone },
    { name: 'safety', path: '/safety', roles: everyone },
    { name: 'sign-in', path: '/sign-in', roles: signedOut },
    { name: 'volunteer', path: '/volunteer', roles: signedOut },
    { name: 'verify-email', path: '/verify-email?token=not-a-real-token', roles: signedOut },
    { name: 'forgot-password', path: '/forgot-password', roles: signedOut },
    { name: 'reset-password', path: '/reset-password?token=not-a-real-token', roles: signedOut },
    { name: 'setup', path: '/setup', roles: signedOut },
    { name: 'join', path: '/join/axe-invite-token', roles: everyone },
    { name: 'sessions', path: '/events', roles: everyone },
    { name: 'session', path: `/events/${next.id}`, roles: everyone },
    { name: 'session-today', path: `/events/${today.id}`, roles: everyone },
    { name: 'past-session', path: `/events/${past.id}`, roles: everyone },
    { name: 'book', path: `/events/${next.id}/book`, roles: everyone },
    { name: 'booking', path: manage(booking.reference), roles: everyone },
    { name: 'booking-code', path: `/b/${booking.reference}`, roles: everyone },
    { name: 'waiting-list-offer', path: '/waiting-list/axe-offer-token', roles: everyone },
    { name: 'tag', path: `/t/${open.tag}`, roles: everyone },
    { name: 'hall-display', path: `/events/${today.id}/hall`, roles: everyone },
    { name: 'public-impact', path: '/impact', roles: everyone },
    { name: 'group-public-impact', path: `/impact/groups/${o}`, roles: everyone },
    { name: 'impact-widget', path: `/embed/impact?group=${k}`, roles: everyone },
    { name: 'calculators', path: '/toolkit/calculators', roles: everyone },
    { name: 'not-found', path: '/no-such-page', roles: everyone },
    { name: 'bench', path: '/bench', roles: fixersOrHosts },
    { name: 'my-skills', path: '/me/skills', roles: fixers },
    { name: 'item-open', path: `/items/${open.id}`, roles: itemReaders },
    { name: 'item-done', path: `/items/${done.id}`, roles: itemReaders },
    { name: 'desk-home', path: '/desk', roles: staff },
    { name: 'desk', path: `/desk/${today.id}`, roles: staff },
    { name: 'tag-sheet', path: `/events/${today.id}/tags`, roles: staff },
    { name: 'repair-notes', path: '/toolkit/knowledge', roles: volunteers },
    { name: 'salvage', path: `/groups/${k}/salvage`, roles: volunteers },
    { name: 'group-sessions', path: `/groups/${k}/events`, roles: organisers },
    { name: 'new-session', path: `/groups/${k}/events/new`, roles: organisers },
    { name: 'group-people', path: `/groups/${k}/people`, roles: organisers },
    { name: 'group-settings', path: `/groups/${k}/settings`, roles: organisers },
    { name: 'skills-matrix', path: `/groups/${k}/skills`, roles: organisers },
    { name: 'manage-session', path: `/events/${next.id}/manage`, roles: organisers },
    { name: 'manage-draft', path: `/events/${draft.id}/manage`, roles: organisers },
    { name: 'rota', path: `/events/${next.id}/rota`, roles: organisers },
    { name: 'triage-board', path: `/events/${next.id}/board`, roles: organisers },
    { name: 'benches', path: `/events/${next.id}/benches`, roles: organisers },
    { name: 'live', path: `/events/${today.id}/live`, roles: organisers },
    { name: 'impact-dashboard', path: `/groups/${k}/impact`, roles: organisers },
    { name: 'impact-records', path: `/impact/records?group=${k}`, roles: organisers },
    { name: 'follow-ups', path: `/groups/${k}/follow-ups`, roles: organisers },
    { name: 'session-report', path: `/events/${past.id}/report`, roles: organisers },
    { name: 'group-report', path: `/groups/${k}/report`, roles: organisers },
    { name: 'admin', path: '/admin', roles: ['admin'] },
    { name: 'network-impact', path: '/admin/impact', roles: ['admin'] },
    { name: 'categories', path: '/admin/categories', roles: ['admin'] },
    { name: 'mailbox', path: '/admin/mailbox', roles: ['admin'] },
  ];
  return screens;
}

/** Waits until the page shows its data: a heading, and no loading bar or "Loading…" left. */
export async function settled(page: Page) {
  await page.waitForFunction(
    () =>
      document.querySelector('h1') !== null &&
      !document.querySelector('[role="progressbar"][aria-label="Loading the page"]') &&
      ![...document.querySelectorAll('[role="status"]')].some((s) => /Loading/.test(s.textContent ?? '')),
    undefined,
    { timeout: 15_000 },
  );
}

/** Serious and critical WCAG A/AA violations on the page as it is now, one readable line each. */
export async function seriousViolations(page: Page, where: string): Promise<string[]> {
  // Only violations carry their nodes back: the passes of a long page are most of the time spent otherwise.
  // Legacy mode runs axe in the page itself: the default opens a blank page per run to merge frame results, and
  // these pages have no cross-origin frames to merge.
  const results = await new AxeBuilder({ page })
    .withTags(WCAG_TAGS)
    .options({ resultTypes: ['violations'] })
    .setLegacyMode()
    .analyze();
  return results.violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map(
      (v) =>
        `${where}: ${v.id} (${v.impact}, ${v.nodes.length}×) ${v.nodes
          .slice(0, 3)
          .map((n) => `${n.target.join(' ')}${contrast(n.any[0]?.data)}`)
          .join(' | ')}`,
    );
}

/** For a contrast failure, the two colours and the ratio found, so the fix can be chosen from the message. */
function contrast(data: unknown): string {
  const d = data as { fgColor?: string; bgColor?: string; contrastRatio?: number } | null;
  return d?.fgColor ? ` [${d.fgColor} on ${d.bgColor}: ${d.contrastRatio}]` : '';
}
