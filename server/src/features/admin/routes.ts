import { count, desc, eq, sql } from 'drizzle-orm';
import { Router } from 'express';
import { z } from 'zod';
import { groupSchema } from '../../../../shared/schemas/auth';
import type { AppContext } from '../../context';
import { requireAdmin } from '../../auth/guards';
import { mailboxMessages, memberships, outbox, repairGroups, users } from '../../db/schema/index';
import { HttpError, notFound } from '../../http/errors';
import { body, params } from '../../http/validate';
import { applyDefaultExclusions } from '../../core/screening';

const idParam = z.object({ id: z.coerce.number().int().positive() });
const slugify = (s: string) =>
  s
    .toLowerCase()
    .normalize('NFKD')
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-|-$/g, '')
    .slice(0, 60);

/** Platform-wide administration: groups, people, and the mail the local mailbox caught. */
export function adminRoutes(ctx: AppContext) {
  const r = Router();
  const { db } = ctx.database;
  r.use('/admin', requireAdmin);

  r.get('/admin/mailbox', async (_req, res) => {
    const rows = await db
      .select({
        id: mailboxMessages.id,
        from: mailboxMessages.fromAddress,
        to: mailboxMessages.toAddress,
        subject: mailboxMessages.subject,
        receivedAt: mailboxMessages.receivedAt,
      })
      .from(mailboxMessages)
      .orderBy(desc(mailboxMessages.id))
      .limit(200);
    res.json(rows);
  });
  r.get('/admin/mailbox/:id', async (req, res) => {
    const [m] = await db
      .select()
      .from(mailboxMessages)
      .where(eq(mailboxMessages.id, params(req, idParam).id));
    if (!m) throw notFound('That message');
    res.json({
      id: m.id,
      from: m.fromAddress,
      to: m.toAddress,
      subject: m.subject,
      receivedAt: m.receivedAt,
      text: m.text,
      hasHtml: m.html !== null,
    });
  });
  // The caught HTML is shown in a sandboxed frame under a CSP that lets it run nothing and load nothing remote.
  r.get('/admin/mailbox/:id/html', async (req, res) => {
    const [m] = await db
      .select({ html: mailboxMessages.html })
      .from(mailboxMessages)
      .where(eq(mailboxMessages.id, params(req, idParam).id));
    if (!m?.html) throw notFound('That message');
    res.setHeader(
      'Content-Security-Policy',
      "default-src 'none'; img-src data:; style-src 'unsafe-inline'; frame-ancestors 'self'",
    );
    // Links open in a new tab, outside the sandboxed frame.
    res.type('html').send(`<base target="_blank">${m.html}`);
  });
  r.delete('/admin/mailbox', async (_req, res) => {
    await db.delete(mailboxMessages);
    res.status(204).end();
  });

  r.get('/admin/outbox', async (_req, res) => {
    const totals = await db.select({ status: outbox.status, n: count() }).from(outbox).groupBy(outbox.status);
    const recent = await db
      .select({
        id: outbox.id,
        to: outbox.toAddress,
        subject: outbox.subject,
        status: outbox.status,
        attempts: outbox.attempts,
        lastError: outbox.lastError,
        createdAt: outbox.createdAt,
        sentAt: outbox.sentAt,
        nextAttemptAt: outbox.nextAttemptAt,
      })
      .from(outbox)
      .orderBy(desc(outbox.id))
      .limit(50);
    res.json({ totals: Object.fromEntries(totals.map((t) => [t.status, t.n])), recent });
  });

  r.get('/admin/groups', async (_req, res) => {
    const rows = await db
      .select({
        id: repairGroups.id,
        name: repairGroups.name,
        town: repairGroups.town,
        slug: repairGroups.slug,
        members: sql<number>`COUNT(${memberships.id})`,
      })
      .from(repairGroups)
      .leftJoin(memberships, eq(memberships.groupId, repairGroups.id))
      .groupBy(repairGroups.id)
      .orderBy(repairGroups.name);
    res.json(rows.map((g) => ({ ...g, members: Number(g.members) })));
  });
  r.post('/admin/groups', async (req, res) => {
    const input = body(req, groupSchema);
    try {
      const id = await db.transaction(async (tx) => {
        const [{ id }] = await tx
          .insert(repairGroups)
          .values({ ...input, slug: slugify(input.name) })
          .$returningId();
        await applyDefaultExclusions(tx, id);
        return id;
      });
      res.status(201).json({ id, ...input });
    } catch (err) {
      if ((err as { code?: string }).code === 'ER_DUP_ENTRY')
        throw new HttpError(409, 'duplicate', 'A group with that name exists.', {
          name: 'A group with that name exists.',
        });
      throw err;
    }
  });

  r.get('/admin/users', async (_req, res) => {
    const rows = await db
      .select({
        id: users.id,
        name: users.name,
        email: users.email,
        admin: users.admin,
        verified: users.emailVerifiedAt,
        createdAt: users.createdAt,
      })
      .from(users)
      .orderBy(users.name)
      .limit(500);
    res.json(rows.map((u) => ({ ...u, admin: Boolean(u.admin), verified: u.verified !== null })));
  });
  return r;
}
