import { describe, it, expect } from 'vitest';
import jStat from 'jstat';
import { chiSquare1UpperTail, erfc } from '../../../shared/stats/chi-square';

describe('erfc', () => {
  // Abramowitz M. & Stegun I.A. (1964), Handbook of Mathematical Functions, table 7.1 (erf to 15 places):
  // erf(0.5) = 0.520499877813047, erf(1) = 0.842700792949715, erf(2) = 0.995322265018953.
  it('matches the printed erf table at 0.5, 1 and 2', () => {
    expect(1 - erfc(0.5)).toBeCloseTo(0.520499877813047, 14);
    expect(1 - erfc(1)).toBeCloseTo(0.842700792949715, 14);
    expect(1 - erfc(2)).toBeCloseTo(0.995322265018953, 14);
  });

  it('agrees with jstat’s erfc to 1e-7 relative on both sides of the series/fraction switch', () => {
    // Beyond x ≈ 5 jstat's own approximation drifts (erfc(5.5) = 7.3578e-15; jstat gives 7.3275e-15).
    for (const x of [0, 0.1, 0.7, 1.5, 2.49, 2.5, 3, 4]) {
      const ref = jStat.erfc(x);
      expect(Math.abs(erfc(x) - ref) / ref).toBeLessThan(1e-7);
    }
  });

  it('is 2 − erfc(−x) for negative x', () => {
    expect(erfc(-1)).toBeCloseTo(2 - erfc(1), 15);
  });
});

describe('chiSquare1UpperTail', () => {
  // Fisher R.A. & Yates F., Statistical Tables (1963), table IV: χ² with 1 df at p = 0.05 is 3.841, at 0.01 is 6.635.
  it('gives p = 0.05 at 3.841459 and p = 0.01 at 6.634897', () => {
    expect(chiSquare1UpperTail(3.841458820694124)).toBeCloseTo(0.05, 12);
    expect(chiSquare1UpperTail(6.634896601021214)).toBeCloseTo(0.01, 12);
  });

  it('agrees with 1 − jstat.chisquare.cdf(x, 1)', () => {
    for (const x of [0.01, 0.5, 1, 3.9286, 5.6571, 10, 20]) {
      expect(chiSquare1UpperTail(x)).toBeCloseTo(1 - jStat.chisquare.cdf(x, 1), 9);
    }
  });

  it('rejects a negative statistic', () => {
    expect(() => chiSquare1UpperTail(-1)).toThrow(RangeError);
  });
});
