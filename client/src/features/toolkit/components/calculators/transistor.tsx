import { useId, useState } from 'react';
import {
  checkSubstitution,
  PACKAGES,
  TRANSISTOR_TYPES,
  type TransistorSpec,
  type TransistorType,
} from '../../../../../../shared/calculators/transistors';
import { SelectField, TextField } from '../../../../components/ui/field';
import { attempt, bad, Big, ExampleButton, Examples, num, Prompt, Result } from './ui';

// ——— transistor substitute ———

interface SpecDraft {
  type: TransistorType;
  v: string;
  i: string;
  p: string;
  pkg: string;
  pinout: string;
  hfe: string;
  ft: string;
  vgs: string;
}
const EMPTY_SPEC: SpecDraft = { type: 'NPN', v: '', i: '', p: '', pkg: '', pinout: '', hfe: '', ft: '', vgs: '' };
const isBipolar = (t: TransistorType) => t === 'NPN' || t === 'PNP';

/** A spec from the form, or null while a required field is empty or a field is not a number. */
function toSpec(d: SpecDraft): TransistorSpec | null {
  const required = [num(d.v), num(d.i), num(d.p)];
  const optional = [num(d.hfe), num(d.ft), num(d.vgs)];
  if (
    required.some((x) => x === undefined || Number.isNaN(x)) ||
    optional.some((x) => Number.isNaN(x as number)) ||
    !d.pkg.trim()
  )
    return null;
  const bipolar = isBipolar(d.type);
  return {
    type: d.type,
    vMaxV: required[0]!,
    iMaxA: required[1]!,
    ptotW: required[2]!,
    package: d.pkg,
    pinout: d.pinout.trim() || undefined,
    hfeMin: bipolar ? optional[0] : undefined,
    ftMHz: bipolar ? optional[1] : undefined,
    vgsThMaxV: bipolar ? undefined : optional[2],
  };
}

function SpecFields({
  legend,
  draft,
  onChange,
  packagesId,
}: {
  legend: string;
  draft: SpecDraft;
  onChange: (d: SpecDraft) => void;
  packagesId: string;
}) {
  const bipolar = isBipolar(draft.type);
  const text = (key: Exclude<keyof SpecDraft, 'type'>, label: string, hint?: string, decimal = true) => (
    <TextField
      label={label}
      inputMode={decimal ? 'decimal' : undefined}
      autoComplete="off"
      value={draft[key]}
      onChange={(e) => onChange({ ...draft, [key]: e.target.value })}
      error={decimal && bad(draft[key]) ? 'Enter a number.' : undefined}
      hint={hint}
    />
  );
  return (
    <fieldset className="space-y-3 rounded-lg p-3 ring-1 ring-ink/10">
      <legend className="px-1 font-bold">{legend}</legend>
      <SelectField
        label="Type"
        value={draft.type}
        onChange={(e) => onChange({ ...draft, type: e.target.value as TransistorType })}
      >
        {TRANSISTOR_TYPES.map((t) => (
          <option key={t} value={t}>
            {t}
          </option>
        ))}
      </SelectField>
      <div className="grid grid-cols-3 gap-2">
        {text('v', bipolar ? 'Vceo (V)' : 'Vds (V)')}
        {text('i', bipolar ? 'Ic (A)' : 'Id (A)')}
        {text('p', 'Ptot (W)')}
      </div>
      <div className="grid grid-cols-2 gap-2">
        <TextField
          label="Package"
          list={packagesId}
          autoComplete="off"
          value={draft.pkg}
          onChange={(e) => onChange({ ...draft, pkg: e.target.value })}
          placeholder="TO-220"
        />
        <TextField
          label="Pin-out"
          autoCapitalize="characters"
          autoComplete="off"
          value={draft.pinout}
          onChange={(e) => onChange({ ...draft, pinout: e.target.value })}
          placeholder={bipolar ? 'BCE' : 'GDS'}
        />
      </div>
      <div className="grid grid-cols-2 gap-2">
        {bipolar ? (
          <>
            {text('hfe', 'Gain hFE (optional)')}
            {text('ft', 'fT, MHz (optional)')}
          </>
        ) : (
          text('vgs', 'Vgs(th) max, V (optional)')
        )}
      </div>
    </fieldset>
  );
}

const REF_ORIGINAL: SpecDraft = { ...EMPTY_SPEC, v: '400', i: '4', p: '75', pkg: 'TO-220', pinout: 'BCE' };
const REF_CANDIDATE: SpecDraft = { ...EMPTY_SPEC, v: '450', i: '5', p: '80', pkg: 'TO-220', pinout: 'BCE' };

export function Transistor() {
  const [original, setOriginal] = useState<SpecDraft>(EMPTY_SPEC);
  const [candidate, setCandidate] = useState<SpecDraft>(EMPTY_SPEC);
  const packagesId = useId();
  const o = toSpec(original);
  const c = toSpec(candidate);
  const result = o && c ? attempt(() => checkSubstitution(o, c)) : null;
  const verdict = result?.ok ? result.value.verdict : null;
  return (
    <>
      <datalist id={packagesId}>
        {Object.keys(PACKAGES).map((p) => (
          <option key={p} value={p} />
        ))}
      </datalist>
      <div className="grid gap-3 sm:grid-cols-2">
        <SpecFields legend="Original" draft={original} onChange={setOriginal} packagesId={packagesId} />
        <SpecFields legend="Replacement" draft={candidate} onChange={setCandidate} packagesId={packagesId} />
      </div>
      <Result
        id="transistor"
        tone={
          !result ? 'neutral' : !result.ok || verdict === 'refuse' ? 'bad' : verdict === 'accept' ? 'good' : 'caution'
        }
      >
        {!result ? (
          <Prompt>Fill in type, the three ratings and the package of both parts.</Prompt>
        ) : !result.ok ? (
          <p className="font-semibold">{result.error}</p>
        ) : (
          <>
            <Big>
              {verdict === 'accept'
                ? 'Suitable substitute'
                : verdict === 'accept-with-warnings'
                  ? 'Suitable, with care'
                  : 'Not a substitute'}
            </Big>
            {result.value.refusals.length > 0 && (
              <ul className="mt-1 list-disc space-y-1 pl-5 font-semibold">
                {result.value.refusals.map((r) => (
                  <li key={r}>{r}</li>
                ))}
              </ul>
            )}
            {result.value.warnings.length > 0 && (
              <ul className="mt-1 list-disc space-y-1 pl-5 text-ink">
                {result.value.warnings.map((w) => (
                  <li key={w}>{w}</li>
                ))}
              </ul>
            )}
            {result.value.passed.length > 0 && (
              <p className="mt-2 text-sm text-ink-soft">Passed: {result.value.passed.join(' ')}</p>
            )}
            <p className="mt-1 text-sm text-ink-soft">
              Gain, speed and gate threshold are compared only when given for both parts. Check the datasheets before
              fitting.
            </p>
          </>
        )}
      </Result>
      <Examples>
        <ExampleButton
          onClick={() => {
            setOriginal(REF_ORIGINAL);
            setCandidate(REF_CANDIDATE);
          }}
        >
          Worked example: 400 V / 4 A TO-220
        </ExampleButton>
        <ExampleButton
          onClick={() => {
            setOriginal({ ...EMPTY_SPEC, v: '400', i: '1.5', p: '20', pkg: 'TO-126' });
            setCandidate({ ...EMPTY_SPEC, v: '400', i: '4', p: '75', pkg: 'TO-220' });
          }}
        >
          TO-126 → TO-220
        </ExampleButton>
      </Examples>
    </>
  );
}
