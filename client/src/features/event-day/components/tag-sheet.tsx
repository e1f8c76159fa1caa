import { useMemo, type CSSProperties } from 'react';
import { Link, useSearchParams } from 'react-router';
import { LABEL_LAYOUTS, layoutById, paginate, type LabelLayout } from '../../../../../shared/event-day/label-sheets';
import { formatTime, intlLocale } from '../../../../../shared/format';
import type { Language } from '../../../../../shared/i18n/languages';
import { Button } from '../../../components/ui/button';
import { Alert, EmptyState, Spinner } from '../../../components/ui/feedback';
import { paths } from '../../../config/paths';
import { useTagSheet, type TagSheetFilter } from '../api/get-tag-sheet';
import type { Tag } from '../api/types';
import { tr, trParts, useLanguage, useT } from '../../../lib/i18n';

const DEFAULT_LAYOUT = 'a4-24';

/** The printed page's size is the label stock's; nothing but the sheets prints. */
const pageCss = (layout: LabelLayout) =>
  `@page { size: ${mm(layout.page.width)} ${mm(layout.page.height)}; margin: 0 }
@media print { html, body { margin: 0; padding: 0; background: #fff !important; } }`;

/** Millimetres for CSS, without floating-point noise. */
const mm = (n: number) => `${Math.round(n * 1000) / 1000}mm`;

function positiveInt(raw: string | null): number | undefined {
  const n = Number(raw);
  return raw && Number.isInteger(n) && n > 0 ? n : undefined;
}

/** Sizes inside one label, from the stock: the QR code a bit larger on the roll, the code as large as fits. */
function labelMetrics(l: LabelLayout) {
  const roll = l.columns === 1 && l.rows === 1;
  const pad = roll ? 2 : 1.5;
  const gap = 1.5;
  const qr = Math.min(roll ? 26 : 24, l.label.height - 2 * pad - 4);
  const textWidth = l.label.width - 2 * pad - qr - gap;
  // Five monospace characters are about 3.2 em wide.
  const code = Math.min(10, Math.max(5, textWidth / 3.2));
  return { pad, gap, qr, code };
}

/** A label stock's name in the reader's language, its sizes written as the language writes numbers. */
function layoutName(l: LabelLayout, t: ReturnType<typeof useT>, lang: Language): string {
  const num = (n: number) => new Intl.NumberFormat(intlLocale(lang), { maximumFractionDigits: 1 }).format(n);
  const size = { width: num(l.label.width), height: num(l.label.height) };
  return l.columns * l.rows === 1
    ? t('desk.sheet.layoutRoll', size)
    : t('desk.sheet.layoutSheet', { ...size, count: l.columns * l.rows, columns: l.columns, rows: l.rows });
}

export /** The sheet's items from the address: a slot's (?slot=), some items (?items=1,2), or every tag of the event. */
function sheetFilterOf(slot: string | null, items: string | null): TagSheetFilter {
  const slotId = positiveInt(slot);
  if (slotId) return { slotId };
  return {
    items: (items ?? '')
      .split(',')
      .map((s) => Number(s.trim()))
      .filter((n) => Number.isInteger(n) && n > 0),
  };
}

/**
 * Printable intake tags for a slot, some items, or every checked-in item of the event. On screen: a toolbar and a
 * preview of each sheet at actual size; in print only the sheets, sized to the label stock in millimetres.
 */
export function TagSheet({ eventId }: { eventId: number }) {
  const t = useT();
  const lang = useLanguage();
  const [params, setParams] = useSearchParams();
  const slot = params.get('slot');
  const itemsParam = params.get('items');
  const filter = useMemo(() => sheetFilterOf(slot, itemsParam), [slot, itemsParam]);
  const layout = layoutById(params.get('layout') ?? DEFAULT_LAYOUT);
  const perSheet = layout.columns * layout.rows;
  const skip = Math.min(Math.max(0, Math.floor(Number(params.get('skip')) || 0)), perSheet - 1);
  const sheet = useTagSheet(eventId, filter);

  const setParam = (key: 'layout' | 'skip', value: string, fallback: string) =>
    setParams(
      (prev) => {
        const next = new URLSearchParams(prev);
        if (value === fallback) next.delete(key);
        else next.set(key, value);
        return next;
      },
      { replace: true },
    );

  const tags = sheet.data?.tags ?? [];
  const pages = paginate(tags, layout, skip);
  const metrics = labelMetrics(layout);

  return (
    <div className="min-h-dvh bg-neutral-300 text-ink print:min-h-0 print:bg-white">
      <title>{t('desk.sheet.pageTitle', { title: sheet.data?.event.title ?? 'Mendery' })}</title>
      <style>{pageCss(layout)}</style>

      <div className="sticky top-0 z-10 border-b border-ink/10 bg-white shadow-sm print:hidden">
        <div className="mx-auto flex max-w-5xl flex-wrap items-end gap-x-4 gap-y-3 px-4 py-3">
          <div className="w-full lg:w-auto lg:flex-1">
            <Link to={paths.deskEvent(eventId)} className="text-sm font-bold text-navy underline">
              ← {t('desk.sheet.back')}
            </Link>
            <h1 className="mt-1 text-xl">
              {t('desk.sheet.title')}
              {sheet.data ? ` · ${sheet.data.event.title}` : ''}
            </h1>
            {tags.length > 0 && (
              <p className="text-sm text-ink-soft">
                {t(perSheet === 1 ? 'desk.sheet.countLabels' : 'desk.sheet.countSheets', {
                  tags: tags.length,
                  pages: pages.length,
                })}
              </p>
            )}
          </div>
          <label className="text-sm font-semibold">
            {t('desk.sheet.stock')}
            <select
              value={layout.id}
              onChange={(e) => setParam('layout', e.target.value, DEFAULT_LAYOUT)}
              className="mt-1 block max-w-full rounded-lg border border-ink/20 px-3 py-2"
            >
              {LABEL_LAYOUTS.map((l) => (
                <option key={l.id} value={l.id}>
                  {layoutName(l, t, lang)}
                </option>
              ))}
            </select>
          </label>
          <label className="text-sm font-semibold">
            {t('desk.sheet.used')}
            <input
              type="number"
              min={0}
              max={perSheet - 1}
              step={1}
              value={skip}
              disabled={perSheet === 1}
              onChange={(e) =>
                setParam(
                  'skip',
                  String(Math.min(Math.max(0, Math.floor(Number(e.target.value)) || 0), perSheet - 1)),
                  '0',
                )
              }
              className="mt-1 block w-28 rounded-lg border border-ink/20 px-3 py-2 disabled:opacity-50"
              aria-describedby="skip-help"
            />
          </label>
          <Button onClick={() => window.print()} disabled={tags.length === 0}>
            {t('desk.sheet.print')}
          </Button>
          <p id="skip-help" className="w-full text-sm text-ink-soft">
            <span className="font-bold text-copper-dark">{t('desk.sheet.actualSize')}</span>{' '}
            {perSheet > 1 ? t('desk.sheet.usedHint') : t('desk.sheet.rollHint')}
          </p>
        </div>
      </div>

      {/* Sheets wider than a phone scroll sideways; the region takes the focus so arrow keys can scroll it. */}
      <div
        role="region"
        aria-label={t('desk.sheet.region')}
        tabIndex={0}
        className="overflow-x-auto px-4 py-6 print:overflow-visible print:p-0"
      >
        {sheet.isPending ? (
          <div className="mx-auto max-w-md rounded-xl bg-white px-6">
            <Spinner label={t('desk.sheet.preparing')} />
          </div>
        ) : sheet.isError ? (
          <div className="mx-auto max-w-xl">
            <Alert tone="error" title={t('desk.sheet.loadFailed')}>
              {tr(sheet.error.message)}
            </Alert>
          </div>
        ) : tags.length === 0 ? (
          <div className="mx-auto max-w-xl rounded-xl bg-white">
            <EmptyState title={t('desk.sheet.empty')} icon="▢">
              {trParts('desk.sheet.emptyBody', {
                desk: (
                  <Link to={paths.deskEvent(eventId)} className="font-bold text-navy underline">
                    {t('desk.sheet.emptyDesk')}
                  </Link>
                ),
              })}
            </EmptyState>
          </div>
        ) : (
          <div className="mx-auto w-max space-y-8 print:space-y-0">
            {pages.map((cells, p) => (
              <div key={p}>
                <p className="mb-1 text-xs font-semibold text-ink print:hidden">
                  {t(perSheet === 1 ? 'desk.sheet.labelOf' : 'desk.sheet.sheetOf', { n: p + 1, of: pages.length })}
                </p>
                <div
                  data-testid="tag-page"
                  aria-label={t(perSheet === 1 ? 'desk.sheet.labelOf' : 'desk.sheet.sheetOf', {
                    n: p + 1,
                    of: pages.length,
                  })}
                  className="bg-white shadow-lg print:shadow-none"
                  style={{
                    width: mm(layout.page.width),
                    height: mm(layout.page.height),
                    position: 'relative',
                    pageBreakAfter: 'always',
                    breakAfter: 'page',
                    overflow: 'hidden',
                  }}
                >
                  {cells.map((tag, i) => {
                    if (!tag) return null;
                    const col = i % layout.columns;
                    const row = Math.floor(i / layout.columns);
                    const style: CSSProperties = {
                      position: 'absolute',
                      left: mm(layout.left + col * (layout.label.width + layout.gapX)),
                      top: mm(layout.top + row * (layout.label.height + layout.gapY)),
                      width: mm(layout.label.width),
                      height: mm(layout.label.height),
                      padding: mm(metrics.pad),
                    };
                    return (
                      <TagLabel
                        key={tag.itemId}
                        tag={tag}
                        style={style}
                        metrics={metrics}
                        timeZone={sheet.data.event.timeZone}
                        lang={lang}
                      />
                    );
                  })}
                </div>
              </div>
            ))}
          </div>
        )}
      </div>
    </div>
  );
}

function TagLabel({
  tag,
  style,
  metrics,
  timeZone,
  lang,
}: {
  tag: Tag;
  style: CSSProperties;
  metrics: ReturnType<typeof labelMetrics>;
  timeZone: string;
  lang: Language;
}) {
  const t = useT();
  const line = 'overflow-hidden text-ellipsis whitespace-nowrap';
  return (
    <div
      data-testid="tag"
      style={style}
      className="flex flex-col overflow-hidden border border-dashed border-ink/35 bg-white text-black print:border-transparent"
    >
      <div className="flex min-h-0 flex-1 items-center" style={{ gap: mm(metrics.gap) }}>
        <div
          role="img"
          aria-label={t('desk.sheet.qr', { code: tag.tagCode })}
          className="shrink-0 [&_svg]:block [&_svg]:h-full [&_svg]:w-full"
          style={{ width: mm(metrics.qr), height: mm(metrics.qr) }}
          dangerouslySetInnerHTML={{ __html: tag.qrSvg }}
        />
        <div className="min-w-0 flex-1">
          <p
            className="font-mono font-bold"
            style={{ fontSize: mm(metrics.code), lineHeight: 1, letterSpacing: '0.02em' }}
          >
            {tag.tagCode}
          </p>
          <p className={`${line} font-extrabold`} style={{ fontSize: '11pt', lineHeight: 1.15, marginTop: '0.8mm' }}>
            {t('desk.queueNo', { number: tag.queueNumber ?? '—' })}
          </p>
          <p className={`${line} font-semibold`} style={{ fontSize: '8pt', lineHeight: 1.2 }}>
            {tag.categoryName}
          </p>
          <p className={line} style={{ fontSize: '8pt', lineHeight: 1.2 }}>
            {tag.visitor} · {formatTime(tag.slotStartsAt, timeZone, lang)}
          </p>
          {tag.benchName && (
            <p className={`${line} font-bold`} style={{ fontSize: '8pt', lineHeight: 1.2 }}>
              {tag.benchName}
            </p>
          )}
        </div>
      </div>
      {tag.mains && (
        <p className={`${line} font-bold`} style={{ fontSize: '6.5pt', lineHeight: 1.2, marginTop: '0.6mm' }}>
          ⚡ {t('desk.sheet.mains')}
        </p>
      )}
    </div>
  );
}
