import type { Outcome } from '../../../../../shared/event-day/constants';
import { patchesOf } from '../../../../../shared/impact/patches';
import type { PublicImpact } from '../api/types';
import { trParts, useT } from '../../../lib/i18n';
import { CO2E, COLOURS, useFormats } from './display';

const PATCHES = 20;

/** The catalog key of each outcome's name on the impact pages. */
export const OUTCOME_KEYS: Record<Outcome, string> = {
  fixed: 'figures.outcome.fixed',
  'parts-needed': 'figures.outcome.partsNeeded',
  advice: 'figures.outcome.advice',
  'end-of-life': 'figures.outcome.endOfLife',
};

/** The four outcomes of the items, in the quilt's order: mended patches first. */
export function outcomeShares(d: Pick<PublicImpact, 'fixed' | 'partsNeeded' | 'advice' | 'endOfLife'>) {
  const parts: { outcome: Outcome; count: number; colour: string }[] = [
    { outcome: 'fixed', count: d.fixed, colour: COLOURS.fixed },
    { outcome: 'parts-needed', count: d.partsNeeded, colour: COLOURS.partsNeeded },
    { outcome: 'advice', count: d.advice, colour: COLOURS.advice },
    { outcome: 'end-of-life', count: d.endOfLife, colour: COLOURS.endOfLife },
  ];
  const patches = patchesOf(
    parts.map((p) => p.count),
    PATCHES,
  );
  const known = parts.reduce((n, p) => n + p.count, 0);
  return { known, parts: parts.map((p, i) => ({ ...p, patches: patches[i], labelKey: OUTCOME_KEYS[p.outcome] })) };
}

/**
 * A quilt of twenty patches, one for each twentieth of the items with an outcome; the mended ones carry a stitched
 * seam. A picture only: the same figures are in words beside it.
 */
export function Quilt({ d, columns = 10, className }: { d: PublicImpact; columns?: number; className?: string }) {
  const { parts } = outcomeShares(d);
  const colours = parts.flatMap((p) => Array.from({ length: p.patches }, () => ({ colour: p.colour, p })));
  const size = 28;
  const gap = 4;
  const rows = Math.ceil(PATCHES / columns);
  return (
    <svg
      aria-hidden="true"
      focusable="false"
      viewBox={`0 0 ${columns * (size + gap) - gap} ${rows * (size + gap) - gap}`}
      className={className}
    >
      {colours.map(({ colour, p }, i) => {
        const x = (i % columns) * (size + gap);
        const y = Math.floor(i / columns) * (size + gap);
        return (
          <g key={i}>
            <rect x={x} y={y} width={size} height={size} rx={5} fill={colour} />
            {p.outcome === 'fixed' && (
              <rect
                x={x + 4}
                y={y + 4}
                width={size - 8}
                height={size - 8}
                rx={3}
                fill="none"
                stroke="#fff"
                strokeWidth={1.5}
                strokeDasharray="3 2.5"
              />
            )}
          </g>
        );
      })}
    </svg>
  );
}

/** Small pictures of our own beside the sentences: a mended bag, a bin, a leaf. */
function Picture({ kind }: { kind: 'bag' | 'bin' | 'leaf' }) {
  return (
    <svg aria-hidden="true" focusable="false" viewBox="0 0 32 32" className="mt-1 size-8 shrink-0">
      <circle cx="16" cy="16" r="16" fill={kind === 'bag' ? '#f3dcc8' : '#dfeadf'} />
      {kind === 'bag' && (
        <g fill="none" stroke="#954c22" strokeWidth="2" strokeLinecap="round" strokeLinejoin="round">
          <path d="M9 13h14l-1.5 11h-11z" />
          <path d="M12.5 13a3.5 3.5 0 0 1 7 0" />
          <path d="M13 18.5l6 1.5" strokeDasharray="1.6 1.6" />
        </g>
      )}
      {kind === 'bin' && (
        <g fill="none" stroke="#3f5a49" strokeWidth="2" strokeLinecap="round" strokeLinejoin="round">
          <path d="M10 11h12M13.5 11V9h5v2M11.5 11l1 13h7l1-13" />
          <path d="M9 9l14 16" stroke="#954c22" />
        </g>
      )}
      {kind === 'leaf' && (
        <g fill="none" stroke="#3f5a49" strokeWidth="2" strokeLinecap="round" strokeLinejoin="round">
          <path d="M9 23c0-8 5-13 14-14 0 9-5 14-14 14z" />
          <path d="M9 23l8-8" />
        </g>
      )}
    </svg>
  );
}

/**
 * The public page's opening: what happened, told in sentences with the figures in them, and the quilt of outcomes
 * with its key in words.
 */
export function ImpactStory({ d }: { d: PublicImpact }) {
  const t = useT();
  const { whole, oneDp, percent } = useFormats();
  const { known, parts } = outcomeShares(d);
  const share = (n: number) => percent(n / known);
  const fig = (testId: string, value: string) => (
    <strong className="font-extrabold text-navy tabular-nums" data-testid={testId}>
      {value}
    </strong>
  );
  return (
    <section
      aria-labelledby="story-heading"
      className="grid items-start gap-6 rounded-2xl bg-white p-5 shadow-sm ring-1 ring-ink/5 sm:p-7 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]"
    >
      <div className="space-y-4">
        <h2 id="story-heading" className="text-sm font-bold tracking-wide text-copper-dark uppercase">
          {t('figures.story.heading')}
        </h2>
        <p className="flex gap-3 text-xl leading-relaxed sm:text-2xl">
          <Picture kind="bag" />
          <span>
            {trParts(
              'figures.story.brought',
              {
                events: fig('stat-events', whole.format(d.events)),
                items: fig('stat-items', whole.format(d.items)),
                fixed: fig('stat-fixed', whole.format(d.fixed)),
              },
              { n: d.events, nItems: d.items, nFixed: d.fixed },
            )}
          </span>
        </p>
        <p className="flex gap-3 text-lg leading-relaxed">
          <Picture kind="bin" />
          <span>{trParts('figures.story.kg', { kg: fig('stat-kgDiverted', oneDp.format(d.kgDiverted)) })}</span>
        </p>
        <p className="flex gap-3 text-lg leading-relaxed">
          <Picture kind="leaf" />
          <span>{trParts('figures.story.co2e', { kg: fig('stat-co2eKg', oneDp.format(d.co2eKg)), co2e: CO2E })}</span>
        </p>
      </div>
      {known > 0 && (
        <figure className="space-y-3" aria-labelledby="quilt-caption">
          <Quilt d={d} className="w-full max-w-sm" />
          <figcaption id="quilt-caption" className="text-sm text-ink-soft">
            {t('figures.story.quilt', { n: known, count: whole.format(known) })}
          </figcaption>
          <ul className="grid gap-1 text-sm sm:grid-cols-2">
            {parts
              .filter((p) => p.count > 0)
              .map((p) => (
                <li key={p.outcome} className="flex items-center gap-2" data-testid={`story-${p.outcome}`}>
                  <span aria-hidden="true" className="size-3 shrink-0 rounded-sm" style={{ background: p.colour }} />
                  <span>
                    {trParts(
                      'figures.story.share',
                      { count: <b className="tabular-nums">{whole.format(p.count)}</b> },
                      { outcome: t(p.labelKey), share: share(p.count) },
                    )}
                  </span>
                </li>
              ))}
          </ul>
        </figure>
      )}
    </section>
  );
}
