import { describe, it, expect } from 'vitest';
import pmf from '@stdlib/stats-base-dists-hypergeometric-pmf';
import { fisherExactTwoSided, hypergeometricLogPmf } from '../../../shared/stats/fisher';

function bruteForce(a: number, b: number, c: number, d: number): number {
  const N = a + b + c + d;
  const K = a + b;
  const n = a + c;
  const observed = pmf(a, N, K, n);
  let sum = 0;
  for (let x = Math.max(0, n - (N - K)); x <= Math.min(K, n); x++) {
    const p = pmf(x, N, K, n);
    if (p <= observed * (1 + 1e-7)) sum += p;
  }
  return Math.min(1, sum);
}

// Seeded so a failure can be replayed.
function lcg(seed: number): () => number {
  let s = seed;
  return () => (s = (s * 16807) % 2147483647) / 2147483647;
}

describe('fisherExactTwoSided', () => {
  // Fisher R.A. (1935), The Design of Experiments, the tea-tasting experiment; table [[3,1],[1,3]]
  // as in Agresti A. (2002), Categorical Data Analysis, 2nd ed. (§3.5 [section from memory]): two-sided p = 34/70.
  it('gives 34/70 for the tea-tasting table', () => {
    expect(fisherExactTwoSided(3, 1, 1, 3)).toBeCloseTo(34 / 70, 12);
    expect(fisherExactTwoSided(3, 1, 1, 3)).toBeCloseTo(0.485714, 6);
  });

  // Same source: the five possible tables have probabilities 1, 16, 36, 16, 1 (/70) [from memory].
  it('reproduces the tea-tasting null distribution through hypergeometricLogPmf', () => {
    const probs = [0, 1, 2, 3, 4].map((x) => Math.exp(hypergeometricLogPmf(x, 8, 4, 4)) * 70);
    probs.forEach((p, i) => expect(p).toBeCloseTo([1, 16, 36, 16, 1][i] ?? NaN, 10));
  });

  // Physicians' Health Study table (placebo 189/11034, aspirin 104/11037) in Agresti A. (2007),
  // An Introduction to Categorical Data Analysis, 2nd ed.; p = 5.03e-7 is [COMP] in TRADE.md §4.
  it('gives about 5.03e-7 for the aspirin table', () => {
    const p = fisherExactTwoSided(189, 11034 - 189, 104, 11037 - 104);
    expect(p * 1e7).toBeCloseTo(5.03, 2);
    // Exact big-integer sum over the support, computed for this test (not published): 5.032835599722745e-7.
    expect(p / 5.032835599722745e-7).toBeCloseTo(1, 9);
  });

  it('agrees with a brute-force sum of @stdlib hypergeometric pmf on random tables', () => {
    const rand = lcg(20240611);
    for (let i = 0; i < 40; i++) {
      const scale = i < 20 ? 30 : 600;
      const cells = [0, 1, 2, 3].map(() => Math.floor(rand() * scale)) as [number, number, number, number];
      const expected = bruteForce(...cells);
      expect(Math.abs(fisherExactTwoSided(...cells) - expected)).toBeLessThan(
        1e-9 * Math.max(expected, 1e-300) + 1e-15,
      );
    }
  });

  it('matches @stdlib hypergeometric pmf in log space on a large population', () => {
    expect(Math.exp(hypergeometricLogPmf(300, 290000, 10000, 9300))).toBeCloseTo(pmf(300, 290000, 10000, 9300), 12);
    expect(hypergeometricLogPmf(5, 10, 3, 4)).toBe(-Infinity);
  });

  it('returns 1 for all-zero tables, fixed margins and the most likely table', () => {
    expect(fisherExactTwoSided(0, 0, 0, 0)).toBe(1);
    expect(fisherExactTwoSided(0, 0, 5, 7)).toBe(1);
    expect(fisherExactTwoSided(4, 0, 6, 0)).toBe(1);
    expect(fisherExactTwoSided(75000, 75000, 75000, 75000)).toBeCloseTo(1, 12);
    expect(fisherExactTwoSided(75000, 75000, 75000, 75000)).toBeLessThanOrEqual(1);
  });

  it('answers a probability for every table of a register of ~300 000 jars (timings: npm run bench)', () => {
    for (let i = 0; i < 200; i++) {
      const p = fisherExactTwoSided(300 + (i % 50), 9700, 9000, 281000);
      expect(p).toBeGreaterThanOrEqual(0);
      expect(p).toBeLessThanOrEqual(1);
    }
  });

  it('rejects negative or fractional cells', () => {
    expect(() => fisherExactTwoSided(-1, 2, 3, 4)).toThrow(RangeError);
    expect(() => fisherExactTwoSided(1.5, 2, 3, 4)).toThrow(RangeError);
  });
});
