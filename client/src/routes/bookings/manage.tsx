import { useState } from 'react';
import { slotBookability } from '../../../../shared/booking/bookability';
import { StatusChip } from '../../features/event-day/components/status-chip';
import { Link, useLocation, useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { formatDay, formatTime, formatTimeRange } from '../../../../shared/format';
import { Button } from '../../components/ui/button';
import { ConfirmDialog } from '../../components/ui/confirm-dialog';
import { Alert, Card, Spinner } from '../../components/ui/feedback';
import { SelectField } from '../../components/ui/field';
import { paths } from '../../config/paths';
import { useCancelBooking } from '../../features/bookings/api/cancel-booking';
import { useBooking, bookingQuery } from '../../features/bookings/api/get-booking';
import { useMoveBooking, useRefreshBooking } from '../../features/bookings/api/move-booking';
import { uploadPhotos } from '../../features/bookings/api/upload-photos';
import { LinkProblem } from '../../features/bookings/components/link-problem';
import { useManageToken } from '../../features/bookings/components/use-manage-token';
import { eventKeys } from '../../features/events/api/keys';
import { useEvent, eventQuery } from '../../features/events/api/get-event';
import { StatusBadge } from '../../features/events/components/places-bar';
import { useLanguage, useT } from '../../lib/i18n';
import { queryClient } from '../../lib/query-client';
import { BookingDataPanel } from '../../features/privacy/components/booking-data-panel';

/**
 * Warms the cache for a link with ?token= (mailed before the token moved to the fragment, which a loader cannot
 * see); a failure is left for the page, which says what went wrong in its own words.
 */
export const loader = async ({ params, request }: LoaderFunctionArgs) => {
  const token = new URL(request.url).searchParams.get('token');
  if (!token) return null;
  try {
    const booking = await queryClient.ensureQueryData(bookingQuery(params.reference ?? '', token));
    await queryClient.ensureQueryData(eventQuery(booking.event.id));
  } catch {
    // The page shows why the booking could not be read.
  }
  return null;
};

/** The visitor's own page, reached with the secret link: view, move or cancel without an account. */
export function ManageBookingPage() {
  const t = useT();
  const lang = useLanguage();
  const reference = useParams().reference ?? '';
  const [params] = useSearchParams();
  const token = useManageToken();
  const fresh = params.get('new') === '1';
  const photoProblems = ((useLocation().state as { photoProblems?: string[] } | null)?.photoProblems ?? []) as string[];
  const booking = useBooking(reference, token);
  const refreshEvents = () => queryClient.invalidateQueries({ queryKey: eventKeys.all });
  const cancel = useCancelBooking(reference, token, refreshEvents);
  const move = useMoveBooking(reference, token, refreshEvents);
  const refreshBooking = useRefreshBooking(reference);
  const event = useEvent(booking.data?.event.id ?? 0);
  const [confirming, setConfirming] = useState(false);
  const [newSlot, setNewSlot] = useState('');
  const [uploadError, setUploadError] = useState<string | null>(null);

  if (!token)
    return (
      <Alert tone="error" title={t('booking.manage.incompleteTitle')}>
        {t('booking.manage.incomplete')}
      </Alert>
    );
  if (booking.isPending) return <Spinner label={t('booking.manage.loading')} />;
  if (booking.error) return <LinkProblem error={booking.error} />;
  const b = booking.data;
  const tz = b.event.timeZone;
  const active = b.status === 'confirmed' && b.event.status === 'published';
  // The times this booking's items could move to, by the same rule the server decides with.
  const skills = b.items.map((i) => i.skill);
  const otherSlots = (event.data?.slots ?? []).filter(
    (s) => s.id !== b.slot.id && slotBookability({ ...s, skillLimits: event.data!.skillLimits }, skills, new Date()).ok,
  );

  const addPhotos = async (itemId: number, files: FileList | null) => {
    setUploadError(null);
    try {
      await uploadPhotos(b.reference, token, itemId, Array.from(files ?? []));
      await refreshBooking();
    } catch (err) {
      setUploadError((err as Error).message);
    }
  };

  return (
    <div className="mx-auto max-w-2xl space-y-5">
      {fresh && b.status === 'confirmed' && (
        <div className="rounded-xl bg-sage p-5 text-white">
          <p className="text-2xl font-extrabold">{t('booking.manage.bookedTitle')}</p>
          <p className="mt-1">{t('booking.manage.booked', { email: b.visitor.email })}</p>
        </div>
      )}
      {photoProblems.length > 0 && (
        <Alert tone="caution" title={t('booking.manage.photoProblemsTitle')}>
          {t('booking.manage.photoProblems', { problems: photoProblems.join(' ') })}
        </Alert>
      )}
      {b.status === 'cancelled' && (
        <Alert tone="info" title={t('booking.manage.cancelledTitle')}>
          {t('booking.manage.cancelled')}{' '}
          {b.event.status === 'published' ? (
            <Link className="font-bold underline" to={paths.book(b.event.id)}>
              {t('booking.manage.bookAgain')}
            </Link>
          ) : (
            t('booking.manage.bookAnother')
          )}
        </Alert>
      )}

      <Card className="grid gap-5 sm:grid-cols-[1fr_auto] sm:items-center">
        <div>
          <div className="flex items-center gap-2">
            <StatusBadge status={b.status} />
          </div>
          <p className="mt-2 text-sm font-semibold text-ink-soft">{t('booking.manage.reference')}</p>
          <p className="font-mono text-4xl font-extrabold tracking-widest text-navy">{b.reference}</p>
          <h1 className="mt-3 text-xl">{b.event.title}</h1>
          <p className="font-bold text-copper-dark">
            {formatDay(b.slot.startsAt, tz, lang)} · {formatTimeRange(b.slot.startsAt, b.slot.endsAt, tz, lang)}
          </p>
          <p>
            {b.venue.name}, {b.venue.address}, {b.venue.town}
          </p>
          <p className="text-sm text-ink-soft">{b.event.groupName}</p>
          {b.status === 'confirmed' && b.event.status !== 'cancelled' && (
            <a
              href={b.calendarUrl}
              download={`mendery-${b.reference}.ics`}
              className="mt-3 inline-flex min-h-11 items-center justify-center gap-2 rounded-lg bg-white px-4 py-2 font-bold text-navy ring-1 ring-navy/25 transition hover:bg-navy/5"
            >
              {t('booking.manage.calendar')}
            </a>
          )}
        </div>
        {b.status === 'confirmed' && (
          <figure className="justify-self-center text-center">
            <img
              src={b.qr}
              alt={t('booking.manage.qr', { reference: b.reference })}
              className="size-40 rounded-lg ring-1 ring-ink/10"
            />
            <figcaption className="mt-1 text-xs text-ink-soft">{t('booking.manage.showAtReception')}</figcaption>
          </figure>
        )}
      </Card>

      <Card>
        <h2 className="text-lg">{t('booking.manage.items')}</h2>
        {uploadError && (
          <div className="mt-2">
            <Alert tone="error">{uploadError}</Alert>
          </div>
        )}
        <ul className="mt-2 divide-y divide-ink/5">
          {b.items.map((i) => (
            <li key={i.id} className="py-3">
              <p className="font-bold">
                {i.categoryName}
                {i.brand || i.model ? ` — ${[i.brand, i.model].filter(Boolean).join(' ')}` : ''}
              </p>
              {i.status !== 'booked' && (
                <p className="my-1 flex items-center gap-2 text-sm">
                  <StatusChip status={i.status} />
                  {i.queueNumber !== null && <span>{t('booking.manage.queueNumber', { number: i.queueNumber })}</span>}
                  {i.outcome && <b>{t(`booking.outcome.${i.outcome}`)}</b>}
                </p>
              )}
              <p className="text-ink-soft">{i.fault}</p>
              <div className="mt-2 flex flex-wrap items-center gap-2">
                {i.photos.map((p) => (
                  <img key={p.id} src={p.url} alt="" className="size-20 rounded-lg object-cover ring-1 ring-ink/10" />
                ))}
                {active && i.photos.length < 3 && (
                  <label className="cursor-pointer rounded-lg px-3 py-2 text-sm font-bold text-navy ring-1 ring-navy/25 has-focus-visible:outline-3 has-focus-visible:outline-copper">
                    {t('booking.manage.addPhoto')}
                    <input
                      type="file"
                      accept="image/jpeg,image/png,image/webp"
                      className="sr-only"
                      onChange={(e) => void addPhotos(i.id, e.target.files)}
                    />
                  </label>
                )}
              </div>
            </li>
          ))}
        </ul>
      </Card>

      {active && (
        <Card className="space-y-4">
          <h2 className="text-lg">{t('booking.manage.changeTitle')}</h2>
          {move.error && <Alert tone="error">{move.error.message}</Alert>}
          {move.isSuccess && <Alert tone="success">{t('booking.manage.moved')}</Alert>}
          {otherSlots.length ? (
            <div className="flex flex-wrap items-end gap-2">
              <div className="min-w-48 flex-1">
                <SelectField
                  label={t('booking.manage.moveTo')}
                  value={newSlot}
                  onChange={(e) => setNewSlot(e.target.value)}
                >
                  <option value="">{t('booking.manage.chooseTime')}</option>
                  {otherSlots.map((s) => (
                    <option key={s.id} value={s.id}>
                      {t('booking.manage.timeOption', { time: formatTime(s.startsAt, tz, lang), free: s.free })}
                    </option>
                  ))}
                </SelectField>
              </div>
              <Button
                variant="secondary"
                disabled={!newSlot}
                busy={move.isPending}
                onClick={() => move.mutate(Number(newSlot), { onSuccess: () => setNewSlot('') })}
              >
                {t('booking.manage.move')}
              </Button>
            </div>
          ) : (
            <p className="text-sm text-ink-soft">{t('booking.manage.noOtherTime')}</p>
          )}
          <div className="border-t border-ink/5 pt-4">
            <Button variant="danger" onClick={() => setConfirming(true)}>
              {t('booking.manage.cancel')}
            </Button>
            <p className="mt-1 text-sm text-ink-soft">{t('booking.manage.cancelHint')}</p>
          </div>
        </Card>
      )}

      {b.status === 'confirmed' && (
        <Card>
          <h2 className="text-lg">{t('events.detail.bringTitle')}</h2>
          <ul className="mt-2 list-disc space-y-1 pl-5 text-sm">
            {[1, 2, 3, 4].map((n) => (
              <li key={n}>{t(`events.detail.bring${n}`)}</li>
            ))}
          </ul>
        </Card>
      )}
      {event.data && <BookingDataPanel reference={b.reference} token={token} groupId={event.data.groupId} />}
      <Link to={paths.event(b.event.id)} className="inline-block font-bold text-navy underline">
        {t('booking.manage.about')}
      </Link>

      <ConfirmDialog
        open={confirming}
        title={t('booking.manage.confirmTitle')}
        message={t('booking.manage.confirm', {
          reference: b.reference,
          time: formatTime(b.slot.startsAt, tz, lang),
          day: formatDay(b.slot.startsAt, tz, lang),
        })}
        confirmLabel={t('booking.manage.confirmButton')}
        cancelLabel={t('booking.manage.keep')}
        busy={cancel.isPending}
        onCancel={() => setConfirming(false)}
        onConfirm={() => cancel.mutate(undefined, { onSettled: () => setConfirming(false) })}
      />
    </div>
  );
}
