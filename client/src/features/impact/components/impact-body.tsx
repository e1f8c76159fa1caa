import { useId, useMemo, useState } from 'react';
import { Link, useSearchParams } from 'react-router';
import { formatDay } from '../../../../../shared/format';
import { Button } from '../../../components/ui/button';
import { Alert, EmptyState } from '../../../components/ui/feedback';
import { SelectField, TextField } from '../../../components/ui/field';
import { paths } from '../../../config/paths';
import type { StatsFilter } from '../../../../../shared/api/impact';
import { useLanguage, useT } from '../../../lib/i18n';
import { queryString as qs } from '../../../lib/query-string';
import { exportUrl } from '../api/export-url';
import { useStats } from '../api/get-stats';
import { isoDate, linkButton, positiveInt } from './display';
import { Figures } from './figures';
import { EmbedPanel } from './embed-panel';
import { MethodSection } from './method-section';

const secondaryLink = `${linkButton} bg-white text-navy ring-1 ring-navy/25 hover:bg-navy/5`;

/** The dashboard's filter as the URL says it; a session only on a group's page. */
export const statsFilterOf = (params: URLSearchParams, groupId?: number): StatsFilter => ({
  groupId,
  eventId: groupId ? positiveInt(params.get('eventId')) : undefined,
  from: isoDate(params.get('from')),
  to: isoDate(params.get('to')),
});

/** The server refuses an end date before the start date; the page says so instead of asking. */
export const datesInOrder = (f: StatsFilter) => !(f.from && f.to && f.from > f.to);

/** The dashboard's filter lives in the URL, so a view can be bookmarked or sent to a colleague. */
function useUrlFilter(groupId?: number) {
  const [params, setParams] = useSearchParams();
  const { eventId, from, to } = statsFilterOf(params, groupId);
  const filter = useMemo<StatsFilter>(() => ({ groupId, eventId, from, to }), [groupId, eventId, from, to]);
  const set = (key: 'eventId' | 'from' | 'to', value: string) =>
    setParams(
      (prev) => {
        const next = new URLSearchParams(prev);
        if (value) next.set(key, value);
        else next.delete(key);
        return next;
      },
      { replace: true },
    );
  const clear = () => setParams(new URLSearchParams(), { replace: true });
  return { filter, set, clear };
}

/** A group's sessions for the filter, as the route reads them from the events feature. */
export interface SessionChoices {
  data?: { id: number; startsAt: string; title: string; timeZone: string }[];
  isPending: boolean;
  isError: boolean;
}

/** The figures with their filter, downloads and method; `sessions` only for a group's page. */
export function ImpactBody({
  groupId,
  groupName,
  sessions,
}: {
  groupId?: number;
  groupName?: string;
  sessions?: SessionChoices;
}) {
  const t = useT();
  const { filter, set, clear } = useUrlFilter(groupId);
  const rangeError = datesInOrder(filter) ? undefined : t('figures.filter.rangeError');
  const filtered = Boolean(filter.eventId || filter.from || filter.to);

  return (
    <div className="space-y-6">
      <section aria-label={t('figures.filter.label')} className="rounded-xl bg-white p-4 ring-1 ring-ink/5">
        <div className="grid grid-cols-2 items-end gap-3 sm:grid-cols-4">
          {sessions && <EventSelect events={sessions} value={filter.eventId} onChange={(v) => set('eventId', v)} />}
          <TextField
            label={t('figures.filter.from')}
            type="date"
            value={filter.from ?? ''}
            max={filter.to}
            onChange={(e) => set('from', e.target.value)}
          />
          <TextField
            label={t('figures.filter.to')}
            type="date"
            value={filter.to ?? ''}
            min={filter.from}
            onChange={(e) => set('to', e.target.value)}
            error={rangeError}
          />
          {filtered && (
            <div className="col-span-2 sm:col-span-1">
              <Button variant="quiet" onClick={clear} className="w-full sm:w-auto">
                {t('figures.filter.clear')}
              </Button>
            </div>
          )}
        </div>
      </section>

      <Actions filter={filter} groupId={groupId} groupName={groupName} />

      {rangeError ? (
        <Alert tone="error" title={t('figures.filter.checkDates')}>
          {rangeError} {t('figures.filter.changeOne')}
        </Alert>
      ) : (
        <FiguresFor filter={filter} filtered={filtered} />
      )}

      <MethodSection />
    </div>
  );
}

/** The figures the route's loader fetched for this filter, or what to do when there are none. */
function FiguresFor({ filter, filtered }: { filter: StatsFilter; filtered: boolean }) {
  const t = useT();
  const { data: stats } = useStats(filter);
  return stats.items === 0 ? (
    <EmptyState title={filtered ? t('figures.empty.filteredTitle') : t('figures.empty.title')} icon="▤">
      {filtered ? t('figures.empty.filtered') : t('figures.empty.text')}
    </EmptyState>
  ) : (
    <Figures stats={stats} filter={filter} />
  );
}

function EventSelect({
  events,
  value,
  onChange,
}: {
  events: SessionChoices;
  value?: number;
  onChange: (v: string) => void;
}) {
  const t = useT();
  const lang = useLanguage();
  const list = [...(events.data ?? [])].sort((a, b) => b.startsAt.localeCompare(a.startsAt));
  return (
    <div className="col-span-2">
      <SelectField
        label={t('figures.filter.session')}
        value={value ?? ''}
        onChange={(e) => onChange(e.target.value)}
        disabled={events.isPending}
        hint={events.isError ? t('figures.filter.sessionsFailed') : undefined}
      >
        <option value="">
          {events.isPending ? t('figures.filter.loadingSessions') : t('figures.filter.allSessions')}
        </option>
        {value !== undefined && !list.some((e) => e.id === value) && (
          <option value={value}>{t('figures.filter.sessionNumber', { id: value })}</option>
        )}
        {list.map((e) => (
          <option key={e.id} value={e.id}>
            {formatDay(e.startsAt, e.timeZone, lang)} · {e.title}
          </option>
        ))}
      </SelectField>
    </div>
  );
}

function Actions({ filter, groupId, groupName }: { filter: StatsFilter; groupId?: number; groupName?: string }) {
  const t = useT();
  const [embedOpen, setEmbedOpen] = useState(false);
  const panelId = useId();
  return (
    <div className="space-y-3">
      <div className="flex flex-wrap gap-2">
        {filter.from && filter.to && filter.from > filter.to ? (
          <p className="text-sm text-ink-soft">{t('figures.actions.correctDates')}</p>
        ) : (
          <>
            <a href={exportUrl('records', filter)} download className={secondaryLink}>
              {t('figures.actions.records')}
            </a>
            <a href={exportUrl('open-repair-data', filter)} download className={secondaryLink}>
              {t('figures.actions.ords')}
            </a>
            <a
              href={exportUrl('open-repair-data-unpowered', filter)}
              download
              className={secondaryLink}
              title={t('figures.actions.unpoweredTitle')}
            >
              {t('figures.actions.unpowered')}
            </a>
          </>
        )}
        {groupId !== undefined && (
          <>
            <Link
              to={
                filter.eventId
                  ? paths.report(filter.eventId)
                  : paths.groupReport(groupId, qs({ from: filter.from, to: filter.to }))
              }
              className={secondaryLink}
            >
              {t('figures.actions.report')}
            </Link>
            <Link to={paths.publicImpact(groupId)} className={secondaryLink}>
              {t('figures.actions.public')}
            </Link>
            <Link to={paths.groupImport(groupId)} className={secondaryLink}>
              {t('figures.actions.import')}
            </Link>
            <Button
              variant="secondary"
              aria-expanded={embedOpen}
              aria-controls={panelId}
              onClick={() => setEmbedOpen((v) => !v)}
            >
              {t('figures.actions.embed')}
            </Button>
          </>
        )}
      </div>
      {groupId !== undefined && embedOpen && <EmbedPanel id={panelId} groupId={groupId} groupName={groupName} />}
    </div>
  );
}
