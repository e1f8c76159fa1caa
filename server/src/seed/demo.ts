import { eq } from 'drizzle-orm';
import { DEMO_PASSWORD } from '../../../shared/constants';
import { hashPassword } from '../auth/passwords';
import type { Db } from '../db/client';
import { memberships, repairGroups, settings, users, venues } from '../db/schema/index';
import { applyDefaultExclusions } from '../core/screening';
import { ensureCategories } from './categories';
import { seedToday } from './demo-today';
import { seedHistory } from './demo-history';
import { seedEvents } from './demo-sessions';
import { seedVolunteers } from './demo-volunteers';
import { DUTCH_ORGANISER, seedDutchGroup } from './demo-dutch';

/**
 * The demo scenario: the invented town of Kestlebridge and its neighbour Orrin Vale, two repair groups,
 * a church-hall venue and a handful of volunteers. Every name here is made up.
 */
export const DEMO_GROUPS = [
  {
    slug: 'kestlebridge-menders',
    name: 'Kestlebridge Menders',
    town: 'Kestlebridge',
    country: 'GBR',
    description:
      'Monthly repair sessions in Tanner’s Yard Hall: lamps, kettles, laptops, clothes and bikes. Bring the thing, its charger, and the story of what went wrong.',
  },
  {
    slug: 'orrin-vale-fixing-circle',
    name: 'Orrin Vale Fixing Circle',
    town: 'Orrin Vale',
    country: 'GBR',
    description:
      'A small group meeting in the old school library on the second Saturday of the month. Strong on textiles and woodwork.',
  },
] as const;

type Role = 'organiser' | 'host' | 'fixer';
export const DEMO_PEOPLE: { email: string; name: string; admin?: boolean; roles: [slug: string, role: Role][] }[] = [
  { email: 'admin@example.org', name: 'Ada Quennell', admin: true, roles: [] },
  {
    email: 'organiser@example.org',
    name: 'Maren Oakridge',
    roles: [
      ['kestlebridge-menders', 'organiser'],
      ['orrin-vale-fixing-circle', 'fixer'],
    ],
  },
  { email: 'fixer@example.org', name: 'Tobin Halloway', roles: [['kestlebridge-menders', 'fixer']] },
  { email: 'host@example.org', name: 'Priya Vantongeren', roles: [['kestlebridge-menders', 'host']] },
  { email: 'wren.ashcombe@example.org', name: 'Wren Ashcombe', roles: [['kestlebridge-menders', 'fixer']] },
  { email: 'idris.pellow@example.org', name: 'Idris Pellow', roles: [['kestlebridge-menders', 'fixer']] },
  {
    email: 'hester.mayle@example.org',
    name: 'Hester Mayle',
    roles: [
      ['kestlebridge-menders', 'fixer'],
      ['orrin-vale-fixing-circle', 'organiser'],
    ],
  },
  { email: 'cosmo.brightwater@example.org', name: 'Cosmo Brightwater', roles: [['orrin-vale-fixing-circle', 'fixer']] },
];

export async function isSeeded(db: Db): Promise<boolean> {
  const [row] = await db.select().from(settings).where(eq(settings.key, 'seeded'));
  return Boolean(row);
}

/**
 * Seeds once; later runs find the `seeded` setting and leave the data alone. With `password` the demo accounts get
 * that password instead of the published one, and the sign-in page does not show it (`demo` is then 'private').
 */
export async function seedDemo(
  db: Db,
  opts: { linkSecret?: string; now?: Date; password?: string } = {},
): Promise<void> {
  await ensureCategories(db);
  const passwordHash = await hashPassword(opts.password ?? DEMO_PASSWORD);
  await db.transaction(async (tx) => {
    await tx.insert(settings).values({ key: 'seeded', value: true });
    await tx.insert(settings).values({ key: 'demo', value: opts.password ? 'private' : true });
    const groupIds: Record<string, number> = {};
    for (const g of DEMO_GROUPS) {
      const [{ id }] = await tx.insert(repairGroups).values(g).$returningId();
      groupIds[g.slug] = id;
    }
    for (const id of Object.values(groupIds)) await applyDefaultExclusions(tx, id);
    await tx
      .update(repairGroups)
      .set({ houseRules: HOUSE_RULES })
      .where(eq(repairGroups.id, groupIds['kestlebridge-menders']));
    await tx
      .update(repairGroups)
      .set({
        houseRules:
          'Bring one item per visitor when we are busy. Children are welcome with an adult. No large furniture: we meet upstairs.',
      })
      .where(eq(repairGroups.id, groupIds['orrin-vale-fixing-circle']));
    await tx.insert(venues).values([
      {
        groupId: groupIds['kestlebridge-menders'],
        name: 'Tanner’s Yard Hall',
        address: '14 Weaver Street',
        town: 'Kestlebridge',
        accessNotes:
          'Step-free entrance from the car park; lift to the upper room. Tables and 13 A sockets along the east wall.',
      },
      {
        groupId: groupIds['orrin-vale-fixing-circle'],
        name: 'Old School Library',
        address: '2 Chapel Lane',
        town: 'Orrin Vale',
        accessNotes: 'Two steps at the front door; a ramp is kept inside.',
      },
    ]);
    const now = new Date();
    for (const p of DEMO_PEOPLE) {
      const [{ id }] = await tx
        .insert(users)
        .values({ email: p.email, name: p.name, admin: p.admin ?? false, passwordHash, emailVerifiedAt: now })
        .$returningId();
      for (const [slug, role] of p.roles)
        await tx.insert(memberships).values({ userId: id, groupId: groupIds[slug], role, status: 'active' });
    }
    await seedEvents(tx as unknown as Db, groupIds, opts.now ?? new Date(), opts.linkSecret ?? 'demo');
    const [{ id: dutchOrganiser }] = await tx
      .insert(users)
      .values({ ...DUTCH_ORGANISER, language: 'nl', passwordHash, emailVerifiedAt: now })
      .$returningId();
    await seedDutchGroup(tx as unknown as Db, dutchOrganiser, opts.now ?? new Date(), opts.linkSecret ?? 'demo');
    await seedVolunteers(tx as unknown as Db);
    await seedToday(tx as unknown as Db, opts.now ?? new Date(), opts.linkSecret ?? 'demo');
    await seedHistory(tx as unknown as Db, opts.now ?? new Date());
    // One volunteer waiting for an organiser to confirm them.
    const [{ id: pendingId }] = await tx
      .insert(users)
      .values({ email: 'juniper.oakes@example.org', name: 'Juniper Oakes', passwordHash, emailVerifiedAt: now })
      .$returningId();
    await tx
      .insert(memberships)
      .values({ userId: pendingId, groupId: groupIds['kestlebridge-menders'], role: 'fixer', status: 'pending' });
  });
}

/** Marks an empty installation as seeded without demo data, so DEMO=1 later does not mix demo rows into real ones. */
export async function markEmptyInstall(db: Db): Promise<void> {
  await db.insert(settings).values({ key: 'seeded', value: false });
}

const HOUSE_RULES = [
  'Book one slot per visitor; up to three items if they are small.',
  'Stay with your item while it is looked at: you will learn how it was fixed.',
  'Our fixers are volunteers and help on a best-effort basis. We cannot guarantee a repair.',
  'Mains items are safety-checked before they go home.',
  'We do not take microwave ovens, gas appliances, anything with a refrigerant circuit, swollen batteries or items with damaged mains cables.',
].join('\n');
