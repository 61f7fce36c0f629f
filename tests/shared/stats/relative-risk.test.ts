import { describe, it, expect } from 'vitest';
import { relativeRisk } from '../../../shared/stats/relative-risk';

describe('relativeRisk', () => {
  // Agresti A. (2007), An Introduction to Categorical Data Analysis, 2nd ed., Physicians' Health
  // Study (placebo 189/11034 vs aspirin 104/11037); log-method interval of Katz D. et al. (1978),
  // Biometrics 34:469–474. Values as listed in TRADE.md §4.
  it('gives 1.818 (1.433–2.306) for the aspirin table', () => {
    const { rr, ci95 } = relativeRisk(189, 11034, 104, 11037);
    expect(rr).toBeCloseTo(1.818, 3);
    expect(ci95[0]).toBeCloseTo(1.433, 3);
    expect(ci95[1]).toBeCloseTo(2.306, 3);
  });

  // Hand-derived: cells 0,10,5,5 become 0.5,10.5,5.5,5.5, so rr = 1/11 and se = √(2 − 2/11 + 2/11) = √2.
  it('adds 0.5 to every cell when one is zero, for estimate and interval', () => {
    const { rr, ci95 } = relativeRisk(0, 10, 5, 10);
    expect(rr).toBeCloseTo(1 / 11, 12);
    expect(ci95[0]).toBeCloseTo((1 / 11) * Math.exp(-1.959963984540054 * Math.SQRT2), 12);
    expect(ci95[1]).toBeCloseTo((1 / 11) * Math.exp(1.959963984540054 * Math.SQRT2), 12);
  });

  it('stays finite when both groups are all contaminated or all clean', () => {
    expect(relativeRisk(4, 4, 6, 6).rr).toBeCloseTo(4.5 / 5 / (6.5 / 7), 12);
    expect(relativeRisk(0, 4, 0, 6).rr).toBeCloseTo(0.5 / 5 / (0.5 / 7), 12);
  });

  it('returns NaN when a group has no jars', () => {
    const { rr, ci95 } = relativeRisk(0, 0, 3, 10);
    expect(rr).toBeNaN();
    expect(ci95[0]).toBeNaN();
    expect(ci95[1]).toBeNaN();
  });

  it('rejects counts above their totals', () => {
    expect(() => relativeRisk(5, 4, 1, 10)).toThrow(RangeError);
  });
});
