import { type ReactNode } from 'react';
import { ResistorBands } from './resistor-bands';
import { ResistorCode } from './resistor-code';
import { ESeries } from './e-series';
import { MainsPeak } from './mains-peak';
import { Discharge } from './discharge';
import { Measure } from './measure';
import { Transistor } from './transistor';
import { DiodeTest } from './diode-test';
import { EarthLimit } from './earth-limit';
import { META, type CalculatorId } from './meta';
import { useT } from '../../../../lib/i18n';

const BODIES: Record<CalculatorId, () => ReactNode> = {
  'resistor-bands': ResistorBands,
  'resistor-code': ResistorCode,
  'e-series': ESeries,
  'mains-peak': MainsPeak,
  discharge: Discharge,
  measure: Measure,
  transistor: Transistor,
  'diode-test': DiodeTest,
  'earth-limit': EarthLimit,
};

/** One calculator's form, its cautions and its source. */
export function CalculatorBody({ id, compact = false }: { id: CalculatorId; compact?: boolean }) {
  const t = useT();
  const meta = META[id];
  const Body = BODIES[id];
  return (
    <div className={compact ? 'space-y-3' : 'space-y-4'}>
      <Body />
      <div className="rounded-lg border-l-4 border-copper bg-copper-light px-3 py-2 text-sm" role="note">
        <p className="font-bold">{t('bench.calc.cautions')}</p>
        <ul className="mt-1 list-disc space-y-1 pl-5">
          {meta.cautions.map((c) => (
            <li key={c}>{t(c)}</li>
          ))}
        </ul>
      </div>
      <p className="text-xs text-ink-soft">{t('bench.calc.source', { source: t(meta.source) })}</p>
    </div>
  );
}
