import { useState } from 'react';
import {
  DC_THRESHOLDS,
  dischargeAdvice,
  type DischargeAdvice,
  RESIDUAL_60V_5S,
  timeConstantS,
  timeToVoltage,
  voltageAfter,
  type SafeVoltageThreshold,
} from '../../../../../../shared/calculators/capacitors';
import { parseOhms } from '../../../../../../shared/calculators/resistors';
import { SelectField, TextField } from '../../../../components/ui/field';
import { attempt, bad, ExampleButton, Examples, num, ohmsError, ohmsHint, Prompt, Result, useFormats } from './ui';
import { tr, useT } from '../../../../lib/i18n';
import { saidIn } from '../said';

/** A threshold's source in the reader's language; its first part (the standard) the same in every language. */
const sourceOf = (t: SafeVoltageThreshold) =>
  t.id === 'elv-dc' || t.id === 'elv-ac'
    ? tr('bench.calc.thresholdSource.elv')
    : tr('bench.calc.thresholdSource.secondary', { standard: t.source.split(',')[0] });

// ——— capacitor discharge ———

export function Discharge() {
  const t = useT();
  const { lang, fmt: show, ohms: formatOhms } = useFormats();
  const [f, setF] = useState({ uF: '', volts: '', ohms: '', seconds: '' });
  const [thresholdId, setThresholdId] = useState<SafeVoltageThreshold['id']>('plug-pins-34v');
  const threshold = DC_THRESHOLDS.find((d) => d.id === thresholdId) ?? DC_THRESHOLDS[DC_THRESHOLDS.length - 1];
  const uF = num(f.uF);
  const volts = num(f.volts);
  const ohms = parseOhms(f.ohms);
  const seconds = num(f.seconds);
  const invalid = [uF, volts, ohms, seconds].some((x) => Number.isNaN(x as number));
  const ready = uF !== undefined && volts !== undefined && !invalid;
  const c = (uF ?? 0) * 1e-6;
  const advice = ready
    ? attempt(() => dischargeAdvice({ voltageV: volts!, capacitanceF: c, resistanceOhm: ohms, threshold }))
    : null;
  const residual =
    ready && ohms !== undefined && seconds !== undefined ? attempt(() => voltageAfter(volts!, ohms, c, seconds)) : null;
  const field = (key: keyof typeof f, label: string, hint: string, ohmsField = false) => (
    <TextField
      label={label}
      inputMode="decimal"
      autoComplete="off"
      value={f[key]}
      onChange={(e) => setF((x) => ({ ...x, [key]: e.target.value }))}
      error={ohmsField ? ohmsError(f[key]) : bad(f[key]) ? t('bench.calc.enterNumber') : undefined}
      hint={hint}
    />
  );
  return (
    <>
      <div className="grid gap-3 sm:grid-cols-2">
        {field('uF', t('bench.calc.discharge.uF'), t('bench.calc.discharge.uFHint'))}
        {field('volts', t('bench.calc.discharge.volts'), t('bench.calc.discharge.voltsHint'))}
        {field('ohms', t('bench.calc.discharge.ohms'), ohmsHint(), true)}
        {field('seconds', t('bench.calc.discharge.seconds'), t('bench.calc.discharge.secondsHint'))}
      </div>
      <SelectField
        label={t('bench.calc.discharge.threshold')}
        value={thresholdId}
        onChange={(e) => setThresholdId(e.target.value as SafeVoltageThreshold['id'])}
        hint={sourceOf(threshold)}
      >
        {DC_THRESHOLDS.map((d) => (
          <option key={d.id} value={d.id}>
            {d.volts} V — {t(`bench.calc.threshold.${d.id}`)}
          </option>
        ))}
      </SelectField>
      <Result
        id="discharge"
        tone={!advice ? 'neutral' : !advice.ok ? 'bad' : advice.value.safeToTouch ? 'good' : 'bad'}
      >
        {!advice ? (
          <Prompt>{t(invalid ? 'bench.calc.fieldNotNumber' : 'bench.calc.discharge.prompt')}</Prompt>
        ) : !advice.ok ? (
          <p className="font-semibold">{saidIn(advice.error, lang)}</p>
        ) : (
          <div className="space-y-2 text-ink">
            <p className={`text-xl font-extrabold ${advice.value.safeToTouch ? 'text-navy' : 'text-alert'}`}>
              {t(advice.value.safeToTouch ? 'bench.calc.discharge.atOrBelow' : 'bench.calc.discharge.notSafe', {
                volts: threshold.volts,
              })}
            </p>
            <dl className="grid grid-cols-[1fr_auto] gap-x-4 gap-y-1 text-sm [&>dd]:whitespace-nowrap [&>dd]:text-right">
              <dt className="text-ink-soft">{t('bench.calc.discharge.energy')}</dt>
              <dd className="font-semibold">{show(advice.value.energyJ, 2)} J</dd>
              {ohms !== undefined && ohms > 0 && (
                <>
                  <dt className="text-ink-soft">{t('bench.calc.discharge.tau')}</dt>
                  <dd className="font-semibold">{show(timeConstantS(ohms, c), 4)} s</dd>
                </>
              )}
              {advice.value.waitS !== null && (
                <>
                  <dt className="text-ink-soft">{t('bench.calc.discharge.waitTo', { volts: threshold.volts })}</dt>
                  <dd className="font-semibold">{show(advice.value.waitS, 4)} s</dd>
                </>
              )}
              {advice.value.fiveTauS !== null && (
                <>
                  <dt className="text-ink-soft">{t('bench.calc.discharge.fiveTau')}</dt>
                  <dd className="font-semibold">
                    {show(advice.value.fiveTauS, 4)} s →{' '}
                    {show(voltageAfter(volts!, ohms!, c, advice.value.fiveTauS), 3)} V
                  </dd>
                </>
              )}
              {residual?.ok && (
                <>
                  <dt className="text-ink-soft">
                    {t('bench.calc.discharge.leftAfter', { seconds: show(seconds!, 6) })}
                  </dt>
                  <dd className="font-semibold">{show(residual.value, 3)} V</dd>
                </>
              )}
              <dt className="text-ink-soft">
                {t('bench.calc.discharge.largestR', { volts: threshold.volts, seconds: advice.value.maxOhmWithinS })}
              </dt>
              <dd className="font-semibold">
                {Number.isFinite(advice.value.maxOhm)
                  ? `${show(advice.value.maxOhm, 1)} Ω`
                  : t('bench.calc.discharge.any')}
              </dd>
              {ohms !== undefined &&
                ohms > 0 &&
                otherThresholds(threshold, volts!).map((d) => (
                  <FragmentRow
                    key={d.id}
                    label={t('bench.calc.discharge.timeTo', { volts: d.volts, source: d.source.split(',')[0] })}
                    value={`${show(timeToVoltage(volts!, d.volts, ohms, c), 4)} s`}
                  />
                ))}
            </dl>
            <ul className="list-disc space-y-1 pl-5 text-sm">
              {adviceLines(advice.value, volts!, ohms, show, formatOhms).map((m) => (
                <li key={m}>{m}</li>
              ))}
            </ul>
          </div>
        )}
      </Result>
      <Examples>
        <ExampleButton
          onClick={() => {
            setF({ uF: '100', volts: '325.269', ohms: '10k', seconds: '5' });
            setThresholdId('plug-pins-34v');
          }}
        >
          {t('bench.calc.example', { what: '100 µF, 325 V, 10 kΩ' })}
        </ExampleButton>
        <ExampleButton
          onClick={() => {
            setF({ uF: '470', volts: '325.269', ohms: '', seconds: '' });
            setThresholdId(RESIDUAL_60V_5S.id);
          }}
        >
          {t('bench.calc.discharge.example2')}
        </ExampleButton>
      </Examples>
    </>
  );
}

/**
 * The advice in the reader's language, line for line what dischargeAdvice writes in English (its `messages`), built
 * from its figures so each language puts them in its own place with its own decimal sign.
 */
function adviceLines(
  a: DischargeAdvice,
  volts: number,
  ohms: number | undefined,
  show: (x: number, dp?: number) => string,
  formatOhms: (x: number) => string,
): string[] {
  const limit = a.threshold.volts;
  const source = sourceOf(a.threshold);
  if (a.safeToTouch) return [tr('bench.calc.discharge.m.safe', { v: show(volts, 1), limit, source })];
  const lines = [tr('bench.calc.discharge.m.unsafe', { v: show(volts, 1), limit, source, energy: show(a.energyJ, 2) })];
  if (a.waitS !== null)
    lines.push(
      tr('bench.calc.discharge.m.wait', {
        r: formatOhms(ohms!),
        limit,
        wait: show(a.waitS, 2),
        fiveTau: show(a.fiveTauS!, 2),
      }),
    );
  else if (Number.isFinite(a.maxOhm))
    lines.push(tr('bench.calc.discharge.m.maxR', { r: show(a.maxOhm, 0), limit, seconds: a.maxOhmWithinS }));
  else lines.push(tr('bench.calc.discharge.m.anyR', { limit, seconds: a.maxOhmWithinS }));
  if (ohms !== undefined)
    lines.push(tr('bench.calc.discharge.m.rating', { w: show((volts * volts) / ohms, 2), v: show(volts, 0) }));
  return lines;
}

/** The other thresholds below the present voltage, one per voltage (IEC 60204-1 gives 60 V twice). */
const otherThresholds = (chosen: SafeVoltageThreshold, volts: number) =>
  DC_THRESHOLDS.filter(
    (t, i) => t.volts < volts && t.volts !== chosen.volts && DC_THRESHOLDS.findIndex((u) => u.volts === t.volts) === i,
  );

function FragmentRow({ label, value }: { label: string; value: string }) {
  return (
    <>
      <dt className="text-ink-soft">{label}</dt>
      <dd className="font-semibold">{value}</dd>
    </>
  );
}
