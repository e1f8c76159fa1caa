import { describe, expect, it } from 'vitest';
import { patchesOf } from '../../shared/impact/patches';

describe('patches of the quilt', () => {
  it('hands out the leftover patches to the largest remainders', () => {
    // Source: Wikipedia, "Largest remainder method", worked example with the Hare quota: 100,000 votes,
    // 10 seats → Yellows 5, Whites 2, Reds 1, Greens 1, Blues 1, Pinks 0.
    expect(patchesOf([47_000, 16_000, 15_800, 12_000, 6_100, 3_100], 10)).toEqual([5, 2, 1, 1, 1, 0]);
  });

  it('always adds up to the number of patches, and gives none when nothing is counted', () => {
    // Source: by construction of the method (same article): the seats handed out equal the seats available.
    expect(patchesOf([1, 1, 1], 20).reduce((n, p) => n + p, 0)).toBe(20);
    expect(patchesOf([7, 0, 0, 0], 20)).toEqual([20, 0, 0, 0]);
    expect(patchesOf([0, 0], 20)).toEqual([0, 0]);
  });
});
