import { Router, type Request } from 'express';
import { normaliseReference } from '../../../../shared/booking/reference';
import { privacyNotice } from '../../../../shared/privacy/notice';
import { languageOf, translate } from '../../i18n';
import type { AppContext } from '../../context';
import { requireUser } from '../../auth/guards';
import { manageTokenOf } from '../../core/links';
import { notFound } from '../../http/errors';
import { body, paramId } from '../../http/validate';
import { closeAccountSchema } from '../../../../shared/schemas/privacy';
import { accountDataCopy, bookingDataCopy, closeAccount } from './access';
import { bookingForPersonalData, eraseBooking } from './erase';
import { groupForNotice } from './queries/erase';

const download = (name: string) => ({
  'Cache-Control': 'no-store',
  'Content-Disposition': `attachment; filename="${name}"`,
});

/** The visitor's and the volunteer's rights over their data: a copy, erasure, closing an account; and the notice. */
export function privacyRoutes(ctx: AppContext) {
  const r = Router();
  const booking = (req: Request) => {
    const ref = normaliseReference(String(req.params.reference ?? ''));
    if (!ref) throw notFound('That booking');
    return bookingForPersonalData(ctx, ref, manageTokenOf(req), req.user);
  };

  r.get('/bookings/:reference/personal-data', async (req, res) => {
    const b = await booking(req);
    res.set(download(`mendery-booking-${b.reference}.json`)).json(await bookingDataCopy(ctx, b));
  });

  /** With the manage link's token the visitor erases their own details; an organiser of the group may on request. */
  r.delete('/bookings/:reference/personal-data', async (req, res) => {
    const b = await booking(req);
    await eraseBooking(ctx, b.id);
    res.status(204).end();
  });

  r.get('/me/personal-data', requireUser, async (req, res) => {
    res.set(download('mendery-account.json')).json(await accountDataCopy(ctx, req.user!.id));
  });

  r.delete('/me/account', requireUser, async (req, res, next) => {
    body(req, closeAccountSchema);
    await closeAccount(ctx, req.user!.id);
    req.session.destroy((err) => (err ? next(err) : res.status(204).end()));
  });

  r.get('/public/groups/:groupId/privacy', async (req, res) => {
    const g = await groupForNotice(ctx.database.db, paramId(req, 'groupId'));
    if (!g) throw notFound('That group');
    const lang = languageOf(req, res.locals);
    res.vary('Accept-Language');
    res.json(
      privacyNotice({ groupName: g.name, retentionMonths: g.retentionMonths, contactEmail: g.contactEmail }, (key, v) =>
        translate(lang, key, v),
      ),
    );
  });
  return r;
}
