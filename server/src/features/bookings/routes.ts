import { Router, type NextFunction, type Request, type Response } from 'express';
import { z } from 'zod';
import { languageOf } from '../../i18n';
import { normaliseReference } from '../../../../shared/booking/reference';
import {
  createBookingSchema,
  freshLinkSchema,
  moveBookingSchema,
  PHOTO_LIMITS,
  waitlistSchema,
} from '../../../../shared/schemas/bookings';
import { rebookSchema } from '../../../../shared/schemas/impact';
import type { AppContext } from '../../context';
import { hasGroupRole, requireGroupRole } from '../../auth/guards';
import { HttpError, notFound } from '../../http/errors';
import { body, params, paramId } from '../../http/validate';
import { signingKey, verifySignedPath } from '../../http/signed-url';
import { countedMail, visitorLimits } from '../../http/visitor-limits';
import { intakePhotosOf } from './queries/limits';
import { eventGroupId } from '../../core/events';
import { eventBookings } from './organiser';
import { multerError, photoUpload, savePhotos } from '../../core/photos';
import * as bookingService from './service';
import * as changes from './changes';
import * as waitlist from './waitlist';
import { photoWithOwner } from './queries/photos';
import { bookingCalendar } from './calendar';
import { sendCalendar } from '../../core/calendar';
import { manageTokenOf } from '../../core/links';

import { rebook, rebookView } from './return-visit';
import { mailFreshLinks } from './fresh-links';

const booking = { ...bookingService, ...changes, ...waitlist };

/** The manage token from the X-Manage-Token header, or ?token= for links mailed before. */
const manageToken = manageTokenOf;
const PHOTO_ID = /^[A-Za-z0-9_-]{16,32}$/;
const idempotencyKey = z
  .string()
  .trim()
  .min(8, 'Idempotency-Key must be 8 to 90 characters.')
  .max(90, 'Idempotency-Key must be 8 to 90 characters.')
  .regex(/^[A-Za-z0-9_.:-]+$/, 'Idempotency-Key may hold letters, digits and _ . : - only.');

const FRESH_LINK_ANSWER =
  'If this address has bookings for sessions coming up or just past, we have mailed a fresh link for each. Links mailed before no longer work.';

export function bookingRoutes(ctx: AppContext) {
  const r = Router();
  const { db } = ctx.database;

  const reference = (req: Request) => {
    const ref = normaliseReference(String(req.params.reference ?? ''));
    if (!ref) throw notFound('That booking');
    return ref;
  };
  const byToken = (req: Request) => booking.bookingByToken(ctx, reference(req), manageToken(req));
  const key = signingKey(ctx.env.SESSION_SECRET);
  /** A request for the very path the booking page was given a signed address for, before its expiry. */
  const signed = (req: Request) => verifySignedPath(key, req.baseUrl + req.path, req.query, Date.now());
  // Bookings and waiting-list joins share one count per source address and one per e-mail address.
  const limits = visitorLimits(ctx, 'booking', {
    perAddress: ctx.env.BOOKING_RATE_MAX,
    perEmail: ctx.env.BOOKING_EMAIL_RATE_MAX,
  });
  // The same counts, with the confirmation mail counted in the same statement.
  const bookingLimits = visitorLimits(
    ctx,
    'booking',
    { perAddress: ctx.env.BOOKING_RATE_MAX, perEmail: ctx.env.BOOKING_EMAIL_RATE_MAX },
    { countsMail: true },
  );

  const bookingForm = (req: Request) => {
    const header = req.get('idempotency-key');
    const key = header === undefined ? undefined : idempotencyKey.safeParse(header);
    if (key && !key.success)
      throw new HttpError(400, 'invalid', key.error.issues[0].message, {
        'Idempotency-Key': key.error.issues[0].message,
      });
    return { key: key?.data, input: body(req, createBookingSchema) };
  };
  r.post('/bookings', ...bookingLimits, async (req, res) => {
    const mail = countedMail(res);
    // A form refused before the booking starts sends no mail: its count goes back (createBooking does it after).
    let form: ReturnType<typeof bookingForm>;
    try {
      form = bookingForm(req);
    } catch (err) {
      await mail?.giveBack();
      throw err;
    }
    const { key, input } = form;
    const result = await booking.createBooking(ctx, input, key, languageOf(req, res.locals), mail);
    if (result.replayed) res.setHeader('Idempotent-Replayed', 'true');
    res.status(result.status).json(result.body);
  });

  /** A fresh manage link for each current booking of an address. The answer is the same whether it has any or not. */
  const linkLimits = visitorLimits(ctx, 'new-link', {
    perAddress: ctx.env.NEW_LINK_RATE_MAX,
    perEmail: ctx.env.NEW_LINK_EMAIL_RATE_MAX,
  });
  r.post('/bookings/new-link', ...linkLimits, async (req, res) => {
    await mailFreshLinks(ctx, body(req, freshLinkSchema).email);
    res.status(202).json({ message: FRESH_LINK_ANSWER });
  });

  r.get('/bookings/:reference', async (req, res) => {
    const b = await byToken(req);
    res.setHeader('Cache-Control', 'no-store');
    res.json(await booking.bookingView(ctx, b.id, languageOf(req, res.locals)));
  });

  /** The booked slot for the visitor's calendar: a signed address from the booking page, or the manage token. */
  r.get('/bookings/:reference/calendar', async (req, res) => {
    const b = signed(req) ? await booking.bookingOfSignedPath(ctx, reference(req)) : await byToken(req);
    const { text, filename } = await bookingCalendar(ctx, b.id);
    sendCalendar(res, text, filename, 'attachment');
  });

  r.get('/public/bookings/:reference', async (req, res) => {
    res.setHeader('Cache-Control', 'no-store');
    res.json(await booking.bookingCodeStatus(ctx, reference(req)));
  });

  r.delete('/bookings/:reference', async (req, res) => {
    const b = await byToken(req);
    await booking.cancelBooking(ctx, b.id);
    res.status(204).end();
  });

  r.post('/bookings/:reference/move', async (req, res) => {
    const b = await byToken(req);
    await booking.moveBooking(ctx, b.id, body(req, moveBookingSchema).slotId, manageToken(req)!);
    res.json(await booking.bookingView(ctx, b.id, languageOf(req, res.locals)));
  });

  r.post(
    '/bookings/:reference/items/:itemId/photos',
    async (req, _res, next) => {
      // The token is checked before a byte of the upload is read.
      await byToken(req);
      next();
    },
    (req: Request, res: Response, next: NextFunction) => photoUpload(req, res, (err) => next(multerError(err) ?? err)),
    async (req, res) => {
      const b = await byToken(req);
      const { itemId } = params(req, z.object({ itemId: z.coerce.number().int().positive(), reference: z.string() }));
      if (b.status !== 'confirmed') throw new HttpError(409, 'cancelled', 'This booking is cancelled.');
      const files = (req.files as Express.Multer.File[]) ?? [];
      const has = await intakePhotosOf(db, b.id);
      if (has + files.length > PHOTO_LIMITS.perBooking)
        throw new HttpError(
          400,
          'too-many-photos',
          `A booking can have at most ${PHOTO_LIMITS.perBooking} photos in all; this one has ${has}.`,
        );
      res.status(201).json(await savePhotos(ctx, b.id, itemId, files));
    },
  );

  /**
   * A photo: by a signed address from the booking page or with the booking's token (the visitor), or for the
   * organisers, reception and fixers of its group.
   */
  r.get('/photos/:id', async (req, res) => {
    const { id } = params(req, z.object({ id: z.string() }));
    // A photo is named by its random public id only; anything else (an old numeric id) is simply not found.
    const p = PHOTO_ID.test(id) ? await photoWithOwner(db, id) : undefined;
    if (!p) throw notFound('That photo');
    const token = manageToken(req);
    // A bench photo of a group that shares its repair notes may be seen by any group's volunteers.
    const sharedBenchPhoto =
      p.kind === 'repair' && Boolean(p.shares) && Boolean(req.user && (req.user.admin || req.user.roles.length));
    if (!sharedBenchPhoto && !signed(req) && !hasGroupRole(req.user, p.groupId, ['organiser', 'host', 'fixer']))
      await booking.bookingByToken(ctx, p.reference, token);
    const data = await ctx.storage.get(p.key);
    if (!data) throw notFound('That photo');
    res.setHeader('Cache-Control', 'private, max-age=3600');
    res.type(p.type).send(data);
  });

  r.post('/events/:id/waitlist', ...limits, async (req, res) => {
    const input = body(req, waitlistSchema);
    const { id } = params(req, z.object({ id: z.coerce.number().int().positive() }));
    res.status(201).json(await booking.joinWaitlist(ctx, id, input, languageOf(req, res.locals)));
  });

  r.get('/waiting-list/:token', async (req, res) => {
    res.json(await booking.offerView(ctx, String(req.params.token)));
  });
  r.post('/waiting-list/:token/claim', async (req, res) => {
    res.status(201).json(await booking.claimOffer(ctx, String(req.params.token)));
  });

  r.get(
    '/events/:id/bookings',
    requireGroupRole(['organiser', 'host'], (req) => eventGroupId(db, paramId(req, 'id'))),
    async (req, res) => {
      res.json(await eventBookings(ctx, paramId(req, 'id'), languageOf(req, res.locals)));
    },
  );
  r.get('/rebook/:token', async (req, res) => {
    res.setHeader('Cache-Control', 'no-store');
    res.vary('Accept-Language');
    res.json(await rebookView(ctx, String(req.params.token), languageOf(req, res.locals)));
  });
  r.post('/rebook/:token', async (req, res) =>
    res.status(201).json(await rebook(ctx, String(req.params.token), body(req, rebookSchema).slotId)),
  );
  return r;
}
