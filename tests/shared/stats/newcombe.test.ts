import { describe, it, expect } from 'vitest';
import { newcombeDifference } from '../../../shared/stats/newcombe';
import { Z_95 } from '../../../shared/stats/wilson';

describe('newcombeDifference', () => {
  // Newcombe R.G. (1998), Interval estimation for the difference between independent proportions:
  // comparison of eleven methods, Statistics in Medicine 17:873–890, worked examples for method 10
  // [values from memory].
  it.each([
    [56, 70, 48, 80, 0.2, 0.0524, 0.3339],
    [9, 10, 3, 10, 0.6, 0.1705, 0.809],
  ])('gives Newcombe’s method-10 interval for %i/%i vs %i/%i', (x1, n1, x2, n2, diff, lo, hi) => {
    const { difference, ci95 } = newcombeDifference(x1, n1, x2, n2);
    expect(difference).toBeCloseTo(diff, 10);
    expect(ci95[0]).toBeCloseTo(lo, 4);
    expect(ci95[1]).toBeCloseTo(hi, 4);
  });

  // Hand-derived: both Wilson intervals are [0, z²/(10 + z²)], so the interval is ± that bound.
  it('is symmetric about 0 for 0/10 vs 0/10', () => {
    const upper = (Z_95 * Z_95) / (10 + Z_95 * Z_95);
    const { difference, ci95 } = newcombeDifference(0, 10, 0, 10);
    expect(difference).toBe(0);
    expect(ci95[0]).toBeCloseTo(-upper, 12);
    expect(ci95[1]).toBeCloseTo(upper, 12);
  });

  it('stays within [−1, 1] at the extremes', () => {
    const { difference, ci95 } = newcombeDifference(10, 10, 0, 10);
    expect(difference).toBe(1);
    expect(ci95[1]).toBe(1);
    expect(ci95[0]).toBeGreaterThan(0);
  });

  it('returns NaN when a period has no jars', () => {
    const { difference, ci95 } = newcombeDifference(0, 0, 2, 10);
    expect(difference).toBeNaN();
    expect(ci95).toEqual([NaN, NaN]);
  });
});
