import { useMemo, type CSSProperties } from 'react';
import { Link, useSearchParams } from 'react-router';
import { LABEL_LAYOUTS, layoutById, paginate, type LabelLayout } from '../../../../../shared/event-day/label-sheets';
import { formatTime } from '../../../../../shared/format';
import { Button } from '../../../components/ui/button';
import { Alert, EmptyState, Spinner } from '../../../components/ui/feedback';
import { paths } from '../../../config/paths';
import { useTagSheet, type TagSheetFilter } from '../api/get-tag-sheet';
import type { Tag } from '../api/types';

const DEFAULT_LAYOUT = 'a4-24';

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
      <title>{sheet.data ? `Tags · ${sheet.data.event.title}` : 'Tags · Mendery'}</title>
      <style>{`@page { size: ${mm(layout.page.width)} ${mm(layout.page.height)}; margin: 0 }
@media print { html, body { margin: 0; padding: 0; background: #fff !important; } }`}</style>

      <div className="sticky top-0 z-10 border-b border-ink/10 bg-white shadow-sm print:hidden">
        <div className="mx-auto flex max-w-5xl flex-wrap items-end gap-x-4 gap-y-3 px-4 py-3">
          <div className="w-full lg:w-auto lg:flex-1">
            <Link to={paths.deskEvent(eventId)} className="text-sm font-bold text-navy underline">
              ← Back to the desk
            </Link>
            <h1 className="mt-1 text-xl">Intake tags{sheet.data ? ` · ${sheet.data.event.title}` : ''}</h1>
            {tags.length > 0 && (
              <p className="text-sm text-ink-soft">
                {tags.length} tag{tags.length === 1 ? '' : 's'} on {pages.length} {perSheet === 1 ? 'label' : 'sheet'}
                {pages.length === 1 ? '' : 's'}
              </p>
            )}
          </div>
          <label className="text-sm font-semibold">
            Label stock
            <select
              value={layout.id}
              onChange={(e) => setParam('layout', e.target.value, DEFAULT_LAYOUT)}
              className="mt-1 block max-w-full rounded-lg border border-ink/20 px-3 py-2"
            >
              {LABEL_LAYOUTS.map((l) => (
                <option key={l.id} value={l.id}>
                  {l.name}
                </option>
              ))}
            </select>
          </label>
          <label className="text-sm font-semibold">
            Labels already used
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
            Print
          </Button>
          <p id="skip-help" className="w-full text-sm text-ink-soft">
            <span className="font-bold text-copper-dark">Print at 100 % (actual size), no scaling, margins none.</span>{' '}
            {perSheet > 1
              ? 'On a part-used sheet, give the number of labels already gone from the top left; printing starts after them.'
              : 'One tag per label on the roll.'}
          </p>
        </div>
      </div>

      {/* Sheets wider than a phone scroll sideways; the region takes the focus so arrow keys can scroll it. */}
      <div
        role="region"
        aria-label="Tags to print"
        tabIndex={0}
        className="overflow-x-auto px-4 py-6 print:overflow-visible print:p-0"
      >
        {sheet.isPending ? (
          <div className="mx-auto max-w-md rounded-xl bg-white px-6">
            <Spinner label="Preparing the tags…" />
          </div>
        ) : sheet.isError ? (
          <div className="mx-auto max-w-xl">
            <Alert tone="error" title="The tags could not be loaded">
              {sheet.error.message}
            </Alert>
          </div>
        ) : tags.length === 0 ? (
          <div className="mx-auto max-w-xl rounded-xl bg-white">
            <EmptyState title="No checked-in items to print yet" icon="▢">
              A tag is made when an item is checked in at the{' '}
              <Link to={paths.deskEvent(eventId)} className="font-bold text-navy underline">
                desk
              </Link>
              .
            </EmptyState>
          </div>
        ) : (
          <div className="mx-auto w-max space-y-8 print:space-y-0">
            {pages.map((cells, p) => (
              <div key={p}>
                <p className="mb-1 text-xs font-semibold text-ink print:hidden">
                  {perSheet === 1 ? 'Label' : 'Sheet'} {p + 1} of {pages.length}
                </p>
                <div
                  data-testid="tag-page"
                  aria-label={`${perSheet === 1 ? 'Label' : 'Sheet'} ${p + 1} of ${pages.length}`}
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
}: {
  tag: Tag;
  style: CSSProperties;
  metrics: ReturnType<typeof labelMetrics>;
  timeZone: string;
}) {
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
          aria-label={`QR code for tag ${tag.tagCode}`}
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
            {tag.queueNumber !== null ? `No. ${tag.queueNumber}` : 'No. —'}
          </p>
          <p className={`${line} font-semibold`} style={{ fontSize: '8pt', lineHeight: 1.2 }}>
            {tag.categoryName}
          </p>
          <p className={line} style={{ fontSize: '8pt', lineHeight: 1.2 }}>
            {tag.visitor} · {formatTime(tag.slotStartsAt, timeZone)}
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
          ⚡ mains — safety check before it goes home
        </p>
      )}
    </div>
  );
}
