import { lazy, Suspense, useEffect } from 'react';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router';
import { formatDay } from '../../../../shared/format';
import { Alert, PageTitle, Spinner } from '../../components/ui/feedback';
import { paths } from '../../config/paths';
import { eventKeys } from '../../features/events/api/keys';
import { useCategoriesQuery, categoriesQuery } from '../../features/categories/api/get-categories';
import { useEvent, eventQuery } from '../../features/events/api/get-event';
import { SessionMissing } from '../../features/events/components/session-missing';
import { followGroupLanguage, useLanguage, useT } from '../../lib/i18n';
import { queryClient } from '../../lib/query-client';

// The form and its validation load beside the page, not before it: the session shows first. They are asked for as soon
// as this module runs (beside the language and the page's data), not once the loader does (after the language is in).
const form = () => import('../../features/bookings/components/booking-form');
void form().catch(() => undefined);
const BookingForm = lazy(() => form().then((m) => ({ default: m.BookingForm })));

// Warms the cache; a failure is left to the page's own message.
export const loader = ({ params }: LoaderFunctionArgs) => {
  return Promise.all([
    queryClient.ensureQueryData(eventQuery(Number(params.eventId))),
    queryClient.ensureQueryData(categoriesQuery()),
  ]).catch(() => null);
};

export function BookingPage() {
  const t = useT();
  const lang = useLanguage();
  const id = Number(useParams().eventId);
  const event = useEvent(id);
  const groupLanguage = event.data?.groupLanguage;
  // The group's language for a visitor whose browser speaks none of ours; the page's data follows it.
  useEffect(() => followGroupLanguage(groupLanguage, () => void queryClient.invalidateQueries()), [groupLanguage]);
  const categories = useCategoriesQuery();
  if (event.isPending || categories.isPending) return <Spinner label={t('booking.loading')} />;
  if (event.error) return <SessionMissing error={event.error} />;
  if (categories.error) return <Alert tone="error">{categories.error.message}</Alert>;
  const e = event.data;
  if (e.status !== 'published')
    return (
      <Alert tone="info" title={t('booking.notOpenTitle')}>
        {t('booking.notOpen')}{' '}
        <Link className="underline" to={paths.event(id)}>
          {t('booking.backToSession')}
        </Link>
      </Alert>
    );
  return (
    <Suspense
      fallback={
        // The form is taller than a phone's screen: the box holds a screen's height meanwhile, so the footer is not
        // drawn on screen and then pushed off it when the form comes (a layout shift of 0.14).
        <div className="mx-auto min-h-dvh max-w-2xl">
          <PageTitle
            title={t('booking.title')}
            lead={`${e.title} · ${formatDay(e.startsAt, e.timeZone, lang)} · ${e.venue.name}, ${e.venue.town}`}
          />
          <Spinner label={t('booking.loading')} />
        </div>
      }
    >
      <BookingForm
        event={e}
        categories={categories.data}
        onBooked={() => queryClient.invalidateQueries({ queryKey: eventKeys.all })}
      />
    </Suspense>
  );
}
