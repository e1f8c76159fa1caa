import { describe, expect, it } from 'vitest';
import { judgeSafety, SAFETY_FAULTS, safetyFaults } from '../../shared/safety/limits';
import { FIXED_REFUSALS, mayRecordFixed } from '../../shared/safety/may-record-fixed';
import { missingReadings, REQUIRED_READINGS, SAFETY_ISSUES } from '../../shared/safety/readings';
import { OUTCOME_ISSUES, outcomeSchema, safetyCheckSchema } from '../../shared/schemas/event-day';

const visual = { cord: true, plug: true, strainRelief: true, casing: true, noHeatDamage: true };

describe('required readings per appliance class (EN 50678, secondary)', () => {
  it('asks class I for cord length, protective conductor and insulation, class II for insulation, class III for none', () => {
    expect(REQUIRED_READINGS).toEqual({
      I: ['cordLengthM', 'protectiveConductorOhm', 'insulationMOhm'],
      II: ['insulationMOhm'],
      III: [],
    });
    expect(missingReadings({ applianceClass: 'I', insulationMOhm: 10 }).map((m) => [m.field, m.name])).toEqual([
      ['cordLengthM', 'cord length'],
      ['protectiveConductorOhm', 'protective conductor resistance'],
    ]);
    expect(missingReadings({ applianceClass: 'III' })).toEqual([]);
  });

  it('gives the schema, the verdict and the form the same missing readings, with stable paths and codes', () => {
    const r = safetyCheckSchema.safeParse({ visual, applianceClass: 'I', cordLengthM: 2 });
    expect(r.success).toBe(false);
    const issues = r.error!.issues.map((i) => ({
      path: i.path.join('.'),
      code: (i as { params?: { code?: string } }).params?.code,
    }));
    expect(issues).toEqual([
      { path: 'protectiveConductorOhm', code: SAFETY_ISSUES.readingMissing },
      { path: 'insulationMOhm', code: SAFETY_ISSUES.readingMissing },
    ]);
    expect(judgeSafety({ visualOk: true, applianceClass: 'I', cordLengthM: 2 }).missing).toEqual(
      missingReadings({ applianceClass: 'I', cordLengthM: 2 }).map((m) => m.name),
    );
  });

  it('tells the visual fault from a failed reading by code, not by wording', () => {
    const faults = safetyFaults({ visualOk: false, applianceClass: 'II', insulationMOhm: 1.5 });
    expect(faults.map((f) => [f.code, f.field])).toEqual([
      [SAFETY_FAULTS.visual, 'visual'],
      [SAFETY_FAULTS.insulation, 'insulationMOhm'],
    ]);
  });

  it('codes the outcome’s cross-field rules with their paths', () => {
    const codes = (input: unknown) =>
      outcomeSchema
        .safeParse(input)
        .error!.issues.map((i) => [i.path.join('.'), (i as { params?: { code?: string } }).params?.code]);
    expect(codes({ outcome: 'end-of-life' })).toEqual([['barrier', OUTCOME_ISSUES.barrierRequired]]);
    expect(codes({ outcome: 'advice', barrier: 'too-worn-out' })).toEqual([
      ['barrier', OUTCOME_ISSUES.barrierNotAllowed],
    ]);
    expect(codes({ outcome: 'parts-needed' })).toEqual([['part.description', OUTCOME_ISSUES.partRequired]]);
  });
});

describe('may an item be recorded fixed', () => {
  it('lets an item without mains go as fixed with no check at all', () => {
    expect(mayRecordFixed({ mains: false }, null)).toEqual({ ok: true });
  });

  it('asks a mains item for a check first, and refuses a failed one with its reasons', () => {
    expect(mayRecordFixed({ mains: true }, null)).toMatchObject({
      ok: false,
      code: FIXED_REFUSALS.checkRequired,
      field: 'safety',
    });
    const verdict = judgeSafety({ visualOk: true, applianceClass: 'I', cordLengthM: 2, insulationMOhm: 0.2 });
    const refused = mayRecordFixed({ mains: true }, verdict);
    expect(refused).toMatchObject({ ok: false, code: FIXED_REFUSALS.checkFailed });
    expect(refused.ok === false && refused.fieldMessage).toBe(
      'Insulation 0.2 MΩ is below the 1 MΩ minimum for class I. Missing: protective conductor resistance.',
    );
  });

  it('lets a mains item go as fixed once its latest check passed', () => {
    const verdict = judgeSafety({
      visualOk: true,
      applianceClass: 'I',
      cordLengthM: 1.5,
      protectiveConductorOhm: 0.12,
      insulationMOhm: 45,
    });
    expect(mayRecordFixed({ mains: true }, verdict)).toEqual({ ok: true });
  });
});
