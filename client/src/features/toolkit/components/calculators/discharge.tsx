import { useState } from 'react';
import {
  DC_THRESHOLDS,
  dischargeAdvice,
  RESIDUAL_60V_5S,
  timeConstantS,
  timeToVoltage,
  voltageAfter,
  type SafeVoltageThreshold,
} from '../../../../../../shared/calculators/capacitors';
import { parseOhms } from '../../../../../../shared/calculators/resistors';
import { SelectField, TextField } from '../../../../components/ui/field';
import { attempt, bad, ExampleButton, Examples, num, OHMS_HINT, ohmsError, Prompt, Result, show } from './ui';

// ——— capacitor discharge ———

export function Discharge() {
  const [f, setF] = useState({ uF: '', volts: '', ohms: '', seconds: '' });
  const [thresholdId, setThresholdId] = useState<SafeVoltageThreshold['id']>('plug-pins-34v');
  const threshold = DC_THRESHOLDS.find((t) => t.id === thresholdId) ?? DC_THRESHOLDS[DC_THRESHOLDS.length - 1];
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
      error={ohmsField ? ohmsError(f[key]) : bad(f[key]) ? 'Enter a number.' : undefined}
      hint={hint}
    />
  );
  return (
    <>
      <div className="grid gap-3 sm:grid-cols-2">
        {field('uF', 'Capacitance (µF)', 'Printed on the can, e.g. 100.')}
        {field('volts', 'Voltage on it now (V)', 'Measured, or the mains peak: 325 V for 230 V.')}
        {field('ohms', 'Discharge resistor (Ω, optional)', OHMS_HINT, true)}
        {field('seconds', 'After how long? (s, optional)', 'Gives the voltage left after this time.')}
      </div>
      <SelectField
        label="Threshold"
        value={thresholdId}
        onChange={(e) => setThresholdId(e.target.value as SafeVoltageThreshold['id'])}
        hint={threshold.source}
      >
        {DC_THRESHOLDS.map((t) => (
          <option key={t.id} value={t.id}>
            {t.volts} V — {t.label}
          </option>
        ))}
      </SelectField>
      <Result
        id="discharge"
        tone={!advice ? 'neutral' : !advice.ok ? 'bad' : advice.value.safeToTouch ? 'good' : 'bad'}
      >
        {!advice ? (
          <Prompt>
            {invalid
              ? 'A field is not a number; correct it to see the result.'
              : 'Enter the capacitance and the voltage.'}
          </Prompt>
        ) : !advice.ok ? (
          <p className="font-semibold">{advice.error}</p>
        ) : (
          <div className="space-y-2 text-ink">
            <p className={`text-xl font-extrabold ${advice.value.safeToTouch ? 'text-navy' : 'text-alert'}`}>
              {advice.value.safeToTouch
                ? `At or below ${threshold.volts} V — measure again before touching`
                : `Not safe to touch: above ${threshold.volts} V`}
            </p>
            <dl className="grid grid-cols-[1fr_auto] gap-x-4 gap-y-1 text-sm [&>dd]:whitespace-nowrap [&>dd]:text-right">
              <dt className="text-ink-soft">Stored energy</dt>
              <dd className="font-semibold">{show(advice.value.energyJ, 2)} J</dd>
              {ohms !== undefined && ohms > 0 && (
                <>
                  <dt className="text-ink-soft">Time constant τ = RC</dt>
                  <dd className="font-semibold">{show(timeConstantS(ohms, c), 4)} s</dd>
                </>
              )}
              {advice.value.waitS !== null && (
                <>
                  <dt className="text-ink-soft">Wait to {threshold.volts} V</dt>
                  <dd className="font-semibold">{show(advice.value.waitS, 4)} s</dd>
                </>
              )}
              {advice.value.fiveTauS !== null && (
                <>
                  <dt className="text-ink-soft">5τ (under 1 % left)</dt>
                  <dd className="font-semibold">
                    {show(advice.value.fiveTauS, 4)} s →{' '}
                    {show(voltageAfter(volts!, ohms!, c, advice.value.fiveTauS), 3)} V
                  </dd>
                </>
              )}
              {residual?.ok && (
                <>
                  <dt className="text-ink-soft">Left after {seconds} s</dt>
                  <dd className="font-semibold">{show(residual.value, 3)} V</dd>
                </>
              )}
              <dt className="text-ink-soft">
                Largest R for {threshold.volts} V within {advice.value.maxOhmWithinS} s
              </dt>
              <dd className="font-semibold">
                {Number.isFinite(advice.value.maxOhm) ? `${show(advice.value.maxOhm, 1)} Ω` : 'any'}
              </dd>
              {ohms !== undefined &&
                ohms > 0 &&
                otherThresholds(threshold, volts!).map((t) => (
                  <FragmentRow
                    key={t.id}
                    label={`Time to ${t.volts} V (${t.source.split(',')[0]})`}
                    value={`${show(timeToVoltage(volts!, t.volts, ohms, c), 4)} s`}
                  />
                ))}
            </dl>
            <ul className="list-disc space-y-1 pl-5 text-sm">
              {advice.value.messages.map((m) => (
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
          Worked example: 100 µF, 325 V, 10 kΩ
        </ExampleButton>
        <ExampleButton
          onClick={() => {
            setF({ uF: '470', volts: '325.269', ohms: '', seconds: '' });
            setThresholdId(RESIDUAL_60V_5S.id);
          }}
        >
          470 µF to 60 V within 5 s
        </ExampleButton>
      </Examples>
    </>
  );
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
