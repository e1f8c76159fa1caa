import { Link } from 'react-router';
import { formatDay, formatTime, formatTimeRange } from '../../../../shared/format';
import { Button } from '../../components/ui/button';
import { MonthCalendar } from '../../components/ui/month-calendar';
import { Alert, Card, EmptyState, PageTitle, Spinner } from '../../components/ui/feedback';
import { paths } from '../../config/paths';
import { useUser } from '../../lib/auth';
import { StatusChip } from '../../features/event-day/status-chip';
import { useMyEvents } from '../../features/rota/api/get-my-events';
import { useSetShift } from '../../features/rota/api/set-shift';
import { useQueue } from '../../features/workbench/api/get-queue';

/** The fixer's page on a phone: the items coming to them in order, then the sessions they can say yes to. */
export function BenchPage() {
  const { data: user } = useUser();
  const queue = useQueue();
  const events = useMyEvents();
  const setShift = useSetShift();
  if (!user) return null;
  return (
    <div className="mx-auto max-w-3xl space-y-6">
      <PageTitle title="My bench" lead={`Hello ${user.name.split(' ')[0]}.`} />
      <nav aria-label="Toolkit" className="flex flex-wrap gap-2 text-sm">
        <Link
          to={paths.knowledge()}
          className="rounded-lg bg-white px-3 py-2 font-semibold text-navy ring-1 ring-navy/20"
        >
          Repair notes
        </Link>
        <Link
          to={paths.calculators()}
          className="rounded-lg bg-white px-3 py-2 font-semibold text-navy ring-1 ring-navy/20"
        >
          Calculators
        </Link>
        {[...new Map(user.roles.filter((r) => r.role === 'fixer').map((r) => [r.groupId, r.groupName])).entries()].map(
          ([id, name]) => (
            <Link
              key={id}
              to={paths.salvage(id)}
              className="rounded-lg bg-white px-3 py-2 font-semibold text-navy ring-1 ring-navy/20"
            >
              Salvage stock · {name}
            </Link>
          ),
        )}
      </nav>
      <section aria-labelledby="queue" className="space-y-3">
        <h2 id="queue" className="text-xl">
          My queue
        </h2>
        {queue.isPending && <Spinner />}
        {queue.error && <Alert tone="error">{queue.error.message}</Alert>}
        {queue.data?.length === 0 && (
          <EmptyState title="No items are waiting for you" icon="⚒">
            When the organiser runs triage, the items matched to you appear here in order.
          </EmptyState>
        )}
        <ol className="space-y-3">
          {queue.data?.map((q, n) => (
            <li key={q.itemId} className="rounded-xl bg-white p-4 shadow-sm ring-1 ring-ink/5">
              <div className="flex items-baseline justify-between gap-2">
                <p className="text-lg font-extrabold text-navy">
                  <span className="mr-2 inline-flex size-7 items-center justify-center rounded-full bg-copper text-sm text-white">
                    {n + 1}
                  </span>
                  <Link
                    to={paths.item(q.itemId)}
                    className="underline decoration-copper/40 underline-offset-4 hover:decoration-copper"
                  >
                    {q.categoryName}
                  </Link>
                </p>
                <p className="text-sm font-bold text-copper-dark">planned {formatTime(q.slotStartsAt, q.timeZone)}</p>
              </div>
              {q.status !== 'booked' && (
                <p className="mt-1 flex items-center gap-2">
                  <StatusChip status={q.status} />
                  {q.queueNumber !== null && <b>No. {q.queueNumber}</b>}
                  {q.tagCode && <span className="font-mono text-sm">{q.tagCode}</span>}
                </p>
              )}
              <p className="mt-1">{q.fault}</p>
              <p className="mt-1 text-sm text-ink-soft">
                {[q.brand, q.model].filter(Boolean).join(' ') || 'Brand not given'} · {q.visitorName} · {q.benchName} ·
                about {q.minutes} min · {q.reference}
              </p>
              {q.mains && (
                <p className="mt-2 rounded bg-copper-light px-2 py-1 text-sm font-semibold text-copper-dark">
                  ⚠ Mains item: unplug and prove dead before opening; safety-check before it goes home.
                </p>
              )}
              {q.photoIds.length > 0 && (
                <div className="mt-2 flex gap-2">
                  {q.photoIds.map((p) => (
                    <a key={p} href={`/api/photos/${p}`} target="_blank" rel="noreferrer">
                      <img
                        src={`/api/photos/${p}`}
                        alt={`Photo of the ${q.categoryName.toLowerCase()}`}
                        className="size-24 rounded-lg object-cover"
                      />
                    </a>
                  ))}
                </div>
              )}
              <p className="mt-1 text-xs text-ink-soft">{q.eventTitle}</p>
            </li>
          ))}
        </ol>
      </section>

      <section aria-labelledby="sessions" className="space-y-3">
        <div className="flex items-center justify-between">
          <h2 id="sessions" className="text-xl">
            Sessions I can help at
          </h2>
          <Link to={paths.mySkills()} className="text-sm font-bold text-navy underline">
            My skills
          </Link>
        </div>
        {events.isPending && <Spinner />}
        {events.error && <Alert tone="error">{events.error.message}</Alert>}
        {events.data?.length === 0 && (
          <EmptyState title="No upcoming sessions" icon="▦">
            Your groups have not published a date yet.
          </EmptyState>
        )}
        {setShift.error && <Alert tone="error">{setShift.error.message}</Alert>}
        {events.data?.map((e) => (
          <Card key={e.id}>
            <p className="text-sm font-bold text-copper-dark">
              {formatDay(e.startsAt, e.timeZone)} · {formatTimeRange(e.startsAt, e.endsAt, e.timeZone)}
            </p>
            <p className="font-extrabold text-navy">{e.title}</p>
            <p className="text-sm text-ink-soft">
              {e.groupName} ·{' '}
              {e.shift
                ? e.shift.coming
                  ? `You come ${formatTimeRange(e.shift.startsAt, e.shift.endsAt, e.timeZone)}`
                  : 'You said you cannot come'
                : 'You have not answered yet'}
            </p>
            <div className="mt-2 flex flex-wrap gap-2">
              <Button
                className="min-h-10"
                variant={
                  e.shift?.coming && e.shift.startsAt === e.startsAt && e.shift.endsAt === e.endsAt
                    ? 'primary'
                    : 'secondary'
                }
                aria-pressed={Boolean(
                  e.shift?.coming && e.shift.startsAt === e.startsAt && e.shift.endsAt === e.endsAt,
                )}
                onClick={() => setShift.mutate({ eventId: e.id, coming: true })}
              >
                I’m coming, all day
              </Button>
              <Button
                variant="secondary"
                className="min-h-10"
                onClick={() =>
                  setShift.mutate({
                    eventId: e.id,
                    coming: true,
                    startsAt: e.startsAt,
                    endsAt: new Date((new Date(e.startsAt).getTime() + new Date(e.endsAt).getTime()) / 2).toISOString(),
                  })
                }
              >
                First half
              </Button>
              <Button
                variant="secondary"
                className="min-h-10"
                onClick={() =>
                  setShift.mutate({
                    eventId: e.id,
                    coming: true,
                    startsAt: new Date(
                      (new Date(e.startsAt).getTime() + new Date(e.endsAt).getTime()) / 2,
                    ).toISOString(),
                    endsAt: e.endsAt,
                  })
                }
              >
                Second half
              </Button>
              <Button
                variant={e.shift && !e.shift.coming ? 'primary' : 'quiet'}
                aria-pressed={Boolean(e.shift && !e.shift.coming)}
                className="min-h-10"
                onClick={() => setShift.mutate({ eventId: e.id, coming: false })}
              >
                Can’t come
              </Button>
            </div>
          </Card>
        ))}
        {events.data && events.data.some((e) => e.shift?.coming) && (
          <Card className="mendery-calendar">
            <h3 className="mb-2 text-lg">My shifts</h3>
            <MonthCalendar
              events={events.data
                .filter((e) => e.shift?.coming)
                .map((e) => ({
                  id: String(e.id),
                  title: e.title,
                  start: e.shift!.startsAt,
                  end: e.shift!.endsAt,
                  backgroundColor: '#23395d',
                  borderColor: 'transparent',
                }))}
            />
          </Card>
        )}
      </section>
    </div>
  );
}
