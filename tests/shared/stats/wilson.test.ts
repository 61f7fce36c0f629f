import { describe, it, expect } from 'vitest';
import jStat from 'jstat';
import { wilsonInterval, Z_95 } from '../../../shared/stats/wilson';

describe('wilsonInterval', () => {
  // Newcombe R.G. (1998), Two-sided confidence intervals for the single proportion: comparison of
  // seven methods, Statistics in Medicine 17:857–872, worked examples (score method without
  // continuity correction), as listed in TRADE.md §4.
  it.each([
    [81, 263, 0.2553, 0.3662],
    [15, 148, 0.0624, 0.1605],
    [0, 20, 0, 0.1611],
    [1, 29, 0.0061, 0.1718],
  ])('matches Newcombe (1998) for %i/%i', (x, n, lo, hi) => {
    const [l, u] = wilsonInterval(x, n);
    expect(l).toBeCloseTo(lo, 4);
    expect(u).toBeCloseTo(hi, 4);
  });

  it('uses z equal to the 97.5 % normal quantile (cross-check: jstat normal.inv)', () => {
    expect(Z_95).toBeCloseTo(jStat.normal.inv(0.975, 0, 1), 12);
  });

  it('gives exactly 0 at x = 0 and exactly 1 at x = n', () => {
    expect(wilsonInterval(0, 7)[0]).toBe(0);
    expect(wilsonInterval(7, 7)[1]).toBe(1);
    // Hand-derived: at x = 0 the upper bound is z²/(n + z²).
    expect(wilsonInterval(0, 10)[1]).toBeCloseTo((Z_95 * Z_95) / (10 + Z_95 * Z_95), 14);
  });

  it('returns the whole range [0, 1] for n = 0', () => {
    expect(wilsonInterval(0, 0)).toEqual([0, 1]);
  });

  it('rejects counts that are not integers with 0 <= x <= n', () => {
    expect(() => wilsonInterval(3, 2)).toThrow(RangeError);
    expect(() => wilsonInterval(-1, 2)).toThrow(RangeError);
    expect(() => wilsonInterval(1.5, 2)).toThrow(RangeError);
  });
});
