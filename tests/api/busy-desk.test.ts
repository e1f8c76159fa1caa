import { and, count, eq, inArray } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { bookings, safetyChecks, shifts, venueBenches } from '../../server/src/db/schema/index';
import { as, cats, db, groupId, ids, passing, useEventDay } from '../support/event-day';
import { makeEvent, visitor } from '../support/factories';

useEventDay();

describe('a busy desk', () => {
  it('answers no 5xx and stores nothing twice while triage runs, safety checks, walk-ins, check-ins and outcomes race', async () => {
    const ev = await makeEvent(db.db, groupId, {
      startsAt: new Date(Date.now() - 15 * 60_000),
      slotCount: 4,
      capacity: 60,
    });
    const eventId = ev.eventId;
    const slotId = ev.slotIds[0];
    await db.db.insert(venueBenches).values([
      { venueId: ev.venueId, name: 'Mains bench', seats: 2, equipment: ['appliance-safety-tester'], position: 0 },
      { venueId: ev.venueId, name: 'Second bench', seats: 2, equipment: ['multimeter'], position: 1 },
    ]);
    for (const userId of [ids.fixer, ids.fixer2])
      await db.db.insert(shifts).values({
        eventId,
        userId,
        coming: true,
        startsAt: new Date(Date.now() - 3600_000),
        endsAt: new Date(Date.now() + 4 * 3600_000),
      });
    const book = async (n: number) => {
      const r = await as.anon.post('/api/bookings', {
        slotId,
        visitor: visitor(),
        items: Array.from({ length: n }, () => ({ categoryId: cats.kettle, fault: 'Switches off before boiling.' })),
        consent: true,
      });
      expect(r.status).toBe(201);
      return r.json.reference as string;
    };
    // One token per caller before the rush, as the browser keeps one (parallel first fetches would race).
    await as.organiser.token();
    await as.host.token();
    const statuses: number[] = [];
    const walkInNames: string[] = [];
    let checksSent = 0;
    const checkedItems: number[] = [];
    for (let round = 0; round < 5; round++) {
      // Before the rush: two bookings of two kettles each checked in, and two bookings still to arrive.
      const arrived: number[] = [];
      for (let b = 0; b < 2; b++) {
        const c = await as.host.post(`/api/bookings/${await book(2)}/check-in`, {});
        expect(c.status).toBe(200);
        arrived.push(...c.json.items.map((i: { id: number }) => i.id));
      }
      const coming = [await book(1), await book(1)];
      const names = Array.from({ length: 4 }, (_, i) => `Walk-in ${round}-${i}`);
      walkInNames.push(...names);
      checksSent += 2;
      checkedItems.push(arrived[0], arrived[1]);
      const rush = [
        as.organiser.post(`/api/events/${eventId}/triage`, {}),
        as.organiser.post(`/api/events/${eventId}/triage`, {}),
        as.organiser.post(`/api/items/${arrived[0]}/safety-checks`, passing),
        as.organiser.post(`/api/items/${arrived[1]}/safety-checks`, passing),
        as.organiser.post(`/api/items/${arrived[2]}/outcome`, { outcome: 'advice', notes: 'Descale it.' }),
        as.organiser.post(`/api/items/${arrived[3]}/outcome`, { outcome: 'advice' }),
        ...coming.map((reference) => as.host.post(`/api/bookings/${reference}/check-in`, {})),
        ...names.map((name) =>
          as.host.post(`/api/events/${eventId}/walk-ins`, {
            slotId,
            visitor: { name },
            items: [{ categoryId: cats.clothing, fault: 'Torn pocket lining.' }],
            consent: true,
            consentName: name,
          }),
        ),
      ];
      const answers = await Promise.all(rush);
      statuses.push(...answers.map((a) => a.status));
      // Every walk-in, safety check and check-in was stored and said so.
      answers.slice(2).forEach((a, i) => expect(a.status, `${i + 2}: ${JSON.stringify(a.json)}`).toBeLessThan(300));
    }
    expect(statuses.filter((s) => s >= 500)).toEqual([]);
    const stored = await db.db
      .select({ name: bookings.visitorName })
      .from(bookings)
      .where(and(eq(bookings.walkIn, true), eq(bookings.eventId, eventId)));
    expect(stored.map((s) => s.name).sort()).toEqual([...walkInNames].sort());
    const [{ n }] = await db.db
      .select({ n: count() })
      .from(safetyChecks)
      .where(inArray(safetyChecks.itemId, checkedItems));
    expect(n).toBe(checksSent);
  }, 60_000);
});
