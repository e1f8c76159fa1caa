import { useQuery } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { Area, AreaChart, ResponsiveContainer } from 'recharts';
import { paths } from '../../config/paths';
import { publicImpactQuery } from '../../features/impact/api/get-public-impact';
import { queryClient } from '../../lib/query-client';
import { monthLabel, oneDp, positiveInt, whole } from '../../features/impact/components/display';

/* The host page decides the frame; nothing of the app's own page background or scrolling may show inside it. */
const FRAME_CSS =
  'html, body { margin: 0; padding: 0; background: transparent !important; overflow: hidden; } #root { height: 100%; }';

/**
 * Warms the cache. The widget sits in another site's iframe, where the app's error page (its menu and links) would
 * be out of place: a failure is left to the widget's own quiet line, so it reads with `useQuery`, not suspense.
 */
export const loader = ({ request }: LoaderFunctionArgs) =>
  queryClient
    .ensureQueryData(publicImpactQuery(positiveInt(new URL(request.url).searchParams.get('group'))))
    .catch(() => null);

/**
 * The widget another website puts in an iframe of about 360×260: the group's headline figures and a sparkline,
 * with a link to the public page that explains the method.
 */
export function ImpactWidgetPage() {
  const [params] = useSearchParams();
  const groupId = positiveInt(params.get('group'));
  const impact = useQuery(publicImpactQuery(groupId));
  const d = impact.data;
  const name = d?.group ? d.group.name : 'All groups on Mendery';
  const months = (d?.byMonth ?? []).map((m) => ({ month: m.month, kg: Math.round(m.kgDiverted * 10) / 10 }));
  const methodLink = (
    <a
      href={paths.publicImpact(groupId)}
      target="_blank"
      rel="noopener"
      className="font-semibold text-navy underline decoration-navy/30 hover:decoration-navy"
    >
      Counted with Mendery · method<span className="sr-only"> (opens in a new tab)</span>
    </a>
  );

  return (
    <div className="box-border h-dvh max-h-dvh w-full overflow-hidden p-1 font-sans text-ink antialiased">
      <style>{FRAME_CSS}</style>
      <title>{`Repairs · ${name}`}</title>
      <article
        data-testid="impact-widget"
        className="box-border flex h-full max-h-[260px] flex-col overflow-hidden rounded-xl bg-white px-3.5 py-3 ring-1 ring-ink/10"
      >
        {impact.isPending ? (
          <p role="status" className="m-auto text-sm text-ink-soft">
            Loading the figures…
          </p>
        ) : !d ? (
          <div className="m-auto text-center text-sm">
            <p className="font-bold text-navy">The figures are not available just now.</p>
            <p className="mt-1">{methodLink}</p>
          </div>
        ) : (
          <>
            <header className="min-w-0">
              <h1 className="truncate text-base font-extrabold leading-tight text-navy" title={name}>
                {name}
              </h1>
              <p className="truncate text-xs text-ink-soft">
                Repairs at community sessions{d.group?.town ? ` in ${d.group.town}` : ''}
              </p>
            </header>

            <dl className="mt-2 grid grid-cols-3 gap-2">
              <Figure value={whole.format(d.fixed)} label="items fixed" testId="widget-fixed" />
              <Figure value={oneDp.format(d.kgDiverted)} label="kg diverted" testId="widget-kg" />
              <Figure
                value={oneDp.format(d.co2eKg)}
                label={
                  <>
                    kg CO<sub>2</sub>e avoided
                  </>
                }
                testId="widget-co2e"
              />
            </dl>

            <div className="mt-2 min-h-0 flex-1">
              {months.length > 1 ? (
                <figure>
                  <div aria-hidden className="h-[72px] w-full">
                    <ResponsiveContainer width="100%" height="100%">
                      <AreaChart
                        data={months}
                        margin={{ top: 2, right: 0, bottom: 0, left: 0 }}
                        accessibilityLayer={false}
                      >
                        <Area
                          type="monotone"
                          dataKey="kg"
                          stroke="#5d7f6a"
                          strokeWidth={2}
                          fill="#5d7f6a"
                          fillOpacity={0.2}
                          isAnimationActive={false}
                          dot={false}
                        />
                      </AreaChart>
                    </ResponsiveContainer>
                  </div>
                  <figcaption className="text-[11px] text-ink-soft">
                    kg by month, {monthLabel(months[0].month)}–{monthLabel(months[months.length - 1].month)}
                  </figcaption>
                </figure>
              ) : (
                <p className="text-xs text-ink-soft">
                  {d.items === 0
                    ? 'No repairs counted yet: come to a session!'
                    : `${whole.format(d.items)} items brought in so far.`}
                </p>
              )}
            </div>

            <footer className="mt-1.5 truncate text-xs">{methodLink}</footer>
          </>
        )}
      </article>
    </div>
  );
}

function Figure({ value, label, testId }: { value: string; label: ReactNode; testId: string }) {
  return (
    <div className="flex min-w-0 flex-col-reverse">
      <dt className="text-[11px] font-semibold leading-tight text-ink-soft">{label}</dt>
      <dd className="truncate text-xl font-extrabold leading-tight text-navy tabular-nums" data-testid={testId}>
        {value}
      </dd>
    </div>
  );
}
