import { Link, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import { formatDay, formatTime, formatTimeRange } from '../../../../shared/format';
import { Button } from '../../components/ui/button';
import { Alert, Card, Spinner } from '../../components/ui/feedback';
import { paths } from '../../config/paths';
import { useClaimOffer } from '../../features/bookings/api/claim-offer';
import { useOffer, offerQuery } from '../../features/bookings/api/get-offer';
import { useBookingCode, bookingCodeQuery } from '../../features/bookings/api/get-booking-code';
import { queryClient } from '../../lib/query-client';
import { trParts, useLanguage, useT } from '../../lib/i18n';

/** Warms the offer or the booking code's status, whichever page this is; a failure is left for the page. */
export const loader = ({ params }: LoaderFunctionArgs) =>
  params.token
    ? queryClient.ensureQueryData(offerQuery(params.token)).catch(() => null)
    : params.reference
      ? queryClient.ensureQueryData(bookingCodeQuery(params.reference)).catch(() => null)
      : null;

/** The link in a waiting-list offer: one button turns the held place into a booking. */
export function ClaimOfferPage() {
  const t = useT();
  const lang = useLanguage();
  const token = useParams().token ?? '';
  const offer = useOffer(token);
  const claim = useClaimOffer(token);
  const navigate = useNavigate();
  if (offer.isPending) return <Spinner />;
  if (offer.error)
    return (
      <Alert tone="error" title={t('booking.offer.notFoundTitle')}>
        {t('booking.offer.notFound')}
      </Alert>
    );
  const o = offer.data;
  const tz = o.event.timeZone;
  return (
    <Card className="mx-auto max-w-lg space-y-3">
      <h1 className="text-2xl">{t('booking.offer.title')}</h1>
      <p>
        <strong>{o.event.title}</strong> ({o.event.groupName})
      </p>
      <p className="font-bold text-copper-dark">
        {formatDay(o.slot.startsAt, tz, lang)} · {formatTimeRange(o.slot.startsAt, o.slot.endsAt, tz, lang)}
      </p>
      <p>
        {o.venue.name}, {o.venue.address}, {o.venue.town}
      </p>
      {o.status === 'offered' && (
        <>
          {o.expiresAt && (
            <p className="text-sm text-ink-soft">
              {t('booking.offer.keptUntil', {
                day: formatDay(o.expiresAt, tz, lang),
                time: formatTime(o.expiresAt, tz, lang),
              })}
            </p>
          )}
          {claim.error && <Alert tone="error">{claim.error.message}</Alert>}
          <Button
            className="w-full"
            busy={claim.isPending}
            onClick={() =>
              claim.mutate(undefined, { onSuccess: (b) => navigate(paths.booking(b.reference, b.manageToken, true)) })
            }
          >
            {t('booking.offer.take')}
          </Button>
        </>
      )}
      {o.status === 'claimed' && <Alert tone="success">{t('booking.offer.claimed')}</Alert>}
      {o.status === 'expired' && <Alert tone="info">{t('booking.offer.expired')}</Alert>}
      {(o.status === 'waiting' || o.status === 'withdrawn') && <Alert tone="info">{t('booking.offer.closed')}</Alert>}
    </Card>
  );
}

/** Where a booking's QR code leads someone who is not at the desk. */
export function BookingCodePage() {
  const t = useT();
  const reference = useParams().reference ?? '';
  const code = useBookingCode(reference);
  if (code.isPending) return <Spinner />;
  const sessionsLink = (
    <Link to={paths.events()} className="font-bold underline">
      {t('booking.code.allSessions')}
    </Link>
  );
  if (code.error) {
    const missing = (code.error as Error & { status?: number }).status === 404;
    return (
      <div className="mx-auto max-w-md">
        <Alert tone="error" title={missing ? t('booking.code.notFoundTitle') : t('booking.code.loadFailed')}>
          <p>
            {missing
              ? trParts('booking.code.notFound', {
                  reference: <span className="font-mono font-bold">{reference}</span>,
                })
              : code.error.message}
          </p>
          <p className="mt-2">{sessionsLink}</p>
        </Alert>
      </div>
    );
  }
  if (code.data.status === 'cancelled')
    return (
      <div className="mx-auto max-w-md">
        <Alert tone="info" title={t('booking.manage.cancelledTitle')}>
          <p>
            {trParts('booking.code.cancelled', {
              reference: <span className="font-mono font-bold">{code.data.reference}</span>,
            })}
          </p>
          <p className="mt-2">{sessionsLink}</p>
        </Alert>
      </div>
    );
  return (
    <Card className="mx-auto max-w-md text-center">
      <h1 className="text-sm font-semibold text-ink-soft">{t('booking.manage.reference')}</h1>
      <p className="font-mono text-4xl font-extrabold tracking-widest text-navy">{code.data.reference}</p>
      <p className="mt-3 text-ink-soft">{t('booking.code.show')}</p>
      <Link to={paths.freshLink()} className="mt-3 inline-flex min-h-11 items-center font-bold text-navy underline">
        {t('booking.code.lostMail')}
      </Link>
    </Card>
  );
}
