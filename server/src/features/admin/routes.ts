import { Router } from 'express';
import { z } from 'zod';
import { groupSchema, mergeGroupSchema } from '../../../../shared/schemas/auth';
import type { AppContext } from '../../context';
import { requireAdmin } from '../../auth/guards';
import { body, paramId, params } from '../../http/validate';
import * as admin from './service';

const idParam = z.object({ id: z.coerce.number().int().positive() });

/** Platform-wide administration: groups, people, and the mail the local mailbox caught. */
export function adminRoutes(ctx: AppContext) {
  const r = Router();
  r.use('/admin', requireAdmin);

  r.get('/admin/mailbox', async (_req, res) => res.json(await admin.mailbox(ctx)));
  r.get('/admin/mailbox/:id', async (req, res) => res.json(await admin.mailboxMessage(ctx, params(req, idParam).id)));
  // The caught HTML is shown in a sandboxed frame under a CSP that lets it run nothing and load nothing remote.
  r.get('/admin/mailbox/:id/html', async (req, res) => {
    const html = await admin.mailboxHtml(ctx, params(req, idParam).id);
    res.setHeader(
      'Content-Security-Policy',
      "default-src 'none'; img-src data:; style-src 'unsafe-inline'; frame-ancestors 'self'",
    );
    // Links open in a new tab, outside the sandboxed frame.
    res.type('html').send(`<base target="_blank">${html}`);
  });
  r.delete('/admin/mailbox', async (_req, res) => {
    await admin.clearMailbox(ctx);
    res.status(204).end();
  });
  r.get('/admin/outbox', async (_req, res) => res.json(await admin.outboxOverview(ctx)));
  r.get('/admin/groups', async (_req, res) => res.json(await admin.groups(ctx)));
  r.post('/admin/groups', async (req, res) =>
    res.status(201).json(await admin.createGroup(ctx, body(req, groupSchema))),
  );
  r.post('/admin/groups/:id/merge', async (req, res) => {
    await admin.mergeGroup(ctx, paramId(req, 'id'), body(req, mergeGroupSchema).into);
    res.status(204).end();
  });
  r.get('/admin/users', async (_req, res) => res.json(await admin.allUsers(ctx)));
  return r;
}
