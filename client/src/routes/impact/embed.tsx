import { useQuery } from '@tanstack/react-query';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { paths } from '../../config/paths';
import { publicImpactQuery } from '../../features/impact/api/get-public-impact';
import { queryClient } from '../../lib/query-client';
import { CO2E, positiveInt } from '../../features/impact/components/display';
import { trParts, useLanguage, useT } from '../../lib/i18n';
import { Quilt } from '../../features/impact/components/impact-story';

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
 * The piece another website puts in an iframe of about 360×260: the group's figures in a sentence and its quilt of
 * outcomes, with a link to the public page that explains the method.
 */
export function ImpactWidgetPage() {
  const [params] = useSearchParams();
  const groupId = positiveInt(params.get('group'));
  const impact = useQuery(publicImpactQuery(groupId));
  const t = useT();
  const lang = useLanguage();
  const whole = new Intl.NumberFormat(lang);
  const oneDp = new Intl.NumberFormat(lang, { minimumFractionDigits: 1, maximumFractionDigits: 1 });
  const d = impact.data;
  const name = d?.group ? d.group.name : t('impact.widget.allGroups');
  const methodLink = (
    <a
      href={paths.publicImpact(groupId)}
      target="_blank"
      rel="noopener"
      className="font-semibold text-navy underline decoration-navy/30 hover:decoration-navy"
    >
      {t('impact.widget.method')}
      <span className="sr-only">{t('impact.widget.newTab')}</span>
    </a>
  );

  return (
    <div className="box-border h-dvh max-h-dvh w-full overflow-hidden p-1 font-sans text-ink antialiased">
      <style>{FRAME_CSS}</style>
      <title>{t('impact.widget.title', { name })}</title>
      <article
        data-testid="impact-widget"
        className="box-border flex h-full max-h-[260px] flex-col overflow-hidden rounded-xl bg-white px-3.5 py-3 ring-1 ring-ink/10"
      >
        {impact.isPending ? (
          <p role="status" className="m-auto text-sm text-ink-soft">
            {t('impact.widget.loading')}
          </p>
        ) : !d ? (
          <div className="m-auto text-center text-sm">
            <p className="font-bold text-navy">{t('impact.widget.unavailable')}</p>
            <p className="mt-1">{methodLink}</p>
          </div>
        ) : (
          <>
            <header className="min-w-0">
              <h1 className="truncate text-base font-extrabold leading-tight text-navy" title={name}>
                {name}
              </h1>
              <p className="truncate text-xs text-ink-soft">
                {d.group?.town ? t('impact.widget.leadIn', { town: d.group.town }) : t('impact.widget.lead')}
              </p>
            </header>

            <p className="mt-2 text-[15px] leading-snug">
              {trParts(
                'impact.widget.sentence',
                {
                  fixed: <Figure value={whole.format(d.fixed)} testId="widget-fixed" />,
                  kg: <Figure value={oneDp.format(d.kgDiverted)} testId="widget-kg" />,
                  co2e: <Figure value={oneDp.format(d.co2eKg)} testId="widget-co2e" />,
                  co2eUnit: CO2E,
                },
                { count: d.fixed },
              )}
            </p>

            <div className="mt-2 min-h-0 flex-1">
              {d.items > 0 ? (
                <figure className="flex items-center gap-3">
                  <Quilt d={d} columns={5} className="h-[76px] w-auto shrink-0" />
                  <figcaption className="text-xs leading-snug text-ink-soft">
                    {t('impact.widget.quilt', { items: whole.format(d.items) })}
                  </figcaption>
                </figure>
              ) : (
                <p className="text-xs text-ink-soft">{t('impact.widget.empty')}</p>
              )}
            </div>

            <footer className="mt-1.5 truncate text-xs">{methodLink}</footer>
          </>
        )}
      </article>
    </div>
  );
}

function Figure({ value, testId }: { value: string; testId: string }) {
  return (
    <strong className="font-extrabold text-navy tabular-nums" data-testid={testId}>
      {value}
    </strong>
  );
}
