import { useState } from 'react';
import { Link, useParams, useRevalidator, useRouteError, type LoaderFunctionArgs } from 'react-router';
import { formatDay, formatTime, formatTimeRange } from '../../../../shared/format';
import { Button } from '../../components/ui/button';
import { ConfirmDialog } from '../../components/ui/confirm-dialog';
import { Alert, Card, EmptyState, PageTitle } from '../../components/ui/feedback';
import { paths } from '../../config/paths';
import type { RebookView } from '../../features/impact/api/types';
import { useBookReturn } from '../../features/impact/api/book-return';
import { rebookQuery, useRebook } from '../../features/impact/api/get-rebook';
import { queryClient } from '../../lib/query-client';
import { ApiError } from '../../lib/api';

type Session = RebookView['events'][number];
type Chosen = { event: Session; slot: Session['slots'][number] };

const itemName = (item: RebookView['item']) =>
  [item.categoryName, [item.brand, item.model].filter(Boolean).join(' ')].filter(Boolean).join(' — ');

/** The page reads what the loader fetched; a failure to fetch it is told by this module's `ErrorBoundary`. */
export const loader = ({ params }: LoaderFunctionArgs) => queryClient.ensureQueryData(rebookQuery(params.token ?? ''));

/** A link that does not work, in the visitor's words; anything else can be tried again. */
export function ErrorBoundary() {
  const err = useRouteError();
  const revalidator = useRevalidator();
  const notValid = err instanceof ApiError && (err.status === 404 || err.status === 400);
  return (
    <div className="mx-auto max-w-xl space-y-4">
      <PageTitle title={notValid ? 'This link does not work' : 'Something went wrong'} />
      {notValid ? (
        <Alert tone="info" title="We could not find this re-booking link">
          It may be incomplete: open it again from the mail we sent you, or copy the whole address. If it still does not
          work, reply to that mail and the group will book you in.
        </Alert>
      ) : (
        <>
          <Alert tone="error" title="The page could not be loaded">
            {err instanceof Error ? err.message : 'Try again in a moment.'}
          </Alert>
          <Button variant="secondary" busy={revalidator.state === 'loading'} onClick={() => revalidator.revalidate()}>
            Try again
          </Button>
        </>
      )}
    </div>
  );
}

/** The visitor's priority link after a visit that ended needing a part: pick a time to come back with it. */
export function RebookPage() {
  const token = useParams().token ?? '';
  const { data: v } = useRebook(token);
  const book = useBookReturn(token);
  const [chosen, setChosen] = useState<Chosen | null>(null);
  const [when, setWhen] = useState('');
  const done = book.isSuccess ? book.data : null;

  const tz = v.group.timeZone;
  const item = itemName(v.item);

  if (done) {
    return (
      <div className="mx-auto max-w-xl space-y-4" data-testid="rebook-done">
        <div className="rounded-xl bg-sage p-5 text-white">
          <p className="text-2xl font-extrabold">You are booked, {v.visitorName}</p>
          <p className="mt-1">
            {when}. Bring your {v.item.categoryName.toLowerCase()} and the part.
          </p>
        </div>
        <Card>
          <p className="text-sm text-ink-soft">Your booking reference</p>
          <p className="font-mono text-3xl font-extrabold tracking-wider text-navy" data-testid="rebook-reference">
            {done.reference}
          </p>
          <p className="mt-2 text-sm">
            We have sent you a confirmation by e-mail. Its link, and the one below, let you see, move or cancel the
            visit.
          </p>
          <Link
            to={paths.booking(done.reference, done.manageToken)}
            className="mt-4 inline-flex min-h-11 items-center rounded-lg bg-copper px-4 font-bold text-white hover:bg-copper-dark"
          >
            See or change my booking
          </Link>
        </Card>
      </div>
    );
  }

  const closed = v.status !== 'open' && v.status !== 'part-ordered';

  const confirm = () => {
    if (!chosen) return;
    setWhen(`${chosen.event.title}, ${formatDay(chosen.slot.startsAt, tz)} at ${formatTime(chosen.slot.startsAt, tz)}`);
    book.mutate(chosen.slot.id, { onSettled: () => setChosen(null) });
  };

  return (
    <div className="mx-auto max-w-2xl space-y-5">
      <PageTitle title={`Hello ${v.visitorName}`} lead={`Book a return visit to ${v.group.name}.`} />

      <Card>
        <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
          <dt className="font-semibold text-ink-soft">Your item</dt>
          <dd className="font-bold text-navy">{item}</dd>
          <dt className="font-semibold text-ink-soft">The part</dt>
          <dd>{v.item.part ?? 'The part the fixer told you about'}</dd>
        </dl>
      </Card>

      {/* The booking refreshes this view before the mutation settles; until then the times stay as they were. */}
      {v.booked && !book.isPending ? (
        <Alert tone="success" title="Your return visit is booked already">
          Use the link in its confirmation mail to see, move or cancel it. We look forward to seeing you and your{' '}
          {v.item.categoryName.toLowerCase()} again.
        </Alert>
      ) : closed ? (
        <Alert tone="info" title="This repair is closed">
          {v.group.name} has closed this repair. If you still want to come back with the part, reply to their mail or
          book a normal slot on the{' '}
          <Link to={paths.events()} className="font-bold underline">
            sessions page
          </Link>
          .
        </Alert>
      ) : (
        <>
          <p>Choose a time when you have the part. This link keeps a place for you even when a session is full.</p>
          {book.isError && (
            <Alert tone="error" title="That did not work">
              {book.error.message}
            </Alert>
          )}
          {v.events.length === 0 ? (
            <EmptyState title="No sessions open for booking yet" icon="▦">
              Keep this link: it works for the next sessions too, as soon as {v.group.name} publishes them.
            </EmptyState>
          ) : (
            v.events.map((e) => (
              <Card key={e.id}>
                <section aria-labelledby={`event-${e.id}`}>
                  <h2 id={`event-${e.id}`} className="text-lg">
                    {e.title}
                  </h2>
                  <p className="text-sm font-bold text-copper-dark">
                    {formatDay(e.startsAt, tz)} · {formatTimeRange(e.startsAt, e.endsAt, tz)}
                  </p>
                  {e.slots.length === 0 ? (
                    <p className="mt-2 text-sm text-ink-soft">No times left at this session.</p>
                  ) : (
                    <ul className="mt-3 grid grid-cols-3 gap-2 sm:grid-cols-4">
                      {e.slots.map((s) => (
                        <li key={s.id}>
                          <button
                            type="button"
                            disabled={s.free === 0 || book.isPending}
                            onClick={() => setChosen({ event: e, slot: s })}
                            className="w-full rounded-lg p-2 text-center ring-1 ring-ink/20 transition hover:bg-navy hover:text-white hover:ring-navy disabled:cursor-not-allowed disabled:bg-ink/5 disabled:text-ink-soft disabled:ring-ink/10 disabled:hover:bg-ink/5 disabled:hover:text-ink-soft"
                          >
                            <span className="block text-lg font-extrabold">{formatTime(s.startsAt, tz)}</span>
                            <span className="block text-xs font-semibold">
                              {s.free === 0 ? (
                                'full'
                              ) : (
                                <>
                                  {s.free} <span className="sr-only">{s.free === 1 ? 'place' : 'places'}</span> free
                                </>
                              )}
                            </span>
                          </button>
                        </li>
                      ))}
                    </ul>
                  )}
                </section>
              </Card>
            ))
          )}
        </>
      )}

      <ConfirmDialog
        open={chosen !== null}
        tone="primary"
        title="Book this time?"
        message={
          chosen
            ? `${chosen.event.title}, ${formatDay(chosen.slot.startsAt, tz)} at ${formatTime(chosen.slot.startsAt, tz)}, with your ${v.item.categoryName.toLowerCase()} and the part.`
            : ''
        }
        confirmLabel="Book it"
        cancelLabel="Choose another time"
        busy={book.isPending}
        onCancel={() => setChosen(null)}
        onConfirm={confirm}
      />
    </div>
  );
}
