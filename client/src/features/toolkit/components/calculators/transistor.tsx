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
import { useLanguage, useT } from '../../../../lib/i18n';
import { saidIn } from '../said';

/** Package names and pin-outs are the datasheets' own, the same in every language. */
const TO_220 = 'TO-220';
const PINOUT_EXAMPLE = { bipolar: 'BCE', mosfet: 'GDS' } as const;
const TO_126_TO_220 = 'TO-126 → TO-220';

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
  const t = useT();
  const bipolar = isBipolar(draft.type);
  const text = (key: Exclude<keyof SpecDraft, 'type'>, label: string, hint?: string, decimal = true) => (
    <TextField
      label={label}
      inputMode={decimal ? 'decimal' : undefined}
      autoComplete="off"
      value={draft[key]}
      onChange={(e) => onChange({ ...draft, [key]: e.target.value })}
      error={decimal && bad(draft[key]) ? t('bench.calc.enterNumber') : undefined}
      hint={hint}
    />
  );
  return (
    <fieldset className="space-y-3 rounded-lg p-3 ring-1 ring-ink/10">
      <legend className="px-1 font-bold">{legend}</legend>
      <SelectField
        label={t('bench.calc.tr.type')}
        value={draft.type}
        onChange={(e) => onChange({ ...draft, type: e.target.value as TransistorType })}
      >
        {TRANSISTOR_TYPES.map((type) => (
          <option key={type} value={type}>
            {type}
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
          label={t('bench.calc.tr.package')}
          list={packagesId}
          autoComplete="off"
          value={draft.pkg}
          onChange={(e) => onChange({ ...draft, pkg: e.target.value })}
          placeholder={TO_220}
        />
        <TextField
          label={t('bench.calc.tr.pinout')}
          autoCapitalize="characters"
          autoComplete="off"
          value={draft.pinout}
          onChange={(e) => onChange({ ...draft, pinout: e.target.value })}
          placeholder={bipolar ? PINOUT_EXAMPLE.bipolar : PINOUT_EXAMPLE.mosfet}
        />
      </div>
      <div className="grid grid-cols-2 gap-2">
        {bipolar ? (
          <>
            {text('hfe', t('bench.calc.tr.hfe'))}
            {text('ft', t('bench.calc.tr.ft'))}
          </>
        ) : (
          text('vgs', t('bench.calc.tr.vgs'))
        )}
      </div>
    </fieldset>
  );
}

const REF_ORIGINAL: SpecDraft = { ...EMPTY_SPEC, v: '400', i: '4', p: '75', pkg: 'TO-220', pinout: 'BCE' };
const REF_CANDIDATE: SpecDraft = { ...EMPTY_SPEC, v: '450', i: '5', p: '80', pkg: 'TO-220', pinout: 'BCE' };

export function Transistor() {
  const t = useT();
  const lang = useLanguage();
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
        <SpecFields
          legend={t('bench.calc.tr.original')}
          draft={original}
          onChange={setOriginal}
          packagesId={packagesId}
        />
        <SpecFields
          legend={t('bench.calc.tr.replacement')}
          draft={candidate}
          onChange={setCandidate}
          packagesId={packagesId}
        />
      </div>
      <Result
        id="transistor"
        tone={
          !result ? 'neutral' : !result.ok || verdict === 'refuse' ? 'bad' : verdict === 'accept' ? 'good' : 'caution'
        }
      >
        {!result ? (
          <Prompt>{t('bench.calc.tr.prompt')}</Prompt>
        ) : !result.ok ? (
          <p className="font-semibold">{saidIn(result.error, lang)}</p>
        ) : (
          <>
            <Big>
              {verdict === 'accept'
                ? t('bench.calc.tr.accept')
                : verdict === 'accept-with-warnings'
                  ? t('bench.tool.salvage.acceptWithWarnings')
                  : t('bench.calc.tr.refuse')}
            </Big>
            {result.value.refusals.length > 0 && (
              <ul className="mt-1 list-disc space-y-1 pl-5 font-semibold">
                {result.value.said.refusals.map((r, i) => (
                  <li key={`${r.code}-${i}`}>{saidIn(r, lang)}</li>
                ))}
              </ul>
            )}
            {result.value.warnings.length > 0 && (
              <ul className="mt-1 list-disc space-y-1 pl-5 text-ink">
                {result.value.said.warnings.map((w, i) => (
                  <li key={`${w.code}-${i}`}>{saidIn(w, lang)}</li>
                ))}
              </ul>
            )}
            {result.value.passed.length > 0 && (
              <p className="mt-2 text-sm text-ink-soft">
                {t('bench.calc.tr.passed', { list: result.value.said.passed.map((x) => saidIn(x, lang)).join(' ') })}
              </p>
            )}
            <p className="mt-1 text-sm text-ink-soft">{t('bench.calc.tr.note')}</p>
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
          {t('bench.calc.example', { what: '400 V / 4 A TO-220' })}
        </ExampleButton>
        <ExampleButton
          onClick={() => {
            setOriginal({ ...EMPTY_SPEC, v: '400', i: '1.5', p: '20', pkg: 'TO-126' });
            setCandidate({ ...EMPTY_SPEC, v: '400', i: '4', p: '75', pkg: 'TO-220' });
          }}
        >
          {TO_126_TO_220}
        </ExampleButton>
      </Examples>
    </>
  );
}
