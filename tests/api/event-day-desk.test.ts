import { eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { bookingItems, groupExclusions } from '../../server/src/db/schema/index';
import { manageTokenFor } from '../../server/src/core/links';
import { as, book, cats, db, eventId, groupId, slotIds, useEventDay } from '../support/event-day';
import { categoryId } from '../support/factories';
import { TEST_SECRET } from '../support/server';

useEventDay();

describe('the visitor’s own booking page', () => {
  it('shows their items’ status and queue number, and no longer lets them cancel once checked in', async () => {
    const { reference } = await book(slotIds[2], [
      { categoryId: cats.clothing, fault: 'Strap of a rucksack torn off.' },
    ]);
    const token = manageTokenFor({ env: { SESSION_SECRET: TEST_SECRET } } as never, reference, 1);
    expect((await as.anon.get(`/api/bookings/${reference}?token=${token}`)).json.items[0]).toMatchObject({
      status: 'booked',
      queueNumber: null,
      outcome: null,
    });
    await as.host.post(`/api/bookings/${reference}/check-in`, {});
    const view = (await as.anon.get(`/api/bookings/${reference}?token=${token}`)).json;
    expect(view.items[0].status).toMatch(/checked-in|waiting/);
    expect(view.items[0].queueNumber).toBeGreaterThan(0);
    const cancel = await as.anon.delete(`/api/bookings/${reference}?token=${token}`);
    expect(cancel.status).toBe(409);
    expect(cancel.json.error.code).toBe('checked-in');
  });
});

describe('desk rules found in review', () => {
  it('screens a corrected kind like a booking, and will not mark an item already checked in as a no-show', async () => {
    const microwave = await categoryId(db.db, 'microwave');
    await db.db.insert(groupExclusions).values({ groupId, categoryId: microwave });
    const { reference } = await book(slotIds[2], [{ categoryId: cats.lamp, fault: 'Lamp flickers when moved.' }]);
    const view = (await as.host.get(`/api/events/${eventId}/desk`)).json;
    const item = view.slots
      .flatMap((s: { bookings: { reference: string; items: { id: number }[] }[] }) => s.bookings)
      .find((b: { reference: string }) => b.reference === reference).items[0];
    const refused = await as.host.post(`/api/bookings/${reference}/check-in`, {
      items: [{ id: item.id, arrival: 'arrived', categoryId: microwave }],
    });
    expect(refused.status).toBe(422);
    expect(refused.json.error.fields['items.0.categoryId']).toBeTruthy();
    expect(
      (
        await as.host.post(`/api/bookings/${reference}/check-in`, {
          items: [{ id: item.id, arrival: 'arrived', weightKg: '0,45' }],
        })
      ).status,
    ).toBe(200);
    const late = await as.host.post(`/api/bookings/${reference}/check-in`, {
      items: [{ id: item.id, arrival: 'no-show' }],
    });
    expect(late.status).toBe(409);
    expect(late.json.error.fields['items.0.arrival']).toMatch(/withdrawn/);
    const [row] = await db.db.select().from(bookingItems).where(eq(bookingItems.id, item.id));
    expect(row.weighedKg).toBe(0.45);
  });
});
