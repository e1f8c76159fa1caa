import { eq } from 'drizzle-orm';
import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { TAG_CODE_PATTERN } from '../../shared/event-day/tag-code';
import { bookingItems, itemStatusChanges } from '../../server/src/db/schema/index';
import { as, book, cats, db, eventId, groupId, ids, passing, server, slotIds, useEventDay } from '../support/event-day';
import { makeEvent, visitor } from '../support/factories';
import { Agent } from '../support/http';

useEventDay();

describe('reception check-in', () => {
  it('gives each arrived item a tag code and a queue number, and checking in again changes nothing', async () => {
    const { reference } = await book(slotIds[0], [
      { categoryId: cats.kettle, fault: 'Switches off before boiling.' },
      { categoryId: cats.clothing, fault: 'Zip has come off one side.' },
    ]);
    const r = await as.host.post(`/api/bookings/${reference}/check-in`, {});
    expect(r.status).toBe(200);
    expect(r.json.items).toHaveLength(2);
    for (const i of r.json.items) {
      expect(i.tagCode).toMatch(TAG_CODE_PATTERN);
      expect(i.id).toBeGreaterThan(0);
    }
    expect(r.json.items.map((i: { queueNumber: number }) => i.queueNumber)).toEqual([1, 2]);
    ids.kettle = r.json.items[0].id;
    ids.coat = r.json.items[1].id;
    // Reference typed in lower case without the hyphen, a second time: the same tags, no new numbers.
    const again = await as.host.post(`/api/bookings/${reference.replace('-', '').toLowerCase()}/check-in`, {});
    expect(again.status).toBe(200);
    expect(again.json.items).toEqual(r.json.items);
  });

  it('places the item with a fixer at a suitable bench as it checks in, and records each change with who made it', async () => {
    const item = (await as.host.get(`/api/items/${ids.kettle}`)).json;
    expect(item.status).toBe('waiting');
    expect(item.placement).toMatchObject({ userId: ids.fixer, benchName: 'Mains bench' });
    const history = await db.db
      .select()
      .from(itemStatusChanges)
      .where(eq(itemStatusChanges.itemId, ids.kettle))
      .orderBy(itemStatusChanges.id);
    expect(history.map((h) => [h.fromStatus, h.toStatus])).toEqual([
      ['booked', 'checked-in'],
      ['checked-in', 'waiting'],
    ]);
    expect(history[0].byUserId).toBe(ids.host);
    expect(history.every((h) => h.createdAt instanceof Date)).toBe(true);
  });

  it('records no-shows and withdrawals item by item, corrects the category and keeps the weight', async () => {
    const { reference } = await book(slotIds[1], [
      { categoryId: cats.lamp, fault: 'No light at all, switch loose.' },
      { categoryId: cats.clothing, fault: 'Hole in the knee.' },
    ]);
    const view = (await as.host.get(`/api/events/${eventId}/desk`)).json;
    const b = view.slots
      .flatMap((s: { bookings: unknown[] }) => s.bookings)
      .find((x: { reference: string }) => x.reference === reference);
    const [lamp, trousers] = b.items;
    const r = await as.host.post(`/api/bookings/${reference}/check-in`, {
      items: [
        { id: lamp.id, arrival: 'arrived', categoryId: cats.kettle, weightKg: '1.24' },
        { id: trousers.id, arrival: 'no-show' },
      ],
    });
    expect(r.status).toBe(200);
    const [l, t] = r.json.items;
    expect(l.tagCode).toMatch(TAG_CODE_PATTERN);
    expect(t).toMatchObject({ status: 'no-show', tagCode: null, queueNumber: null });
    const [row] = await db.db.select().from(bookingItems).where(eq(bookingItems.id, lamp.id));
    expect(row.categoryId).toBe(cats.kettle);
    expect(row.weighedKg).toBe(1.24);
    const bad = await as.host.post(`/api/bookings/${reference}/check-in`, {
      items: [
        { id: lamp.id, arrival: 'lost' },
        { id: 999999, arrival: 'arrived' },
      ],
    });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.json.error.fields)).toContain('items.0.arrival');
  });

  it('is for reception and organisers of the event’s group only', async () => {
    const { reference } = await book(slotIds[1], [{ categoryId: cats.clothing, fault: 'Button off the cuff.' }]);
    expect((await as.fixer.post(`/api/bookings/${reference}/check-in`, {})).status).toBe(403);
    expect((await as.outsider.post(`/api/bookings/${reference}/check-in`, {})).status).toBe(403);
    expect((await as.anon.post(`/api/bookings/${reference}/check-in`, {})).status).toBe(401);
    expect((await as.organiser.post(`/api/bookings/${reference}/check-in`, {})).status).toBe(200);
  });

  it('opens on the day: a session next week cannot check in yet', async () => {
    const later = await makeEvent(db.db, groupId, { startsAt: new Date(Date.now() + 7 * 86400_000) });
    const r = await as.anon.post('/api/bookings', {
      slotId: later.slotIds[0],
      visitor: visitor(),
      items: [{ categoryId: cats.clothing, fault: 'Seam split open.' }],
      consent: true,
    });
    const c = await as.host.post(`/api/bookings/${r.json.reference}/check-in`, {});
    expect(c.status).toBe(409);
    expect(c.json.error.message).toMatch(/opens on the day/);
  });
});

describe('walk-ins', () => {
  it('books and checks in at once, asks for consent and the typed name, and refuses what the group does not take', async () => {
    const noConsent = await as.host.post(`/api/events/${eventId}/walk-ins`, {
      visitor: { name: 'Pat Quill' },
      items: [{ categoryId: cats.clothing, fault: 'Torn pocket lining.' }],
    });
    expect(noConsent.status).toBe(400);
    expect(Object.keys(noConsent.json.error.fields)).toEqual(expect.arrayContaining(['consent', 'consentName']));
    const swollen = await as.host.post(`/api/events/${eventId}/walk-ins`, {
      visitor: { name: 'Pat Quill' },
      items: [{ categoryId: cats.lamp, fault: 'Battery lantern, will not charge.', hazards: ['swollen-battery'] }],
      consent: true,
      consentName: 'Pat Quill',
    });
    expect(swollen.status).toBe(422);
    expect(swollen.json.error.fields['items.0.hazards']).toMatch(/swollen lithium battery/);
    const r = await as.host.post(`/api/events/${eventId}/walk-ins`, {
      slotId: slotIds[0],
      visitor: { name: 'Pat Quill', email: '' },
      items: [{ categoryId: cats.clothing, fault: 'Torn pocket lining.', weightKg: 0.6 }],
      consent: true,
      consentName: 'Pat Quill',
    });
    expect(r.status).toBe(201);
    expect(r.json.reference).toMatch(/^[2-9A-HJ-NP-Z]{3}-[2-9A-HJ-NP-Z]{3}$/);
    expect(r.json.items[0].tagCode).toMatch(TAG_CODE_PATTERN);
    ids.walkIn = r.json.items[0].id;
    expect(
      (
        await as.fixer.post(`/api/events/${eventId}/walk-ins`, {
          visitor: { name: 'X' },
          items: [{ categoryId: cats.clothing, fault: 'Torn pocket.' }],
          consent: true,
          consentName: 'X Y',
        })
      ).status,
    ).toBe(403);
  });

  it('queues after the booked items of the same slot, even when it arrived first', async () => {
    // A booked visitor of slot 0 arrives after the walk-in.
    const { reference } = await book(slotIds[0], [{ categoryId: cats.clothing, fault: 'Hem come down on a skirt.' }]);
    const late = await as.host.post(`/api/bookings/${reference}/check-in`, {});
    const lateNumber = late.json.items[0].queueNumber;
    const walkInNumber = (await as.host.get(`/api/items/${ids.walkIn}`)).json.queueNumber;
    expect(lateNumber).toBeGreaterThan(walkInNumber);
    const q = (await as.anon.get(`/api/public/events/${eventId}/queue`)).json;
    const order = q.waiting.map((w: { queueNumber: number }) => w.queueNumber);
    expect(order.indexOf(lateNumber)).toBeLessThan(order.indexOf(walkInNumber));
  });
});

describe('at the bench', () => {
  it('shows the item to the group’s fixers with the visitor’s first name and initial only, and to no one else', async () => {
    const asFixer = await as.fixer.get(`/api/items/${ids.kettle}`);
    expect(asFixer.status).toBe(200);
    expect(asFixer.json.booking.visitorName).toMatch(/^Visitor [0-9A-F]\.$/);
    expect(asFixer.json.booking.visitorPhone).toBeNull();
    expect(asFixer.json.cautions.map((c: { id: string }) => c.id)).toEqual([
      'mains',
      'capacitors',
      'thermal',
      'hot',
      'check',
    ]);
    expect((await as.outsider.get(`/api/items/${ids.kettle}`)).status).toBe(403);
    expect((await as.anon.get(`/api/items/${ids.kettle}`)).status).toBe(401);
  });

  it('lets the assigned fixer start; a fixer of another group cannot record anything here', async () => {
    expect((await as.outsider.post(`/api/items/${ids.kettle}/outcome`, { outcome: 'advice' })).status).toBe(403);
    expect((await as.outsider.post(`/api/items/${ids.kettle}/safety-checks`, passing)).status).toBe(403);
    const s = await as.fixer.post(`/api/items/${ids.kettle}/start`, {});
    expect(s.status).toBe(200);
    expect(s.json.status).toBe('at-bench');
    // Another fixer of the group cannot record an item that is with someone else.
    const other = await as.fixer2.post(`/api/items/${ids.kettle}/outcome`, { outcome: 'advice' });
    expect(other.status).toBe(403);
    expect(other.json.error.message).toMatch(/another fixer/);
    const q = (await as.anon.get(`/api/public/events/${eventId}/queue`)).json;
    expect(q.serving.map((x: { queueNumber: number }) => x.queueNumber)).toContain(1);
  });

  it('will not record a mains item fixed without a passing safety check, and says why', async () => {
    const none = await as.fixer.post(`/api/items/${ids.kettle}/outcome`, { outcome: 'fixed' });
    expect(none.status).toBe(422);
    expect(none.json.error.code).toBe('safety-check-required');
    // 0.25 MΩ is below the 0.3 MΩ minimum for Class I with heating elements (EN 50678 via instrument manuals, §3).
    const failed = await as.fixer.post(`/api/items/${ids.kettle}/safety-checks`, { ...passing, insulationMOhm: 0.25 });
    expect(failed.status).toBe(201);
    expect(failed.json.pass).toBe(false);
    expect(failed.json.failures.join(' ')).toMatch(/0\.3 MΩ/);
    expect(failed.json.suggestion).toMatch(/needing a part, or as beyond mending/);
    const refused = await as.fixer.post(`/api/items/${ids.kettle}/outcome`, { outcome: 'fixed', minutes: 25 });
    expect(refused.status).toBe(422);
    expect(refused.json.error.code).toBe('safety-check-failed');
    // 0.35 Ω is above the 0.3 Ω limit for a cord up to 5 m.
    const earth = await as.fixer.post(`/api/items/${ids.kettle}/safety-checks`, {
      ...passing,
      protectiveConductorOhm: 0.35,
    });
    expect(earth.json.pass).toBe(false);
    const ok = await as.fixer.post(`/api/items/${ids.kettle}/safety-checks`, passing);
    expect(ok.json).toMatchObject({ pass: true, failures: [], suggestion: null });
    const fixed = await as.fixer.post(`/api/items/${ids.kettle}/outcome`, {
      outcome: 'fixed',
      minutes: 25,
      notes: 'Thermostat contacts cleaned.',
    });
    expect(fixed.status).toBe(200);
    expect(fixed.json.status).toBe('done');
    expect(fixed.json.outcome).toMatchObject({
      outcome: 'fixed',
      minutes: 25,
      safetyCheckId: ok.json.id,
      recordedBy: ids.fixer,
    });
    expect(fixed.json.safetyChecks.map((c: { pass: boolean }) => c.pass)).toEqual([true, false, false]);
  });

  it('refuses a safety check with a missing reading, naming the field', async () => {
    const r = await as.organiser.post(`/api/items/${ids.kettle}/safety-checks`, {
      ...passing,
      protectiveConductorOhm: '',
    });
    expect(r.status).toBe(400);
    expect(r.json.error.fields.protectiveConductorOhm).toMatch(/Class I/);
    expect((await as.organiser.post(`/api/items/${ids.coat}/safety-checks`, passing)).status).toBe(409);
  });

  it('asks for a barrier exactly when the outcome is end of life, and for the part when one is needed', async () => {
    const eol = await as.organiser.post(`/api/items/${ids.coat}/outcome`, { outcome: 'end-of-life' });
    expect(eol.status).toBe(400);
    expect(eol.json.error.fields.barrier).toBeTruthy();
    const stray = await as.organiser.post(`/api/items/${ids.coat}/outcome`, {
      outcome: 'advice',
      barrier: 'too-worn-out',
    });
    expect(stray.status).toBe(400);
    expect(stray.json.error.fields.barrier).toMatch(/only for an item beyond mending/);
    const part = await as.organiser.post(`/api/items/${ids.coat}/outcome`, { outcome: 'parts-needed' });
    expect(part.status).toBe(400);
    expect(part.json.error.fields['part.description']).toBeTruthy();
    // A part's link becomes a link on screen and in the visitor's mail: only http(s) (issue 14, finding 6).
    for (const link of ['javascript:alert(1)', 'data:text/html,<b>x</b>', 'file:///etc/passwd', 'www.example.org']) {
      const bad = await as.organiser.post(`/api/items/${ids.coat}/outcome`, {
        outcome: 'parts-needed',
        part: { description: 'No. 5 open-ended zip, 60 cm', link },
      });
      expect(bad.status, link).toBe(400);
      expect(bad.json.error.fields['part.link']).toMatch(/https:\/\//);
    }
    const ok = await as.organiser.post(`/api/items/${ids.coat}/outcome`, {
      outcome: 'parts-needed',
      part: { description: 'No. 5 open-ended zip, 60 cm', cost: '3.50', link: 'https://parts.example.org/zip-60' },
    });
    expect(ok.status).toBe(200);
    expect(ok.json.outcome).toMatchObject({
      outcome: 'parts-needed',
      partDescription: 'No. 5 open-ended zip, 60 cm',
      partCost: 3.5,
      partLink: 'https://parts.example.org/zip-60',
    });
    // A textile item needs no electrical check to be fixed; recording again corrects the outcome.
    const fixed = await as.organiser.post(`/api/items/${ids.coat}/outcome`, {
      outcome: 'end-of-life',
      barrier: 'too-worn-out',
    });
    expect(fixed.json.outcome).toMatchObject({
      outcome: 'end-of-life',
      barrier: 'too-worn-out',
      barrierLabel: 'Worn past use',
      partDescription: null,
    });
  });

  it('takes a passing check sent with the outcome, and keeps a failing one even though the outcome is refused', async () => {
    const { reference } = await book(slotIds[1], [{ categoryId: cats.kettle, fault: 'Leaks from the base.' }]);
    const c = await as.host.post(`/api/bookings/${reference}/check-in`, {});
    const id = c.json.items[0].id;
    const bad = await as.fixer.post(`/api/items/${id}/outcome`, {
      outcome: 'fixed',
      safety: { ...passing, visual: { ...passing.visual, strainRelief: false } },
    });
    expect(bad.status).toBe(422);
    const view = (await as.fixer.get(`/api/items/${id}`)).json;
    expect(view.safetyChecks).toHaveLength(1);
    expect(view.safetyChecks[0].failures[0]).toMatch(/visual inspection/);
    expect(view.status).not.toBe('done');
    const good = await as.fixer.post(`/api/items/${id}/outcome`, { outcome: 'fixed', safety: passing });
    expect(good.status).toBe(200);
    expect(good.json.status).toBe('done');
  });
});

describe('what the hall and the visitor see', () => {
  it('a scanned tag shows its own item’s status and nobody’s name, address or fault', async () => {
    const item = (await as.host.get(`/api/items/${ids.kettle}`)).json;
    const r = await as.anon.get(`/api/public/tags/${item.tagCode.toLowerCase()}`);
    expect(r.status).toBe(200);
    expect(r.json).toMatchObject({
      tagCode: item.tagCode,
      status: 'done',
      outcomeLabel: 'Fixed',
      categoryName: item.categoryName,
    });
    const everyone = await db.db.select().from(bookingItems);
    expect(r.text).not.toMatch(/Visitor [0-9a-f]|@example\.org|Switches off|Zip has come/i);
    expect(everyone.length).toBeGreaterThan(3);
    expect(r.headers.get('set-cookie')).toBeNull();
    expect((await as.anon.get('/api/public/tags/ZZZZZ')).status).toBe(404);
    expect((await as.anon.get('/api/public/tags/not-a-code')).status).toBe(404);
  });

  it('the hall display lists queue numbers with estimated waits and no names', async () => {
    const r = await as.anon.get(`/api/public/events/${eventId}/queue`);
    expect(r.status).toBe(200);
    expect(r.text).not.toMatch(/Visitor|@|Pat Quill/);
    expect(r.json.done).toBeGreaterThanOrEqual(2);
    expect(r.json.waiting.length).toBeGreaterThan(0);
    for (const w of r.json.waiting) expect(typeof w.waitMinutes).toBe('number');
  });

  it('the organiser’s live view groups by bench and warns when a fixer is idle while items wait', async () => {
    const r = await as.organiser.get(`/api/events/${eventId}/live`);
    expect(r.status).toBe(200);
    expect(r.json.benches.map((b: { name: string }) => b.name)).toEqual(['Mains bench', 'Sewing table']);
    expect(r.json.counts.done).toBeGreaterThanOrEqual(2);
    expect(
      r.json.warnings.some((w: { kind: string; userId: number }) => w.kind === 'idle-fixer' && w.userId === ids.fixer),
    ).toBe(true);
    expect((await as.fixer.get(`/api/events/${eventId}/live`)).status).toBe(403);
  });

  it('prints tags with the QR of the item URL, category, first name and initial, and queue number', async () => {
    const r = await as.host.get(`/api/events/${eventId}/tags?slotId=${slotIds[0]}`);
    expect(r.status).toBe(200);
    const t = r.json.tags.find((x: { itemId: number }) => x.itemId === ids.kettle);
    expect(t.url).toBe(`${server.url}/t/${t.tagCode}`);
    expect(t.qrSvg).toMatch(/^<svg/);
    expect(t.visitor).toMatch(/^Visitor [0-9A-F]\.$/);
    expect(t.queueNumber).toBe(1);
    expect(
      r.json.tags.every(
        (x: { slotStartsAt: string }) =>
          new Date(x.slotStartsAt).getTime() === new Date(r.json.tags[0].slotStartsAt).getTime(),
      ),
    ).toBe(true);
    const one = await as.host.get(`/api/events/${eventId}/tags?items=${ids.kettle}`);
    expect(one.json.tags).toHaveLength(1);
  });
});

describe('repair photos from the bench', () => {
  async function upload(agent: Agent, itemId: number) {
    const data = await sharp({ create: { width: 800, height: 600, channels: 3, background: '#23395d' } })
      .jpeg()
      .toBuffer();
    const form = new FormData();
    form.append('photos', new Blob([new Uint8Array(data)], { type: 'image/jpeg' }), 'fault.jpg');
    const token = agent.csrf ?? (await agent.token());
    const res = await fetch(`${server.url}/api/items/${itemId}/photos`, {
      method: 'POST',
      body: form,
      headers: { cookie: agent.cookieHeader(), 'x-csrf-token': token, accept: 'application/json' },
    });
    return { status: res.status, json: await res.json() };
  }
  it('lets the fixer on the item add them, kept apart from the visitor’s, and no one else', async () => {
    const ok = await upload(as.fixer, ids.kettle);
    expect(ok.status).toBe(201);
    expect(ok.json[0]).toMatchObject({ kind: 'repair', width: 800, height: 600 });
    expect((await upload(as.fixer2, ids.kettle)).status).toBe(403);
    expect((await upload(as.outsider, ids.kettle)).status).toBe(403);
    const view = (await as.fixer.get(`/api/items/${ids.kettle}`)).json;
    expect(view.photos.map((p: { kind: string }) => p.kind)).toEqual(['repair']);
  });
});
