import autocannon from 'autocannon';
import type { Request, Response } from 'express';
import type { Pool } from 'mysql2/promise';
import { randomBytes } from 'node:crypto';

/**
 * BENCH=booking: POST /api/bookings on one popular slot against the bare conditional-update handler in the same run,
 * then a race of 1,000 simultaneous requests on one slot of capacity 20 for each handler, which must never take a
 * place beyond the capacity.
 */

/** The baseline: one conditional UPDATE and one INSERT in a transaction, no sessions, no checks. */
export function bareBookingHandler(pool: Pool) {
  return async (req: Request, res: Response) => {
    const conn = await pool.getConnection();
    try {
      await conn.beginTransaction();
      const [r] = (await conn.query(
        'UPDATE slots SET booked = booked + 1 WHERE id = ? AND booked + held + 1 <= capacity',
        [req.body.slotId],
      )) as unknown as [{ affectedRows: number }];
      if (r.affectedRows !== 1) {
        await conn.rollback();
        return res.status(409).end();
      }
      const reference = randomBytes(4).toString('hex').slice(0, 7).toUpperCase();
      await conn.query(
        "INSERT INTO bookings (reference, event_id, slot_id, visitor_name, visitor_email, manage_token_hash, consent_at) SELECT ?, event_id, id, ?, ?, REPEAT('0', 64), NOW(3) FROM slots WHERE id = ?",
        [reference, req.body.visitor.name, req.body.visitor.email, req.body.slotId],
      );
      await conn.commit();
      res.status(201).json({ reference });
    } finally {
      conn.release();
    }
  };
}

interface Line {
  title: string;
  rps: number;
  p99: number;
  bad: number;
  total: number;
}

/** Statements the server has received so far (MariaDB's `Questions` status counter, every client together). */
async function statementsSoFar(pool: Pool) {
  const [[row]] = (await pool.query("SHOW GLOBAL STATUS LIKE 'Questions'")) as unknown as [{ Value: string }[]];
  return Number(row.Value);
}
const perRequest = (title: string, statements: number, line: Line) =>
  console.log(`${title.padEnd(44)} ${(statements / Math.max(line.total, 1)).toFixed(1)} statements a booking`);
interface Setup {
  appUrl: string;
  bareUrl: string;
  pool: Pool;
  slotId: number;
  kettleId: number;
  visitors: { cookie: string; token: string }[];
  load: (title: string, opts: autocannon.Options) => Promise<Line>;
  ratio: (a: Line, b: Line) => void;
}

const json = { 'content-type': 'application/json' };
/** Visitor `n`'s form: each visitor books under an address of their own, as on the day (one shared address would
 * also make the per-address count read every booking the load has made). */
const body = (slotId: number, kettleId: number, n = 0) =>
  JSON.stringify({
    slotId,
    visitor: { name: 'Bench Visitor', email: `bench-${n}@example.org` },
    items: [{ categoryId: kettleId, fault: 'Switches off before it boils.' }],
    consent: true,
  });

const RACE = 1000;
const RACE_CAPACITY = 20;

/** A published slot not used by the throughput load, set to room for exactly RACE_CAPACITY more bookings. */
async function raceSlot(pool: Pool, exclude: number[]) {
  const [[s]] = (await pool.query(
    `SELECT s.id FROM slots s JOIN events e ON e.id = s.event_id
      WHERE e.status = 'published' AND s.starts_at > NOW() AND s.id NOT IN (?) ORDER BY s.starts_at LIMIT 1`,
    [exclude],
  )) as unknown as [{ id: number }[]];
  await pool.query('UPDATE slots SET capacity = booked + held + ? WHERE id = ?', [RACE_CAPACITY, s.id]);
  const [[c]] = (await pool.query('SELECT COUNT(*) AS n FROM bookings WHERE slot_id = ?', [s.id])) as unknown as [
    { n: number }[],
  ];
  return { id: s.id, before: Number(c.n) };
}

async function race(title: string, setup: Setup, url: string, slot: { id: number; before: number }, csrf: boolean) {
  const statuses = await Promise.all(
    Array.from({ length: RACE }, async (_, i) => {
      const n = i % setup.visitors.length;
      const v = setup.visitors[n];
      const headers = csrf ? { ...json, cookie: v.cookie, 'x-csrf-token': v.token } : json;
      const r = await fetch(url, { method: 'POST', headers, body: body(slot.id, setup.kettleId, n) });
      await r.arrayBuffer();
      return r.status;
    }),
  );
  const [[row]] = (await setup.pool.query(
    'SELECT s.booked, s.held, s.capacity, (SELECT COUNT(*) FROM bookings b WHERE b.slot_id = s.id) AS n FROM slots s WHERE s.id = ?',
    [slot.id],
  )) as unknown as [{ booked: number; held: number; capacity: number; n: number }[]];
  const confirmed = statuses.filter((s) => s === 201).length;
  const refused = statuses.filter((s) => s === 409).length;
  const other = RACE - confirmed - refused;
  const newRows = Number(row.n) - slot.before;
  const beyond = Math.max(0, row.booked + row.held - row.capacity, newRows - RACE_CAPACITY);
  console.log(
    `${title.padEnd(44)} confirmed ${confirmed}/${RACE_CAPACITY}   beyond capacity ${beyond}   refused (409) ${refused}   other ${other}`,
  );
}

export async function measureBooking(setup: Setup) {
  const v0 = setup.visitors[0];
  const probe = await fetch(`${setup.appUrl}/api/bookings`, {
    method: 'POST',
    headers: { ...json, cookie: v0.cookie, 'x-csrf-token': v0.token },
    body: body(setup.slotId, setup.kettleId),
  });
  // The load must measure bookings, not refusals: one booking first, and stop if it is refused.
  if (probe.status !== 201) throw new Error(`The bench slot refuses bookings: ${probe.status} ${await probe.text()}`);
  const bareBefore = await statementsSoFar(setup.pool);
  const bareBookings = await setup.load('bare Express + mysql2: POST booking', {
    url: setup.bareUrl,
    requests: setup.visitors.map((_, n) => ({
      method: 'POST' as const,
      path: '/bookings',
      headers: json,
      body: body(setup.slotId, setup.kettleId, n),
    })),
  });
  const bareStatements = (await statementsSoFar(setup.pool)) - bareBefore - 1;
  const appBefore = await statementsSoFar(setup.pool);
  const bookings = await setup.load('Mendery POST /api/bookings', {
    url: `${setup.appUrl}/api/bookings`,
    requests: setup.visitors.map((v, n) => ({
      method: 'POST' as const,
      path: '/api/bookings',
      headers: { ...json, cookie: v.cookie, 'x-csrf-token': v.token },
      body: body(setup.slotId, setup.kettleId, n),
    })),
  });
  const appStatements = (await statementsSoFar(setup.pool)) - appBefore - 1;
  // The booking page sends each form with an Idempotency-Key of its own (a resent form books once): the same load
  // with a fresh key on every request.
  const keyedBefore = await statementsSoFar(setup.pool);
  let sent = 0;
  const keyed = await setup.load('Mendery POST /api/bookings, Idempotency-Key', {
    url: `${setup.appUrl}/api/bookings`,
    requests: setup.visitors.map((v, n) => ({
      method: 'POST' as const,
      path: '/api/bookings',
      headers: { ...json, cookie: v.cookie, 'x-csrf-token': v.token },
      body: body(setup.slotId, setup.kettleId, n),
      setupRequest: (req: autocannon.Request) => ({
        ...req,
        headers: { ...req.headers, 'idempotency-key': `bench-${process.pid}-${++sent}` },
      }),
    })),
  });
  const keyedStatements = (await statementsSoFar(setup.pool)) - keyedBefore - 1;
  // Every statement is a round trip and a socket write; on this machine those dominate the app's CPU.
  perRequest('  bare Express + mysql2', bareStatements, bareBookings);
  perRequest('  Mendery POST /api/bookings', appStatements, bookings);
  perRequest('  Mendery, with an Idempotency-Key', keyedStatements, keyed);
  setup.ratio(bookings, bareBookings);
  console.log(
    `${'  ratio with an Idempotency-Key / bare'.padEnd(44)} ${(keyed.rps / bareBookings.rps).toFixed(2)}× requests/s\n`,
  );

  console.log(`Race: ${RACE} simultaneous requests on one slot with ${RACE_CAPACITY} places`);
  const bareSlot = await raceSlot(setup.pool, [setup.slotId]);
  await race('  bare Express + mysql2', setup, `${setup.bareUrl}/bookings`, bareSlot, false);
  const appSlot = await raceSlot(setup.pool, [setup.slotId, bareSlot.id]);
  await race('  Mendery POST /api/bookings', setup, `${setup.appUrl}/api/bookings`, appSlot, true);
}
