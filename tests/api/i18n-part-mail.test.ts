import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bookingItems, bookings, outbox } from '../../server/src/db/schema/index';
import { type TestDatabase } from '../support/db';
import type { Agent } from '../support/http';
import { startDemoApi, type DemoApi } from '../support/demo-app';

/** The part mail of a follow-up goes out in the language the visitor booked in, whoever records the outcome. */
let db: TestDatabase;
let app: DemoApi;
const as: Record<string, Agent> = {};

beforeAll(async () => {
  app = await startDemoApi();
  ({ db } = app);
  for (const who of ['organiser', 'host']) as[who] = await app.signIn(who);
});
afterAll(() => app.stop());

describe('a part mail in the visitor’s language', () => {
  it('tells a German visitor the part in German, with the cost as Germans write it', async () => {
    await db.db.update(bookings).set({ language: 'de' }).where(eq(bookings.reference, 'T7Q-3YD'));
    const [radio] = await db.db
      .select({ id: bookingItems.id, email: bookings.visitorEmail })
      .from(bookingItems)
      .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
      .where(eq(bookings.reference, 'T7Q-3YD'));
    await as.host.post('/api/bookings/T7Q-3YD/check-in', {});
    await as.organiser.post(`/api/items/${radio.id}/start`, {});
    const r = await as.organiser.post(`/api/items/${radio.id}/outcome`, {
      outcome: 'parts-needed',
      part: { description: 'Filter capacitor 2200 µF 35 V', cost: 12.5, link: 'https://example.org/caps' },
    });
    expect(r.status, r.text).toBe(200);
    const mail = (await db.db.select().from(outbox).where(eq(outbox.toAddress, radio.email!))).find((m) =>
      m.subject.includes('Ersatzteil'),
    )!;
    expect(mail.subject).toMatch(/^Das Ersatzteil für Ihr Gerät \(.+\)$/);
    expect(mail.text).toContain('Hallo Lio,');
    expect(mail.text).toContain(
      'Das Ersatzteil: Filter capacitor 2200 µF 35 V. Wo Sie es finden: https://example.org/caps.',
    );
    // CLDR de: the amount, a decimal comma, a no-break space, then the currency sign.
    expect(mail.text).toContain(
      `Rechnen Sie mit etwa ${new Intl.NumberFormat('de', { style: 'currency', currency: 'GBP' }).format(12.5)}.`,
    );
    expect(mail.text).toMatch(/12,50\s£/);
    expect(mail.html).toContain('<html lang="de">');
    expect(mail.text).toContain('Erneuten Besuch buchen: ');
  });
});
