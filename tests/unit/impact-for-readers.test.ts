import { describe, expect, it } from 'vitest';
import { sourceForReaders } from '../../shared/impact/for-readers';

describe('a source as people outside the group read it', () => {
  it('calls a figure from memory an estimate and drops the mark, keeping the rest of the explanation', () => {
    expect(
      sourceForReaders('Between a T-shirt (≈ 0.2 kg) and jeans (≈ 0.7 kg), from memory; weigh textiles at intake'),
    ).toBe(
      'Estimate: a typical weight, not a published figure; between a T-shirt (≈ 0.2 kg) and jeans (≈ 0.7 kg); weigh textiles at intake',
    );
    expect(
      sourceForReaders('Assumed equal to UNU-KEY 0701 toys (from memory that they weigh the same); weigh at intake'),
    ).toBe('Estimate: a typical weight, not a published figure; assumed equal to UNU-KEY 0701 toys; weigh at intake');
    expect(sourceForReaders('From memory')).toBe('Estimate: a typical weight, not a published figure');
  });

  it('leaves a published source as it is', () => {
    const source = 'Statistics Netherlands e-waste dataset, UNU-KEY 0203 average weight (2020)';
    expect(sourceForReaders(source)).toBe(source);
  });
});
