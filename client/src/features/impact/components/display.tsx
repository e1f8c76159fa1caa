import { useId, type ReactNode } from 'react';
import { intlLocale } from '../../../../../shared/format';
import type { Language } from '../../../../../shared/i18n/languages';
import { Card } from '../../../components/ui/feedback';
import { useLanguage, useT } from '../../../lib/i18n';
import type { Method } from '../api/types';

/** Number and month formats, colours and the chart frame shared by the impact pages. */
export const whole = new Intl.NumberFormat('en-GB');
export const oneDp = new Intl.NumberFormat('en-GB', { minimumFractionDigits: 1, maximumFractionDigits: 1 });
export const percent = (rate: number | null) => (rate === null ? '—' : `${Math.round(rate * 100)}%`);
const monthFormat = new Intl.DateTimeFormat('en-GB', { month: 'short', year: 'numeric', timeZone: 'UTC' });
const longMonthFormat = new Intl.DateTimeFormat('en-GB', { month: 'long', year: 'numeric', timeZone: 'UTC' });
export const monthLabel = (m: string) => monthFormat.format(new Date(`${m}-01T00:00:00Z`));
export const longMonth = (m: string) => longMonthFormat.format(new Date(`${m}-01T00:00:00Z`));

/** The same formats in a reader's language, made once per language. */
export interface Formats {
  whole: Intl.NumberFormat;
  oneDp: Intl.NumberFormat;
  percent: (rate: number | null) => string;
  monthLabel: (m: string) => string;
  longMonth: (m: string) => string;
}
const formatsByLanguage = new Map<Language, Formats>();
export function formatsFor(lang: Language): Formats {
  let f = formatsByLanguage.get(lang);
  if (!f) {
    const locale = intlLocale(lang);
    const pct = new Intl.NumberFormat(locale, { style: 'percent', maximumFractionDigits: 0 });
    const short = new Intl.DateTimeFormat(locale, { month: 'short', year: 'numeric', timeZone: 'UTC' });
    const long = new Intl.DateTimeFormat(locale, { month: 'long', year: 'numeric', timeZone: 'UTC' });
    f = {
      whole: new Intl.NumberFormat(locale),
      oneDp: new Intl.NumberFormat(locale, { minimumFractionDigits: 1, maximumFractionDigits: 1 }),
      percent: (rate) => (rate === null ? '—' : pct.format(rate)),
      monthLabel: (m) => short.format(new Date(`${m}-01T00:00:00Z`)),
      longMonth: (m) => long.format(new Date(`${m}-01T00:00:00Z`)),
    };
    formatsByLanguage.set(lang, f);
  }
  return f;
}
/** The impact formats in the active language, kept current. */
export const useFormats = (): Formats => formatsFor(useLanguage());

export const COLOURS = {
  fixed: '#5d7f6a',
  partsNeeded: '#b8612f',
  advice: '#23395d',
  endOfLife: '#8d949c',
  grid: '#e7e2da',
};
/** A chemical formula, the same in every language. */
const CO = 'CO';
export const CO2E = (
  <>
    {CO}
    <sub>2</sub>e
  </>
);
export const linkButton =
  'inline-flex min-h-11 items-center justify-center gap-2 rounded-lg px-4 py-2 font-bold transition';

/** A whole number above 0 from the URL, else nothing. */
export function positiveInt(raw: string | null): number | undefined {
  const n = Number(raw);
  return raw && Number.isInteger(n) && n > 0 ? n : undefined;
}
export const isoDate = (raw: string | null) => (raw && /^\d{4}-\d{2}-\d{2}$/.test(raw) ? raw : undefined);

/**
 * A chart with its heading and a sentence that says what it shows; the drawing itself is hidden from screen
 * readers, which get the same figures (with their links) in the table under it.
 */
export function ChartCard({
  title,
  summary,
  table,
  children,
  level = 'h3',
}: {
  title: string;
  summary: string;
  table: ReactNode;
  children: ReactNode;
  level?: 'h2' | 'h3';
}) {
  const headingId = useId();
  const t = useT();
  const Heading = level;
  return (
    <Card className="min-w-0 p-4 sm:p-5">
      <section aria-labelledby={headingId}>
        <Heading id={headingId} className="text-lg">
          {title}
        </Heading>
        <p className="mb-2 text-sm text-ink-soft">{summary}</p>
        {children && (
          // The summary and the table say what the chart shows; inert keeps its parts out of the Tab order.
          <div aria-hidden inert className="h-[260px] w-full min-w-0">
            {children}
          </div>
        )}
        {table && (
          <details className="mt-2 text-sm">
            <summary className="min-h-11 cursor-pointer py-2 font-bold text-navy">{t('figures.asTable')}</summary>
            <div className="overflow-x-auto">{table}</div>
          </details>
        )}
      </section>
    </Card>
  );
}

/** The weight and emission factor of each kind of item, with their sources. */
export function FactorTable({ categories }: { categories: Method['categories'] }) {
  const t = useT();
  const { oneDp } = useFormats();
  return (
    <table className="w-full min-w-[40rem] text-sm">
      <thead>
        <tr className="border-b border-ink/10 text-left text-ink-soft">
          <th scope="col" className="py-1 pr-3 font-semibold">
            {t('figures.factors.kind')}
          </th>
          <th scope="col" className="py-1 pr-3 text-right font-semibold">
            {t('figures.factors.weight')}
          </th>
          <th scope="col" className="py-1 pr-3 font-semibold">
            {t('figures.factors.weightSource')}
          </th>
          <th scope="col" className="py-1 pr-3 text-right font-semibold">
            {t('figures.factors.co2ePerKg')}
          </th>
          <th scope="col" className="py-1 pr-3 font-semibold">
            {t('figures.factors.factorSource')}
          </th>
        </tr>
      </thead>
      <tbody className="divide-y divide-ink/5 align-top">
        {categories.map((c) => (
          <tr key={c.id}>
            <th scope="row" className="py-1 pr-3 text-left font-semibold">
              {c.name}
            </th>
            <td className="py-1 pr-3 text-right tabular-nums">{oneDp.format(c.avgWeightKg)}</td>
            <td className="py-1 pr-3">{c.weightSource}</td>
            <td className="py-1 pr-3 text-right tabular-nums">
              {c.co2ePerKg === null ? '—' : oneDp.format(c.co2ePerKg)}
            </td>
            <td className="py-1 pr-3">{c.co2eSource ?? t('figures.factors.none')}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
