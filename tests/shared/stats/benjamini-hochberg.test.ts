import { describe, it, expect } from 'vitest';
import padjust from '@stdlib/stats-padjust';
import { bhAdjust } from '../../../shared/stats/benjamini-hochberg';

describe('bhAdjust', () => {
  // Benjamini Y. & Hochberg Y. (1995), JRSS B 57:289–300, §4 (15 p-values [data from memory]);
  // adjusted values [COMP] in TRADE.md §4.
  const p = [
    0.0001, 0.0004, 0.0019, 0.0095, 0.0201, 0.0278, 0.0298, 0.0344, 0.0459, 0.324, 0.4262, 0.5719, 0.6528, 0.759, 1,
  ];
  const q = [
    0.0015, 0.003, 0.0095, 0.035625, 0.0603, 0.063857, 0.063857, 0.0645, 0.0765, 0.486, 0.581182, 0.714875, 0.753231,
    0.813214, 1,
  ];

  it('reproduces the Benjamini & Hochberg (1995) example', () => {
    bhAdjust(p).forEach((value, i) => expect(value).toBeCloseTo(q[i] ?? NaN, 6));
  });

  it('rejects four hypotheses at 0.05, as in Benjamini & Hochberg (1995) §4', () => {
    expect(bhAdjust(p).filter((value) => value <= 0.05)).toHaveLength(4);
  });

  it('keeps the input order', () => {
    const shuffled = [9, 2, 14, 0, 7, 4, 11, 1, 13, 5, 3, 12, 6, 10, 8];
    const result = bhAdjust(shuffled.map((i) => p[i] ?? NaN));
    result.forEach((value, k) => expect(value).toBeCloseTo(q[shuffled[k] ?? 0] ?? NaN, 6));
  });

  it('agrees with @stdlib/stats-padjust (bh) on random p-values with ties', () => {
    let s = 7;
    const rand = () => (s = (s * 16807) % 2147483647) / 2147483647;
    for (let round = 0; round < 10; round++) {
      const values = Array.from({ length: 40 }, () => Math.round(rand() * 200) / 200);
      const ours = bhAdjust(values);
      padjust(values, 'bh').forEach((value, i) => expect(ours[i]).toBeCloseTo(value, 12));
    }
  });

  it('handles an empty list, a single p-value and p = 1', () => {
    expect(bhAdjust([])).toEqual([]);
    expect(bhAdjust([0.3])).toEqual([0.3]);
    expect(bhAdjust([1, 1, 1])).toEqual([1, 1, 1]);
    expect(bhAdjust([0.9, 0.95])).toEqual([0.95, 0.95]);
  });

  it('rejects values outside [0, 1]', () => {
    expect(() => bhAdjust([0.2, 1.2])).toThrow(RangeError);
    expect(() => bhAdjust([Number.NaN])).toThrow(RangeError);
  });
});
