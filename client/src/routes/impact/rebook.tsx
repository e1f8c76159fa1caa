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
import { trParts, useLanguage, useT } from '../../lib/i18n';

type Session = RebookView['events'][number];
type Chosen = { event: Session; slot: Session['slots'][number] };

const itemName = (item: RebookView['item']) =>
  [item.categoryName, [item.brand, item.model].filter(Boolean).join(' ')].filter(Boolean).join(' — ');

/** The page reads what the loader fetched; a failure to fetch it is told by this module's `ErrorBoundary`. */
export const loader = ({ params }: LoaderFunctionArgs) => queryClient.ensureQueryData(rebookQuery(params.token ?? ''));

/** A link that does not work, in the visitor's words; anything else can be tried again. */
export function ErrorBoundary() {
  const t = useT();
  const err = useRouteError();
  const revalidator = useRevalidator();
  const notValid = err instanceof ApiError && (err.status === 404 || err.status === 400);
  return (
    <div className="mx-auto max-w-xl space-y-4">
      <PageTitle title={notValid ? t('account.rebook.linkBroken') : t('account.rebook.wrong')} />
      {notValid ? (
        <Alert tone="info" title={t('account.rebook.notFoundTitle')}>
          {t('account.rebook.notFound')}
        </Alert>
      ) : (
        <>
          <Alert tone="error" title={t('account.rebook.loadFailed')}>
            {err instanceof Error ? err.message : t('account.rebook.tryLater')}
          </Alert>
          <Button variant="secondary" busy={revalidator.state === 'loading'} onClick={() => revalidator.revalidate()}>
            {t('account.rebook.tryAgain')}
          </Button>
        </>
      )}
    </div>
  );
}

/** The visitor's priority link after a visit that ended needing a part: pick a time to come back with it. */
export function RebookPage() {
  const t = useT();
  const lang = useLanguage();
  const token = useParams().token ?? '';
  const { data: v } = useRebook(token);
  const book = useBookReturn(token);
  const [chosen, setChosen] = useState<Chosen | null>(null);
  const [when, setWhen] = useState('');
  const done = book.isSuccess ? book.data : null;

  const tz = v.group.timeZone;
  const item = itemName(v.item);
  // A kind of item inside a sentence: lower case, but for German, whose nouns keep their capital.
  const kind = lang === 'de' ? v.item.categoryName : v.item.categoryName.toLowerCase();
  const whenOf = (c: Chosen) =>
    t('account.rebook.when', {
      session: c.event.title,
      day: formatDay(c.slot.startsAt, tz, lang),
      time: formatTime(c.slot.startsAt, tz, lang),
    });

  if (done) {
    return (
      <div className="mx-auto max-w-xl space-y-4" data-testid="rebook-done">
        <div className="rounded-xl bg-sage p-5 text-white">
          <p className="text-2xl font-extrabold">{t('account.rebook.booked', { name: v.visitorName })}</p>
          <p className="mt-1">{t('account.rebook.bring', { when, kind })}</p>
        </div>
        <Card>
          <p className="text-sm text-ink-soft">{t('account.rebook.reference')}</p>
          <p className="font-mono text-3xl font-extrabold tracking-wider text-navy" data-testid="rebook-reference">
            {done.reference}
          </p>
          <p className="mt-2 text-sm">{t('account.rebook.confirmationSent')}</p>
          <Link
            to={paths.booking(done.reference, done.manageToken)}
            className="mt-4 inline-flex min-h-11 items-center rounded-lg bg-copper px-4 font-bold text-white hover:bg-copper-dark"
          >
            {t('account.rebook.seeBooking')}
          </Link>
        </Card>
      </div>
    );
  }

  const closed = v.status !== 'open' && v.status !== 'part-ordered';

  const confirm = () => {
    if (!chosen) return;
    setWhen(whenOf(chosen));
    book.mutate(chosen.slot.id, { onSettled: () => setChosen(null) });
  };

  return (
    <div className="mx-auto max-w-2xl space-y-5">
      <PageTitle
        title={t('account.rebook.hello', { name: v.visitorName })}
        lead={t('account.rebook.lead', { group: v.group.name })}
      />

      <Card>
        <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
          <dt className="font-semibold text-ink-soft">{t('account.rebook.yourItem')}</dt>
          <dd className="font-bold text-navy">{item}</dd>
          <dt className="font-semibold text-ink-soft">{t('account.rebook.part')}</dt>
          <dd>{v.item.part ?? t('account.rebook.partUnnamed')}</dd>
        </dl>
      </Card>

      {/* The booking refreshes this view before the mutation settles; until then the times stay as they were. */}
      {v.booked && !book.isPending ? (
        <Alert tone="success" title={t('account.rebook.alreadyTitle')}>
          {t('account.rebook.already', { kind })}
        </Alert>
      ) : closed ? (
        <Alert tone="info" title={t('account.rebook.closedTitle')}>
          {trParts(
            'account.rebook.closed',
            {
              link: (
                <Link to={paths.events()} className="font-bold underline">
                  {t('account.rebook.sessionsPage')}
                </Link>
              ),
            },
            { group: v.group.name },
          )}
        </Alert>
      ) : (
        <>
          <p>{t('account.rebook.choose')}</p>
          {book.isError && (
            <Alert tone="error" title={t('account.rebook.failed')}>
              {book.error.message}
            </Alert>
          )}
          {v.events.length === 0 ? (
            <EmptyState title={t('account.rebook.noSessionsTitle')} icon="▦">
              {t('account.rebook.noSessions', { group: v.group.name })}
            </EmptyState>
          ) : (
            v.events.map((e) => (
              <Card key={e.id}>
                <section aria-labelledby={`event-${e.id}`}>
                  <h2 id={`event-${e.id}`} className="text-lg">
                    {e.title}
                  </h2>
                  <p className="text-sm font-bold text-copper-dark">
                    {formatDay(e.startsAt, tz, lang)} · {formatTimeRange(e.startsAt, e.endsAt, tz, lang)}
                  </p>
                  {e.slots.length === 0 ? (
                    <p className="mt-2 text-sm text-ink-soft">{t('account.rebook.noTimes')}</p>
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
                            <span className="block text-lg font-extrabold">{formatTime(s.startsAt, tz, lang)}</span>
                            <span className="block text-xs font-semibold">
                              {s.free === 0
                                ? t('account.rebook.full')
                                : trParts(
                                    'account.rebook.free',
                                    {
                                      unit: (
                                        <span className="sr-only">{t('account.rebook.places', { n: s.free })}</span>
                                      ),
                                    },
                                    { n: s.free },
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
        title={t('account.rebook.confirmTitle')}
        message={chosen ? t('account.rebook.confirm', { when: whenOf(chosen), kind }) : ''}
        confirmLabel={t('account.rebook.bookIt')}
        cancelLabel={t('account.rebook.another')}
        busy={book.isPending}
        onCancel={() => setChosen(null)}
        onConfirm={confirm}
      />
    </div>
  );
}
