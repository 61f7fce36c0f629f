import { describe, it, expect } from 'vitest';
import { f0AtConstant, f0FromLog, lethalRate } from '../../../shared/stats/lethality';

describe('lethalRate', () => {
  // L = 10^((T − 121.1)/z), z = 10 °C: PDA Technical Report No. 1 (rev. 2007); Pistolesi D. &
  // Mascherpa V., F0: a technical note (1988, rev. 2014). Values [COMP] in TRADE.md §3.
  it.each([
    [111.1, 0.1],
    [115, 0.24547],
    [121.0, 0.97724],
    [125, 2.45471],
    [134, 19.49845],
  ])('L(%f) = %f with Tref = 121.1 °C', (T, L) => {
    expect(lethalRate(T)).toBeCloseTo(L, 5);
  });

  it('accepts another z and reference temperature (some texts use 121.0 °C)', () => {
    expect(lethalRate(121.0, 10, 121.0)).toBe(1);
    expect(lethalRate(131.1, 20)).toBeCloseTo(Math.sqrt(10), 12);
  });
});

describe('f0AtConstant', () => {
  // Same sources: 15 min at 121.1 °C is F0 = 15 by definition.
  it('gives 15 for 15 minutes at 121.1 °C', () => {
    expect(f0AtConstant(121.1, 15)).toBeCloseTo(15, 10);
  });
});

describe('f0FromLog', () => {
  // TRADE.md §3 [COMP]: 1-min samples 100, 105, 110, 115, 118, 120, 121 ×10, 118, 115, 110, 105, 100 °C
  // → 12.239 (rectangle, every sample counted for one minute), 12.231 (trapezoid).
  const celsius = [100, 105, 110, 115, 118, 120, ...Array<number>(10).fill(121), 118, 115, 110, 105, 100];
  const samples = celsius.map((c, minute) => ({ minute, celsius: c }));

  it('gives 12.239 by the rectangle rule', () => {
    expect(f0FromLog(samples)).toBeCloseTo(12.239, 3);
    expect(f0FromLog(samples, { method: 'rectangle' })).toBeCloseTo(12.239, 3);
  });

  it('gives 12.231 by the trapezoid rule', () => {
    expect(f0FromLog(samples, { method: 'trapezoid' })).toBeCloseTo(12.231, 3);
  });

  // Hand-derived at L = 1: gaps 2 and 1 min; rectangle holds the last sample for the gap before it.
  it('weights uneven gaps as defined', () => {
    const even = [0, 2, 3].map((minute) => ({ minute, celsius: 121.1 }));
    expect(f0FromLog(even, { method: 'rectangle' })).toBeCloseTo(4, 12);
    expect(f0FromLog(even, { method: 'trapezoid' })).toBeCloseTo(3, 12);
  });

  it('gives 0 for an empty or single-sample log', () => {
    expect(f0FromLog([])).toBe(0);
    expect(f0FromLog([{ minute: 0, celsius: 121 }])).toBe(0);
  });

  it('rejects minutes that do not increase', () => {
    expect(() =>
      f0FromLog([
        { minute: 1, celsius: 121 },
        { minute: 1, celsius: 121 },
      ]),
    ).toThrow(RangeError);
  });
});
