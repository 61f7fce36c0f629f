import { describe, it, expect } from 'vitest';
import { pChartLimits } from '../../../shared/stats/p-chart';

describe('pChartLimits', () => {
  // A p-chart with varying sample size in the form of Montgomery D.C., Introduction to Statistical
  // Quality Control, ch. 7; the four weeks below are made up and worked by hand:
  // p̄ = 84/1800 = 0.0466667, p̄(1 − p̄) = 0.0444889;
  // n = 200: 3σ = 3·√(0.0444889/200) = 0.0447436 → 0.0019231 … 0.0914103
  // n = 400: 3σ = 0.0316386 → 0.0150281 … 0.0783053;  n = 1000: 3σ = 0.0200100 → 0.0266567 … 0.0666767
  const x = [10, 20, 4, 50];
  const n = [200, 400, 200, 1000];

  it('uses Σx/Σn as the centre and 3-sigma limits for each week’s own n', () => {
    const { pBar, limits } = pChartLimits(x, n);
    expect(pBar).toBeCloseTo(0.0466667, 7);
    const expected = [
      [0.0019231, 0.0914103],
      [0.0150281, 0.0783053],
      [0.0019231, 0.0914103],
      [0.0266567, 0.0666767],
    ];
    limits.forEach(({ lcl, ucl }, i) => {
      expect(lcl).toBeCloseTo(expected[i]?.[0] ?? NaN, 6);
      expect(ucl).toBeCloseTo(expected[i]?.[1] ?? NaN, 6);
    });
  });

  it('leaves excluded (provisional) weeks out of the centre but still gives them limits', () => {
    const { pBar, limits } = pChartLimits(x, n, [true, true, false, true]);
    expect(pBar).toBeCloseTo(80 / 1600, 12);
    expect(limits[2]?.ucl).toBeCloseTo(0.05 + 3 * Math.sqrt((0.05 * 0.95) / 200), 12);
  });

  it('floors the lower limit at 0 and caps the upper at 1', () => {
    // p̄ = 0.5 and n = 2: 3σ = 3·√0.125 = 1.06 on either side.
    const { limits } = pChartLimits([1, 5], [2, 10]);
    expect(limits[0]?.lcl).toBe(0);
    expect(limits[0]?.ucl).toBe(1);
  });

  it('gives a week with no jars the whole range and a zero centre zero-width limits', () => {
    expect(pChartLimits([0, 3], [0, 30]).limits[0]).toEqual({ ucl: 1, lcl: 0 });
    expect(pChartLimits([0, 0], [20, 30])).toEqual({
      pBar: 0,
      limits: [
        { ucl: 0, lcl: 0 },
        { ucl: 0, lcl: 0 },
      ],
    });
  });

  it('reports NaN as centre when no included week has jars', () => {
    const { pBar, limits } = pChartLimits([0, 2], [0, 10], [true, false]);
    expect(pBar).toBeNaN();
    expect(limits).toEqual([
      { ucl: 1, lcl: 0 },
      { ucl: 1, lcl: 0 },
    ]);
    expect(pChartLimits([], []).pBar).toBeNaN();
  });

  it('rejects arrays of different lengths and counts above n', () => {
    expect(() => pChartLimits([1], [2, 3])).toThrow(RangeError);
    expect(() => pChartLimits([4], [3])).toThrow(RangeError);
  });
});

describe('pChartLimits on a published example', () => {
  // Montgomery D.C., Introduction to Statistical Quality Control, ch. 7, the frozen orange-juice can
  // example: samples of n = 50 with p̄ = 0.2313 give UCL = 0.4102, LCL = 0.0524 [from memory, TRADE.md §4].
  // Counts chosen so that Σx/Σn = 0.2313 exactly (2313 of 10,000 cans over 200 samples of 50).
  it('reproduces the limits 0.0524–0.4102 for n = 50 around p̄ = 0.2313', () => {
    const n = Array.from({ length: 200 }, () => 50);
    const x = n.map((_, i) => (i < 113 ? 12 : 11));
    const { pBar, limits } = pChartLimits(x, n);
    expect(pBar).toBeCloseTo(0.2313, 10);
    expect(limits[0]?.lcl).toBeCloseTo(0.0524, 4);
    expect(limits[0]?.ucl).toBeCloseTo(0.4102, 4);
  });
});
