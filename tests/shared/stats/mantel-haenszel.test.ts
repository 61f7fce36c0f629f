import { describe, it, expect } from 'vitest';
import jStat from 'jstat';
import { mantelHaenszel, mantelHaenszelOddsRatio, type Stratum } from '../../../shared/stats/mantel-haenszel';

describe('mantelHaenszel', () => {
  // University Group Diabetes Program, tolbutamide vs placebo, deaths by age, as tabulated in Rothman K.J.,
  // Epidemiology: An Introduction (2002) [data from memory, TRADE.md §4]: RR_MH 1.33 [COMP 1.32556];
  // 95 % interval from the Greenland & Robins (1985) variance, Biometrics 41:55–68 [COMP 0.7979–2.2021].
  const tolbutamide: Stratum[] = [
    { a: 8, n1: 106, c: 5, n0: 120 },
    { a: 22, n1: 98, c: 16, n0: 85 },
  ];

  it('pools the tolbutamide strata to 1.32556 with the Greenland–Robins interval 0.7979–2.2021', () => {
    const mh = mantelHaenszel(tolbutamide);
    expect(mh.rr).toBeCloseTo(1.32556, 5);
    expect(mh.ci95[0]).toBeCloseTo(0.7979, 4);
    expect(mh.ci95[1]).toBeCloseTo(2.2021, 4);
    expect(mh.contributing).toBe(2);
  });

  it('reduces to the crude relative risk and Katz interval with one stratum', () => {
    // Agresti (2007), Physicians' Health Study: RR 1.818 (1.433–2.306), TRADE.md §4.
    const mh = mantelHaenszel([{ a: 189, n1: 11034, c: 104, n0: 11037 }]);
    expect(mh.rr).toBeCloseTo(1.818, 3);
    expect(mh.ci95[0]).toBeCloseTo(1.433, 3);
    expect(mh.ci95[1]).toBeCloseTo(2.306, 3);
  });

  // Penicillin and rabbits, Agresti A., Categorical Data Analysis; the example of R's mantelhaen.test
  // documentation: X² = 3.9286, df 1, p = 0.04747, MH common odds ratio 7. Level = no delay, event = cured.
  const penicillin: Stratum[] = [
    { a: 0, n1: 6, c: 0, n0: 5 },
    { a: 3, n1: 6, c: 0, n0: 6 },
    { a: 6, n1: 6, c: 2, n0: 6 },
    { a: 5, n1: 6, c: 6, n0: 6 },
    { a: 2, n1: 2, c: 5, n0: 5 },
  ];

  it('gives the Cochran–Mantel–Haenszel X² = 3.9286, p = 0.04747 with the continuity correction', () => {
    const mh = mantelHaenszel(penicillin);
    expect(mh.chiSquare).toBeCloseTo(3.9286, 4);
    expect(mh.pValue).toBeCloseTo(0.04747, 5);
    expect(mh.pValue).toBeCloseTo(1 - jStat.chisquare.cdf(mh.chiSquare, 1), 10);
  });

  it('gives the Mantel–Haenszel common odds ratio 7 on the same strata', () => {
    expect(mantelHaenszelOddsRatio(penicillin)).toBeCloseTo(7, 10);
  });

  it('gives X² = 5.6571, p = 0.01738 without the correction [COMP, TRADE.md §4]', () => {
    const mh = mantelHaenszel(penicillin, { correct: false });
    expect(mh.chiSquare).toBeCloseTo(5.6571, 4);
    expect(mh.pValue).toBeCloseTo(0.01738, 5);
  });

  it('leaves out strata without jars on both sides', () => {
    const withEmpty = mantelHaenszel([...tolbutamide, { a: 0, n1: 0, c: 3, n0: 9 }]);
    expect(withEmpty.rr).toBeCloseTo(mantelHaenszel(tolbutamide).rr, 12);
    expect(withEmpty.contributing).toBe(2);
    expect(mantelHaenszel([{ a: 1, n1: 4, c: 0, n0: 0 }]).rr).toBeNaN();
  });

  it('adds 0.5 to every contributing stratum when a pooled sum is zero, for estimate and interval', () => {
    // Hand-derived: one stratum 0/10 vs 5/10 becomes 0.5/11 vs 5.5/11, so RR = 1/11, as the crude rule gives.
    const mh = mantelHaenszel([{ a: 0, n1: 10, c: 5, n0: 10 }]);
    expect(mh.rr).toBeCloseTo(1 / 11, 12);
    expect(mh.ci95[1]).toBeCloseTo((1 / 11) * Math.exp(1.959963984540054 * Math.SQRT2), 10);
  });

  it('answers p = 1 when no stratum varies', () => {
    expect(mantelHaenszel([{ a: 0, n1: 3, c: 0, n0: 4 }]).pValue).toBe(1);
  });

  it('rejects counts above their totals and fractions', () => {
    expect(() => mantelHaenszel([{ a: 5, n1: 4, c: 0, n0: 3 }])).toThrow(RangeError);
    expect(() => mantelHaenszel([{ a: 0.5, n1: 4, c: 0, n0: 3 }])).toThrow(RangeError);
  });
});
