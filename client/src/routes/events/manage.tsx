import { useState } from 'react';
import { useSuspenseQuery } from '@tanstack/react-query';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router';
import { SKILLS, type Skill } from '../../../../shared/constants';
import { formatDay, formatTime, formatTimeRange } from '../../../../shared/format';
import { EventTabs } from '../../components/layouts/event-tabs';
import { Button } from '../../components/ui/button';
import { ConfirmDialog } from '../../components/ui/confirm-dialog';
import { Alert, Card, EmptyState, Spinner } from '../../components/ui/feedback';
import { paths } from '../../config/paths';
import { eventQuery } from '../../features/events/api/get-event';
import { useChangeEvent } from '../../features/events/api/change-event';
import { eventBookingsQuery, useEventBookings } from '../../features/events/api/get-event-bookings';
import { CancelSession } from '../../features/events/components/cancel-session';
import { EraseBookingButton } from '../../features/privacy/components/erase-booking-button';
import { organises, useUser } from '../../lib/auth';
import { ERASED_NAME } from '../../../../shared/privacy/scrub';
import { PlacesBar, StatusBadge } from '../../features/events/components/places-bar';
import { useLanguage, useT } from '../../lib/i18n';
import { queryClient } from '../../lib/query-client';

/** The event must load (else the error page says why); what is coming may fail on its own, in its card. */
export const loader = ({ params }: LoaderFunctionArgs) => {
  const id = Number(params.eventId);
  return Promise.all([
    queryClient.ensureQueryData(eventQuery(id)),
    queryClient.ensureQueryData(eventBookingsQuery(id)).catch(() => null),
  ]);
};

/** The organiser's view of one session: its state, its slots, and what is coming. */
export function ManageEventPage() {
  const t = useT();
  const lang = useLanguage();
  const id = Number(useParams().eventId);
  const { data: e } = useSuspenseQuery(eventQuery(id));
  const coming = useEventBookings(id);
  // Erasing a visitor's details on request is the organisers' (a host sees the list too).
  const canErase = organises(useUser().data, e.groupId);
  const action = useChangeEvent(id);
  const [ask, setAsk] = useState<null | 'publish' | 'close'>(null);
  const tz = e.timeZone;
  const draft = e.status === 'draft';
  const questions = {
    publish: {
      title: t('organise.manage.publishQuestion'),
      message: t('organise.manage.publishMessage'),
      label: t('organise.manage.publish'),
    },
    close: {
      title: t('organise.manage.closeQuestion'),
      message: t('organise.manage.closeMessage'),
      label: t('organise.manage.close'),
    },
  };
  const maxSkill = Math.max(1, ...(coming.data?.summary.bySkill.map((s) => s.count) ?? [1]));

  return (
    <div className="space-y-6">
      <div>
        <Link to={paths.groupEvents(e.groupId)} className="text-sm font-bold text-navy underline">
          {t('organise.manage.back', { group: e.groupName })}
        </Link>
        <div className="mt-2 flex flex-wrap items-center gap-3">
          <h1 className="text-2xl sm:text-3xl">{e.title}</h1>
          <StatusBadge status={e.status} />
        </div>
        <p className="font-bold text-copper-dark">
          {formatDay(e.startsAt, tz, lang)} · {formatTimeRange(e.startsAt, e.endsAt, tz, lang)} · {e.venue.name}
        </p>
      </div>
      <EventTabs eventId={e.id} />

      {action.error && <Alert tone="error">{action.error.message}</Alert>}
      <div className="flex flex-wrap gap-2">
        {draft && <Button onClick={() => setAsk('publish')}>{t('organise.manage.publish')}</Button>}
        {e.status === 'published' && (
          <Button variant="secondary" onClick={() => setAsk('close')}>
            {t('organise.manage.close')}
          </Button>
        )}
        {e.status !== 'draft' && (
          <Link
            to={paths.event(e.id)}
            className="inline-flex min-h-11 items-center rounded-lg px-4 font-bold text-navy ring-1 ring-navy/25"
          >
            {t('organise.manage.publicPage')}
          </Link>
        )}
      </div>

      <div className="grid gap-4 lg:grid-cols-[1fr_20rem]">
        <Card flush className="overflow-hidden">
          <h2 className="px-5 pt-4 text-lg">{t('organise.manage.slots')}</h2>
          {draft && (
            <p className="px-5 text-sm text-ink-soft">
              {t('organise.manage.adjustHint')}
              {action.isSuccess && (
                <span role="status" className="ml-2 font-bold text-sage">
                  {t('organise.manage.saved')}
                </span>
              )}
            </p>
          )}
          <table className="mt-2 w-full text-left text-sm">
            <thead className="bg-navy/5 text-navy">
              <tr>
                <th className="px-5 py-2">{t('organise.manage.time')}</th>
                <th className="px-2 py-2">{t('organise.manage.places')}</th>
                <th className="px-2 py-2">{t('organise.manage.booked')}</th>
                <th className="px-5 py-2">
                  <span className="sr-only">{t('organise.manage.actions')}</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {e.slots.map((s) => (
                <tr key={s.id} className="border-t border-ink/5">
                  <td className="px-5 py-2 font-bold">{formatTimeRange(s.startsAt, s.endsAt, tz, lang)}</td>
                  <td className="px-2 py-2">
                    {draft ? (
                      <input
                        type="number"
                        min={0}
                        aria-label={t('organise.manage.placesAt', { time: formatTime(s.startsAt, tz, lang) })}
                        defaultValue={s.capacity}
                        className="w-20 rounded border border-ink/20 px-2 py-1"
                        onKeyDown={(ev) => ev.key === 'Enter' && ev.currentTarget.blur()}
                        onBlur={(ev) =>
                          Number(ev.target.value) !== s.capacity &&
                          action.mutate({ kind: 'set-capacity', slotId: s.id, capacity: Number(ev.target.value) })
                        }
                      />
                    ) : (
                      s.capacity
                    )}
                  </td>
                  <td className="px-2 py-2">
                    <div className="w-28">
                      <PlacesBar free={s.free} total={s.capacity} label={false} />
                    </div>
                    <span className="text-xs">
                      {s.held
                        ? t('organise.manage.bookedHeld', { booked: s.booked, held: s.held })
                        : t('organise.manage.bookedCount', { booked: s.booked })}
                    </span>
                  </td>
                  <td className="px-5 py-2 text-right">
                    {draft && (
                      <button
                        className="rounded px-2 py-1 font-semibold text-alert hover:bg-alert-light"
                        onClick={() => action.mutate({ kind: 'remove-slot', slotId: s.id })}
                      >
                        {t('organise.manage.remove')}
                      </button>
                    )}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </Card>

        <Card>
          <h2 className="text-lg">{t('organise.manage.coming')}</h2>
          {coming.isPending ? (
            <Spinner />
          ) : coming.error ? (
            <Alert tone="error">{coming.error.message}</Alert>
          ) : (
            <>
              <p className="mt-1">
                <span className="text-3xl font-extrabold text-navy">{coming.data.summary.items}</span>{' '}
                {t('organise.manage.comingSummary', {
                  items: coming.data.summary.items,
                  bookings: coming.data.summary.bookings,
                  mains: coming.data.summary.mains,
                })}
              </p>
              <h3 className="mt-4 text-sm font-bold">{t('organise.manage.bySkill')}</h3>
              {coming.data.summary.bySkill.length === 0 && (
                <p className="text-sm text-ink-soft">{t('organise.manage.nothingBooked')}</p>
              )}
              <ul className="mt-1 space-y-1.5" aria-label={t('organise.manage.itemsBySkill')}>
                {coming.data.summary.bySkill.map((s) => (
                  <li key={s.name} className="grid grid-cols-[6.5rem_1fr_2rem] items-center gap-2 text-sm">
                    <span>{SKILLS.includes(s.name as Skill) ? t(`common.skill.${s.name}`) : s.name}</span>
                    <span className="h-3 rounded bg-copper" style={{ width: `${(s.count / maxSkill) * 100}%` }} />
                    <span className="text-right font-bold">{s.count}</span>
                  </li>
                ))}
              </ul>
              <h3 className="mt-4 text-sm font-bold">{t('organise.manage.byKind')}</h3>
              <p className="text-sm text-ink-soft">
                {coming.data.summary.byCategory.map((c) => `${c.name} ${c.count}`).join(' · ') ||
                  t('organise.manage.nothingBooked')}
              </p>
            </>
          )}
        </Card>
      </div>

      <section aria-labelledby="bookings">
        <h2 id="bookings" className="mb-3 text-xl">
          {t('organise.manage.bookings')}
        </h2>
        {coming.data?.bookings.length === 0 && (
          <EmptyState title={t('organise.manage.noBookingsTitle')} icon="☰">
            {draft ? t('organise.manage.noBookingsDraft') : t('organise.manage.noBookings')}
          </EmptyState>
        )}
        <ul className="space-y-2">
          {coming.data?.bookings.map((b) => (
            <li
              key={b.id}
              className={`rounded-xl bg-white p-4 ring-1 ring-ink/5 ${b.status === 'cancelled' ? 'opacity-60' : ''}`}
            >
              <div className="flex flex-wrap items-baseline justify-between gap-2">
                <p>
                  <span className="font-mono font-bold">{b.reference}</span> ·{' '}
                  <span className="font-bold">{b.visitorName}</span>{' '}
                  <span className="text-sm text-ink-soft">
                    {b.visitorEmail}
                    {b.visitorPhone ? ` · ${b.visitorPhone}` : ''}
                  </span>
                </p>
                <p className="text-sm font-bold text-copper-dark">
                  {formatTime(b.slotStartsAt, tz, lang)}{' '}
                  {b.status === 'cancelled' && <StatusBadge status="cancelled" />}
                  {canErase && b.visitorName !== ERASED_NAME && (
                    <EraseBookingButton
                      reference={b.reference}
                      name={b.visitorName}
                      onErased={() => void coming.refetch()}
                    />
                  )}
                </p>
              </div>
              <ul className="mt-1 space-y-1 text-sm">
                {b.items.map((i) => (
                  <li key={i.id} className="flex flex-wrap items-center gap-2">
                    <span className="font-semibold">
                      {i.categoryName}
                      {i.brand ? ` — ${i.brand}` : ''}
                      {i.model ? ` ${i.model}` : ''}
                    </span>
                    {i.mains && (
                      <span className="rounded bg-copper-light px-1.5 text-xs font-bold text-copper-dark">
                        {t('organise.manage.mains')}
                      </span>
                    )}
                    <span className="text-ink-soft">{i.fault}</span>
                    {i.photoIds.map((p) => (
                      <a key={p} href={`/api/photos/${p}`} target="_blank" rel="noreferrer">
                        <img
                          src={`/api/photos/${p}`}
                          alt={t('organise.manage.photo')}
                          className="size-10 rounded object-cover"
                        />
                      </a>
                    ))}
                  </li>
                ))}
              </ul>
            </li>
          ))}
        </ul>
        {(coming.data?.waiting.length ?? 0) > 0 && (
          <Card className="mt-4">
            <h3 className="text-lg">{t('organise.manage.waitingList')}</h3>
            <ul className="mt-2 text-sm">
              {coming.data!.waiting.map((w) => (
                <li key={w.id}>
                  {w.visitorName} · {t('organise.manage.waitingItems', { n: w.places })} ·{' '}
                  {formatTime(e.slots.find((s) => s.id === w.slotId)?.startsAt ?? e.startsAt, tz, lang)} ·{' '}
                  {w.status === 'offered' ? t('organise.manage.offered') : t('organise.manage.waiting')}
                </li>
              ))}
            </ul>
          </Card>
        )}
      </section>

      {e.status !== 'cancelled' && (
        <CancelSession
          event={e}
          toTell={
            coming.data ? coming.data.bookings.filter((b) => b.status === 'confirmed' && b.visitorEmail).length : null
          }
          busy={action.isPending}
          onConfirm={(reason, done) =>
            action.mutate(
              { kind: 'cancel', reason },
              {
                onSettled: () => {
                  done();
                  coming.refetch();
                },
              },
            )
          }
        />
      )}

      <ConfirmDialog
        open={ask !== null}
        title={ask ? questions[ask].title : ''}
        message={ask ? questions[ask].message : ''}
        confirmLabel={ask ? questions[ask].label : ''}
        tone="primary"
        cancelLabel={t('organise.manage.notYet')}
        busy={action.isPending}
        onCancel={() => setAsk(null)}
        onConfirm={() =>
          ask &&
          action.mutate(
            { kind: ask },
            {
              onSettled: () => {
                setAsk(null);
                coming.refetch();
              },
            },
          )
        }
      />
    </div>
  );
}
