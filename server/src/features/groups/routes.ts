import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../../context';
import { groupIdInBody, groupIdParam, requireGroupRole, requireUser } from '../../auth/guards';
import { body, params, query } from '../../http/validate';
import { inviteSchema, inviteSignupSchema } from '../../../../shared/schemas/auth';
import { groupSettingsSchema, venueSchema } from '../../../../shared/schemas/events';
import { authPostLimiter, signIn } from '../../auth/routes';
import { HttpError } from '../../http/errors';
import * as invites from './invites';
import * as groups from './service';
import * as settings from './settings';

const memberParams = z.object({
  groupId: z.coerce.number().int().positive(),
  membershipId: z.coerce.number().int().positive(),
});

/** The public list of groups: no session is created for it. */
export function groupPublicRoutes(ctx: AppContext) {
  const r = Router();
  r.get('/public/groups', async (req, res) => {
    await ctx.publicCache.send(req, res, () => groups.listPublicGroups(ctx));
  });
  return r;
}

export function groupRoutes(ctx: AppContext) {
  const r = Router();
  const organiser = requireGroupRole(['organiser'], groupIdParam);
  const authPosts = authPostLimiter(ctx);
  r.get('/groups/:groupId/members', organiser, async (req, res) => {
    res.json(await groups.listMembers(ctx, groupIdParam(req)));
  });
  r.post('/groups/:groupId/members/:membershipId/approve', organiser, async (req, res) => {
    const p = params(req, memberParams);
    await groups.approveMember(ctx, p.groupId, p.membershipId);
    res.json({ ok: true });
  });
  r.delete('/groups/:groupId/members/:membershipId', organiser, async (req, res) => {
    const p = params(req, memberParams);
    await groups.removeMember(ctx, p.groupId, p.membershipId);
    res.status(204).end();
  });
  r.post('/groups/:groupId/invites', organiser, async (req, res) => {
    await invites.invite(ctx, groupIdParam(req), body(req, inviteSchema), req.user!.id);
    res.status(202).json({ ok: true });
  });
  r.get('/invites/:token', async (req, res) => res.json(await invites.viewInvite(ctx, String(req.params.token))));
  r.post('/invites/:token/accept', authPosts, requireUser, async (req, res) => {
    await invites.acceptInvite(ctx, String(req.params.token), req.user!);
    res.json({ ok: true });
  });
  r.post('/invites/:token/signup', authPosts, async (req, res) => {
    if (req.user) throw new HttpError(409, 'signed-in', 'You are signed in already: accept the invitation instead.');
    const id = await invites.signupFromInvite(ctx, String(req.params.token), body(req, inviteSignupSchema));
    res.status(201).json({ user: await signIn(req, ctx, id) });
  });

  // Venues and the group's own rules: what it takes and what visitors agree to.
  r.get('/venues', requireUser, async (req, res) => {
    const { groupId } = query(req, z.object({ groupId: z.coerce.number().int().positive().optional() }));
    res.json(await settings.listVenues(ctx, req.user!, groupId));
  });
  r.post('/venues', requireGroupRole(['organiser'], groupIdInBody), async (req, res) => {
    res.status(201).json(await settings.createVenue(ctx, body(req, venueSchema)));
  });
  r.get('/groups/:groupId/settings', async (req, res) => {
    res.json(await settings.groupSettings(ctx, groupIdParam(req)));
  });
  r.put('/groups/:groupId/settings', organiser, async (req, res) => {
    await settings.saveGroupSettings(ctx, groupIdParam(req), body(req, groupSettingsSchema));
    res.json({ ok: true });
  });
  return r;
}
