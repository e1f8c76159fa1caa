import { Link, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import { formatDay, formatTimeRange } from '../../../../shared/format';
import { Button } from '../../components/ui/button';
import { Alert, Card, Spinner } from '../../components/ui/feedback';
import { paths } from '../../config/paths';
import { useClaimOffer } from '../../features/bookings/api/claim-offer';
import { useOffer, offerQuery } from '../../features/bookings/api/get-offer';
import { useBookingCode, bookingCodeQuery } from '../../features/bookings/api/get-booking-code';
import { queryClient } from '../../lib/query-client';

/** Warms the offer or the booking code's status, whichever page this is; a failure is left for the page. */
export const loader = ({ params }: LoaderFunctionArgs) =>
  params.token
    ? queryClient.ensureQueryData(offerQuery(params.token)).catch(() => null)
    : params.reference
      ? queryClient.ensureQueryData(bookingCodeQuery(params.reference)).catch(() => null)
      : null;

/** The link in a waiting-list offer: one button turns the held place into a booking. */
export function ClaimOfferPage() {
  const token = useParams().token ?? '';
  const offer = useOffer(token);
  const claim = useClaimOffer(token);
  const navigate = useNavigate();
  if (offer.isPending) return <Spinner />;
  if (offer.error)
    return (
      <Alert tone="error" title="Offer not found">
        The link may be incomplete. Open it from the mail again.
      </Alert>
    );
  const o = offer.data;
  const tz = o.event.timeZone;
  return (
    <Card className="mx-auto max-w-lg space-y-3">
      <h1 className="text-2xl">A place for you</h1>
      <p>
        <strong>{o.event.title}</strong> ({o.event.groupName})
      </p>
      <p className="font-bold text-copper-dark">
        {formatDay(o.slot.startsAt, tz)} · {formatTimeRange(o.slot.startsAt, o.slot.endsAt, tz)}
      </p>
      <p>
        {o.venue.name}, {o.venue.address}, {o.venue.town}
      </p>
      {o.status === 'offered' && (
        <>
          <p className="text-sm text-ink-soft">
            Kept for you until{' '}
            {o.expiresAt &&
              `${formatDay(o.expiresAt, tz)} ${formatTimeRange(o.expiresAt, o.expiresAt, tz).split('–')[0]}`}
            .
          </p>
          {claim.error && <Alert tone="error">{claim.error.message}</Alert>}
          <Button
            className="w-full"
            busy={claim.isPending}
            onClick={() =>
              claim.mutate(undefined, { onSuccess: (b) => navigate(paths.booking(b.reference, b.manageToken, true)) })
            }
          >
            Take the place
          </Button>
        </>
      )}
      {o.status === 'claimed' && (
        <Alert tone="success">You have taken this place already: the booking link is in your mail.</Alert>
      )}
      {o.status === 'expired' && (
        <Alert tone="info">This offer ran out and the place went to the next person. Sorry!</Alert>
      )}
      {(o.status === 'waiting' || o.status === 'withdrawn') && <Alert tone="info">This offer is no longer open.</Alert>}
    </Card>
  );
}

/** Where a booking's QR code leads someone who is not at the desk. */
export function BookingCodePage() {
  const reference = useParams().reference ?? '';
  const code = useBookingCode(reference);
  if (code.isPending) return <Spinner />;
  const sessionsLink = (
    <Link to={paths.events()} className="font-bold underline">
      See all sessions
    </Link>
  );
  if (code.error) {
    const missing = (code.error as Error & { status?: number }).status === 404;
    return (
      <div className="mx-auto max-w-md">
        <Alert tone="error" title={missing ? 'Booking not found' : 'The booking could not be loaded'}>
          <p>
            {missing ? (
              <>
                There is no booking with the reference <span className="font-mono font-bold">{reference}</span>. Check
                the reference in your confirmation mail.
              </>
            ) : (
              code.error.message
            )}
          </p>
          <p className="mt-2">{sessionsLink}</p>
        </Alert>
      </div>
    );
  }
  if (code.data.status === 'cancelled')
    return (
      <div className="mx-auto max-w-md">
        <Alert tone="info" title="This booking is cancelled">
          <p>
            Booking <span className="font-mono font-bold">{code.data.reference}</span> was cancelled, so there is
            nothing to show at the reception desk. To bring something to a session, book a new slot.
          </p>
          <p className="mt-2">{sessionsLink}</p>
        </Alert>
      </div>
    );
  return (
    <Card className="mx-auto max-w-md text-center">
      <h1 className="text-sm font-semibold text-ink-soft">Booking reference</h1>
      <p className="font-mono text-4xl font-extrabold tracking-widest text-navy">{code.data.reference}</p>
      <p className="mt-3 text-ink-soft">
        Show this code at the reception desk when you arrive. To change the booking, use the link in your confirmation
        mail.
      </p>
      <Link to={paths.freshLink()} className="mt-3 inline-flex min-h-11 items-center font-bold text-navy underline">
        Lost the mail? Get a fresh link
      </Link>
    </Card>
  );
}
