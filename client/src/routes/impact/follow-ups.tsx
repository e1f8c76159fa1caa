import { useSuspenseQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { formatDay, formatMoney, intlLocale } from '../../../../shared/format';
import type { Language } from '../../../../shared/i18n/languages';
import { MANUAL_FOLLOW_UP_STATUSES, type FollowUpStatus } from '../../../../shared/impact/follow-ups';
import { GroupTabs } from '../../components/layouts/group-tabs';
import { Button } from '../../components/ui/button';
import { ConfirmDialog } from '../../components/ui/confirm-dialog';
import { Alert, EmptyState } from '../../components/ui/feedback';
import { TextAreaField } from '../../components/ui/field';
import { groupSettingsQuery } from '../../features/groups/api/get-group-settings';
import { isWebLink } from '../../../../shared/files/web-links';
import type { FollowUp } from '../../features/impact/api/types';
import { followUpsQuery, useFollowUps } from '../../features/impact/api/get-follow-ups';
import { useLanguage, useT } from '../../lib/i18n';
import { queryClient } from '../../lib/query-client';
import { useSetFollowUp } from '../../features/impact/api/set-follow-up';

type ManualStatus = (typeof MANUAL_FOLLOW_UP_STATUSES)[number];
const isManual = (s: FollowUpStatus): s is ManualStatus =>
  (MANUAL_FOLLOW_UP_STATUSES as readonly FollowUpStatus[]).includes(s);

/** Still in hand: nobody has come back with the part, and nobody has given up. */
const OPEN_STATUSES: readonly FollowUpStatus[] = ['open', 'part-ordered', 'rebooked'];

const CHIP: Record<FollowUpStatus, string> = {
  open: 'bg-copper-light text-copper-dark',
  'part-ordered': 'bg-navy/10 text-navy',
  rebooked: 'bg-sage-light text-sage',
  'came-back': 'bg-sage-light text-sage',
  'fixed-at-return': 'bg-sage text-white',
  'gave-up': 'bg-ink/10 text-ink-soft',
};

const shortDay = (d: string, timeZone: string, lang: Language) =>
  new Intl.DateTimeFormat(intlLocale(lang), { timeZone, day: 'numeric', month: 'short', year: 'numeric' }).format(
    new Date(d),
  );
/** The catalog key of each status's name. */
const STATUS_KEY: Record<FollowUpStatus, string> = {
  open: 'figures.followUps.status.open',
  'part-ordered': 'figures.followUps.status.partOrdered',
  rebooked: 'figures.followUps.status.rebooked',
  'came-back': 'figures.followUps.status.cameBack',
  'fixed-at-return': 'figures.followUps.status.fixedAtReturn',
  'gave-up': 'figures.followUps.status.gaveUp',
};

/** The page reads what the loader fetched; a failure to fetch it is the route's error, shown in the page frame. */
export const loader = ({ params }: LoaderFunctionArgs) => {
  const groupId = Number(params.groupId);
  return Promise.all([
    queryClient.ensureQueryData(followUpsQuery(groupId)),
    queryClient.ensureQueryData(groupSettingsQuery(groupId)),
  ]);
};

/** Items that need a part, oldest first: who to chase, what they need, and the link that books them back in. */
export function FollowUpsPage() {
  const t = useT();
  const lang = useLanguage();
  const groupId = Number(useParams().groupId);
  const [params, setParams] = useSearchParams();
  const showAll = params.get('show') === 'all';
  const { data: followUps } = useFollowUps(groupId);
  const { data: group } = useSuspenseQuery(groupSettingsQuery(groupId));
  const setStatus = useSetFollowUp(groupId);
  const [confirm, setConfirm] = useState<FollowUp | null>(null);
  const [note, setNote] = useState('');
  const [copied, setCopied] = useState<{ itemId: number; ok: boolean } | null>(null);
  const tz = group.timeZone;

  const show = (all: boolean) =>
    setParams(
      (prev) => {
        const next = new URLSearchParams(prev);
        if (all) next.set('show', 'all');
        else next.delete('show');
        return next;
      },
      { replace: true },
    );

  const all = [...followUps].sort((a, b) => a.createdAt.localeCompare(b.createdAt));
  const open = all.filter((f) => OPEN_STATUSES.includes(f.status));
  const list = showAll ? all : open;

  const choose = (f: FollowUp, status: ManualStatus) => {
    if (status === f.status) return;
    if (status === 'gave-up') {
      setNote(f.note ?? '');
      setConfirm(f);
      return;
    }
    setStatus.mutate({ itemId: f.itemId, status });
  };

  const copy = async (f: FollowUp) => {
    try {
      await navigator.clipboard.writeText(f.rebookUrl ?? '');
      setCopied({ itemId: f.itemId, ok: true });
    } catch {
      setCopied({ itemId: f.itemId, ok: false });
    }
  };

  return (
    <div>
      <div className="mb-2">
        <h1 className="text-2xl sm:text-3xl">{group.name}</h1>
        <p className="mt-1 text-ink-soft">{t('figures.followUps.lead')}</p>
      </div>
      <GroupTabs groupId={groupId} />

      <div
        role="group"
        aria-label={t('figures.followUps.which')}
        className="mb-4 inline-flex rounded-lg bg-white p-1 ring-1 ring-ink/10"
      >
        {([false, true] as const).map((wantAll) => (
          <button
            key={String(wantAll)}
            type="button"
            aria-pressed={showAll === wantAll}
            onClick={() => show(wantAll)}
            className={`min-h-11 rounded-md px-4 font-bold ${showAll === wantAll ? 'bg-navy text-white' : 'text-navy hover:bg-navy/5'}`}
          >
            {wantAll ? t('figures.followUps.all') : t('figures.followUps.openOnly')}
            <span className="font-semibold"> ({wantAll ? all.length : open.length})</span>
          </button>
        ))}
      </div>

      {setStatus.isError && (
        <div className="mb-4">
          <Alert tone="error" title={t('figures.followUps.notChanged')}>
            {setStatus.error.message}
          </Alert>
        </div>
      )}

      {all.length === 0 ? (
        <EmptyState title={t('figures.followUps.emptyTitle')} icon="⚙">
          {t('figures.followUps.empty', { outcome: t('figures.outcome.partsNeeded') })}
        </EmptyState>
      ) : list.length === 0 ? (
        <EmptyState title={t('figures.followUps.nothingOpen')} icon="✓">
          {t('figures.followUps.allClosed')}{' '}
          <button type="button" onClick={() => show(true)} className="font-bold text-navy underline">
            {t('figures.followUps.showAll', { n: all.length })}
          </button>
        </EmptyState>
      ) : (
        <ul className="space-y-3">
          {list.map((f) => (
            <li
              key={f.itemId}
              data-testid="follow-up"
              className="grid gap-4 rounded-xl bg-white p-4 shadow-sm ring-1 ring-ink/5 md:grid-cols-[1fr_15rem]"
            >
              <div className="min-w-0 space-y-2">
                <div className="flex flex-wrap items-center gap-2">
                  <span
                    className={`rounded-full px-2.5 py-0.5 text-xs font-bold ${CHIP[f.status]}`}
                    data-testid="follow-up-status"
                  >
                    {t(STATUS_KEY[f.status])}
                  </span>
                  {f.reminderDue && (
                    <span
                      className="rounded-full bg-copper px-2.5 py-0.5 text-xs font-bold text-white"
                      data-testid="reminder-due"
                    >
                      {t('figures.followUps.reminderDue')}
                    </span>
                  )}
                  <span className="text-sm text-ink-soft">
                    {t('figures.followUps.age', { days: Math.max(0, f.ageDays) })}
                  </span>
                </div>
                <p className="text-lg font-extrabold text-navy">{f.item}</p>
                <p className="text-sm">
                  <span className="font-semibold">{t('figures.followUps.part')}</span>{' '}
                  {f.part ?? <span className="text-ink-soft">{t('figures.followUps.notDescribed')}</span>}
                  {f.partCost !== null && (
                    <> · {t('figures.followUps.about', { cost: formatMoney(f.partCost, f.currency, lang) })}</>
                  )}
                  {isWebLink(f.partLink) && (
                    <>
                      {' '}
                      ·{' '}
                      <a href={f.partLink} target="_blank" rel="noreferrer" className="font-bold text-navy underline">
                        {t('figures.followUps.whereToFind')}
                        <span className="sr-only">{t('impact.widget.newTab')}</span>
                      </a>
                    </>
                  )}
                </p>
                <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-sm">
                  <dt className="text-ink-soft">{t('figures.records.col.visitor')}</dt>
                  <dd className="min-w-0">
                    {f.visitor.name} · {t('figures.followUps.ref')}{' '}
                    <span className="font-mono">{f.visitor.reference}</span>
                  </dd>
                  <dt className="text-ink-soft">{t('figures.followUps.contact')}</dt>
                  <dd className="min-w-0 break-words">
                    {f.visitor.email && (
                      <a href={`mailto:${f.visitor.email}`} className="text-navy underline">
                        {f.visitor.email}
                      </a>
                    )}
                    {f.visitor.email && f.visitor.phone && ' · '}
                    {f.visitor.phone && (
                      <a href={`tel:${f.visitor.phone}`} className="text-navy underline">
                        {f.visitor.phone}
                      </a>
                    )}
                    {!f.visitor.email && !f.visitor.phone && (
                      <span className="text-ink-soft">{t('figures.followUps.noneGiven')}</span>
                    )}
                  </dd>
                  <dt className="text-ink-soft">{t('figures.records.col.session')}</dt>
                  <dd className="min-w-0">
                    {f.event.title}, {formatDay(f.event.startsAt, tz, lang)}
                  </dd>
                  <dt className="text-ink-soft">{t('figures.followUps.mails')}</dt>
                  <dd className="min-w-0">
                    {f.mailedAt
                      ? t('figures.followUps.mailed', { date: shortDay(f.mailedAt, tz, lang) })
                      : t('figures.followUps.notMailed')}
                    {f.remindedAt
                      ? ` · ${t('figures.followUps.reminded', { date: shortDay(f.remindedAt, tz, lang) })}`
                      : ''}
                  </dd>
                  {f.returnVisit && (
                    <>
                      <dt className="text-ink-soft">{t('figures.followUps.returnVisit')}</dt>
                      <dd className="min-w-0">
                        <span className="font-mono">{f.returnVisit.reference}</span> · {f.returnVisit.eventTitle},{' '}
                        {formatDay(f.returnVisit.startsAt, tz, lang)}
                      </dd>
                    </>
                  )}
                  {f.note && (
                    <>
                      <dt className="text-ink-soft">{t('figures.followUps.note')}</dt>
                      <dd className="min-w-0">{f.note}</dd>
                    </>
                  )}
                </dl>
              </div>

              <div className="space-y-2">
                <label className="block text-sm font-semibold">
                  {t('figures.followUps.status')}
                  <select
                    value={isManual(f.status) ? f.status : ''}
                    onChange={(e) => choose(f, e.target.value as ManualStatus)}
                    disabled={setStatus.isPending && setStatus.variables?.itemId === f.itemId}
                    className="mt-1 block w-full rounded-lg border border-ink/20 bg-white px-3 py-2.5 text-base font-normal"
                  >
                    {!isManual(f.status) && (
                      <option value="" disabled>
                        {t(STATUS_KEY[f.status])}
                      </option>
                    )}
                    {MANUAL_FOLLOW_UP_STATUSES.map((s) => (
                      <option key={s} value={s}>
                        {t(STATUS_KEY[s])}
                      </option>
                    ))}
                  </select>
                </label>
                {setStatus.isPending && setStatus.variables?.itemId === f.itemId && (
                  <p role="status" className="text-sm text-ink-soft">
                    {t('figures.followUps.saving')}
                  </p>
                )}
                {f.rebookUrl && (
                  <Button variant="secondary" className="w-full" onClick={() => copy(f)}>
                    {t('figures.followUps.copyLink')}
                  </Button>
                )}
                {copied?.itemId === f.itemId && (
                  <p role="status" className="text-sm font-semibold">
                    {copied.ok ? (
                      <span className="text-sage">{t('figures.followUps.copied')}</span>
                    ) : (
                      <span className="text-alert">
                        {t('figures.followUps.copyFailed')}{' '}
                        <span className="break-all font-mono font-normal text-ink">{f.rebookUrl}</span>
                      </span>
                    )}
                  </p>
                )}
              </div>
            </li>
          ))}
        </ul>
      )}

      <ConfirmDialog
        open={confirm !== null}
        title={t('figures.followUps.giveUpTitle')}
        message={confirm ? t('figures.followUps.giveUpText', { item: confirm.item, name: confirm.visitor.name }) : ''}
        confirmLabel={t('figures.followUps.giveUp')}
        busy={setStatus.isPending}
        onCancel={() => setConfirm(null)}
        onConfirm={() => {
          if (!confirm) return;
          const trimmed = note.trim();
          setStatus.mutate(
            { itemId: confirm.itemId, status: 'gave-up', note: trimmed || undefined },
            { onSettled: () => setConfirm(null) },
          );
        }}
      >
        <TextAreaField
          label={t('figures.followUps.noteLabel')}
          value={note}
          maxLength={300}
          onChange={(e) => setNote(e.target.value)}
          hint={t('figures.followUps.noteHint')}
        />
      </ConfirmDialog>
    </div>
  );
}
