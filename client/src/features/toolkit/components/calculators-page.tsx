import { useEffect, useState } from 'react';
import { Link, useLocation, useSearchParams } from 'react-router';
import { Card, PageTitle } from '../../../components/ui/feedback';
import { paths } from '../../../config/paths';
import { CalculatorBody } from './calculators/calculator-body';
import { isCalculatorId, ORDER, type CalculatorId } from './calculators/meta';
import { trParts, useT } from '../../../lib/i18n';

/** /toolkit/calculators: every bench calculator as a card; ?open=<id> or #<id> opens one and scrolls to it. */
export function Calculators() {
  const t = useT();
  const [params] = useSearchParams();
  const { hash, key } = useLocation();
  const fromHash = decodeURIComponent(hash.slice(1));
  // The hash wins: a chip link changes the hash even if an old ?open= stays in the address.
  const target = [fromHash, params.get('open')].find(isCalculatorId) ?? null;
  const [open, setOpen] = useState<Set<CalculatorId>>(() => new Set(target ? [target] : []));

  // Each navigation (a chip, a link from an item page) opens its calculator and brings it into view.
  useEffect(() => {
    if (!target) return;
    setOpen((s) => (s.has(target) ? s : new Set(s).add(target)));
    const frame = requestAnimationFrame(() => {
      const el = document.getElementById(target);
      el?.scrollIntoView({ block: 'start' });
      el?.querySelector<HTMLButtonElement>('[aria-expanded]')?.focus({ preventScroll: true });
    });
    return () => cancelAnimationFrame(frame);
  }, [target, key]);

  const toggle = (id: CalculatorId) =>
    setOpen((s) => {
      const next = new Set(s);
      if (next.has(id)) next.delete(id);
      else next.add(id);
      return next;
    });

  return (
    <div className="mx-auto max-w-3xl">
      <PageTitle
        title={t('bench.tool.calculators')}
        lead={
          <>
            {trParts('bench.calc.lead', {
              link: (
                <Link to={paths.safety()} className="underline">
                  {t('bench.calc.leadLink')}
                </Link>
              ),
            })}
          </>
        }
      />
      {/* On a phone the cards below are the list; a row of chips would run off the screen. */}
      <nav aria-label={t('bench.page.calculators')} className="mb-5 hidden sm:block">
        <ul className="-mx-4 flex gap-2 overflow-x-auto px-4 pb-2 sm:mx-0 sm:flex-wrap sm:overflow-visible sm:px-0">
          {ORDER.map((id) => (
            <li key={id} className="shrink-0">
              <Link
                to={{ hash: id }}
                className="inline-flex min-h-11 items-center rounded-lg bg-white px-3 text-sm font-semibold text-navy ring-1 ring-navy/25 hover:bg-navy/5"
              >
                {t(`bench.tool.link.${id}`)}
              </Link>
            </li>
          ))}
        </ul>
      </nav>
      <div className="space-y-3">
        {ORDER.map((id) => {
          const isOpen = open.has(id);
          return (
            <div key={id} id={id} data-testid={`calc-${id}`} className="scroll-mt-4">
              <Card flush>
                <h2 className="text-lg">
                  <button
                    type="button"
                    aria-expanded={isOpen}
                    aria-controls={`${id}-body`}
                    onClick={() => toggle(id)}
                    className="flex min-h-14 w-full items-center justify-between gap-3 rounded-xl px-5 py-3 text-left"
                  >
                    <span>
                      <span className="block">{t(`bench.tool.link.${id}`)}</span>
                      <span className="block text-sm font-normal text-ink-soft">{t(`bench.calc.${id}.summary`)}</span>
                    </span>
                    <span
                      aria-hidden
                      className={`text-2xl text-copper transition-transform ${isOpen ? 'rotate-90' : ''}`}
                    >
                      ›
                    </span>
                  </button>
                </h2>
                <div id={`${id}-body`} hidden={!isOpen} className="border-t border-ink/10 px-5 pb-5 pt-4">
                  <CalculatorBody id={id} />
                </div>
              </Card>
            </div>
          );
        })}
      </div>
    </div>
  );
}
