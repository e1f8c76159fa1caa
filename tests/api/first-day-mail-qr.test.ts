import { eq } from 'drizzle-orm';
import { simpleParser } from 'mailparser';
import QRCode from 'qrcode';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mailboxMessages, outbox } from '../../server/src/db/schema/index';
import { freePort } from '../../server/src/infra/mariadb';
import { LocalMailbox } from '../../server/src/mail/local-mailbox';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { categoryId, makeEvent, makeGroup, makeUser, visitor } from '../support/factories';
import { Agent } from '../support/http';
import { startTestServer } from '../support/server';

const PUBLIC_URL = 'https://mendery.test';
let db: TestDatabase;
let server: RunningServer;
let mailbox: LocalMailbox;

beforeAll(async () => {
  db = await createTestDatabase();
  const port = await freePort();
  mailbox = new LocalMailbox(db.db, port);
  await mailbox.start();
  server = await startTestServer(
    db.url,
    { SMTP_HOST: '127.0.0.1', SMTP_PORT: String(port), PUBLIC_URL },
    { sender: 'smtp' },
  );
});
afterAll(async () => {
  await server.stop();
  await mailbox.stop();
  await db.drop();
});

/** True where the picture is dark at the centre of QR module (row, col), as qrcode draws it. */
async function modulesOf(png: Buffer, size: number, margin = 2) {
  const { data, info } = await sharp(png).greyscale().raw().toBuffer({ resolveWithObject: true });
  const scale = info.width / (size + margin * 2);
  return (row: number, col: number) => {
    const x = Math.floor((col + margin + 0.5) * scale);
    const y = Math.floor((row + margin + 0.5) * scale);
    return data[(y * info.width + x) * info.channels] < 128;
  };
}

describe('the booking confirmation mail', () => {
  it('carries the QR code as an inline image (cid), links the booking page, and the admin mailbox shows the picture', async () => {
    const groupId = await makeGroup(db.db);
    const { slotIds } = await makeEvent(db.db, groupId);
    const who = visitor();
    const booked = await new Agent(server.url).post('/api/bookings', {
      slotId: slotIds[0],
      visitor: who,
      items: [{ categoryId: await categoryId(db.db, 'kettle'), fault: 'It switches off before boiling.' }],
      consent: true,
    });
    expect(booked.status).toBe(201);
    const { reference, manageToken } = booked.json as { reference: string; manageToken: string };

    // The outbox keeps the attachment in its row until it is sent.
    const [queued] = await db.db.select().from(outbox).where(eq(outbox.toAddress, who.email));
    expect(queued.attachments?.[0]).toMatchObject({ cid: 'booking-qr', contentType: 'image/png' });

    await server.ctx.outbox.drain();
    const [caught] = await db.db.select().from(mailboxMessages).where(eq(mailboxMessages.toAddress, who.email));
    expect(caught).toBeDefined();
    const parsed = await simpleParser(caught.raw, { keepCidLinks: true });

    // One inline PNG with a content id, whose pixels are the QR code of the booking's desk link.
    const images = parsed.attachments.filter((a) => a.contentType === 'image/png');
    expect(images).toHaveLength(1);
    const [qr] = images;
    expect(qr.cid).toBeTruthy();
    expect(qr.contentDisposition).toBe('inline');
    expect(qr.content.subarray(0, 8)).toEqual(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]));
    const meta = await sharp(qr.content).metadata();
    expect(meta).toMatchObject({ format: 'png', width: 240, height: 240 });
    const expected = QRCode.create(`${PUBLIC_URL}/b/${reference}`, { errorCorrectionLevel: 'M' }).modules;
    const dark = await modulesOf(qr.content, expected.size);
    let differing = 0;
    for (let r = 0; r < expected.size; r++)
      for (let c = 0; c < expected.size; c++) if (dark(r, c) !== Boolean(expected.get(r, c))) differing++;
    expect(differing).toBe(0);

    // The HTML points at that image by its content id, embeds no data: image, and links the booking page.
    const html = String(parsed.html);
    expect(html).toContain(`src="cid:${qr.cid}"`);
    expect(html).not.toContain('data:image');
    const bookingPage = `${PUBLIC_URL}/bookings/${reference}#token=${manageToken}`;
    expect(html).toContain(bookingPage);

    // The words say where the code always shows; the plain text part, which has no picture, does not claim one.
    for (const part of [html, parsed.text ?? '']) {
      expect(part).not.toContain('QR code in this mail');
      expect(part).toMatch(/booking page/i);
    }
    expect(parsed.text).toContain(bookingPage);

    // The admin's mailbox viewer shows the picture: the cid is turned into the image itself there, and only there.
    const admin = await makeUser(db.db, { admin: true });
    const a = new Agent(server.url);
    expect((await a.login(admin.email, admin.password)).status).toBe(200);
    const view = await a.get(`/api/admin/mailbox/${caught.id}/html`);
    expect(view.status).toBe(200);
    expect(view.text).not.toContain('cid:');
    expect(view.text).toContain(`data:image/png;base64,${qr.content.toString('base64')}`);
  });
});
