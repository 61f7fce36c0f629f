import { chiSquare1UpperTail } from './chi-square';
import { Z_95 } from './wilson';

/** One stratum of a level-vs-rest table: a of n1 jars of the level contaminated, c of n0 of its rest. */
export interface Stratum {
  a: number;
  n1: number;
  c: number;
  n0: number;
}

export interface MantelHaenszel {
  /** Risk ratio pooled over the contributing strata; NaN when no stratum contributes. */
  rr: number;
  ci95: [number, number];
  /** Cochran–Mantel–Haenszel X² with the continuity correction, df 1, and its two-sided p. */
  chiSquare: number;
  pValue: number;
  /** Strata holding jars on both sides; the others carry no comparison. */
  contributing: number;
}

function checkStratum(s: Stratum) {
  for (const v of [s.a, s.n1, s.c, s.n0]) {
    if (!Number.isInteger(v) || v < 0) throw new RangeError(`mantelHaenszel needs non-negative integers, got ${v}`);
  }
  if (s.a > s.n1 || s.c > s.n0) throw new RangeError('mantelHaenszel needs a <= n1 and c <= n0');
}

/**
 * Mantel & Haenszel (1959) risk ratio with the Greenland & Robins (1985) variance of its log. When
 * either pooled sum is zero the ratio is 0 or infinite, so 0.5 is added to the four cells of every
 * contributing stratum for the estimate and interval (DESIGN.md §4.3), as the crude ratio does.
 */
function pooledRiskRatio(strata: Stratum[]): { rr: number; ci95: [number, number] } {
  const sums = (shift: number) => {
    let r = 0;
    let s = 0;
    let v = 0;
    for (const { a: a0, n1: n10, c: c0, n0: n00 } of strata) {
      const a = a0 + shift;
      const c = c0 + shift;
      const n1 = n10 + 2 * shift;
      const n0 = n00 + 2 * shift;
      const N = n1 + n0;
      r += (a * n0) / N;
      s += (c * n1) / N;
      v += (n1 * n0 * (a + c)) / (N * N) - (a * c) / N;
    }
    return { r, s, v };
  };
  let { r, s, v } = sums(0);
  if (r === 0 || s === 0) ({ r, s, v } = sums(0.5));
  const rr = r / s;
  const se = Math.sqrt(v / (r * s));
  return { rr, ci95: [rr * Math.exp(-Z_95 * se), rr * Math.exp(Z_95 * se)] };
}

/**
 * Cochran–Mantel–Haenszel test of a common association over 2×2 strata, with the continuity
 * correction applied as R's mantelhaen.test applies it (only when |Σa − ΣE(a)| ≥ 0.5). Counts as they are.
 */
function cmhTest(strata: Stratum[], correct: boolean): { chiSquare: number; pValue: number } {
  let delta = 0;
  let variance = 0;
  for (const { a, n1, c, n0 } of strata) {
    const N = n1 + n0;
    const m1 = a + c;
    delta += a - (n1 * m1) / N;
    if (N > 1) variance += (n1 * n0 * m1 * (N - m1)) / (N * N * (N - 1));
  }
  // Every stratum all contaminated or all clean: nothing varies, nothing to reject.
  if (variance === 0) return { chiSquare: 0, pValue: 1 };
  const yates = correct && Math.abs(delta) >= 0.5 ? 0.5 : 0;
  const chiSquare = (Math.abs(delta) - yates) ** 2 / variance;
  return { chiSquare, pValue: chiSquare1UpperTail(chiSquare) };
}

/** Pooled risk ratio, interval and CMH test; strata without jars on both sides are left out. */
export function mantelHaenszel(strata: Stratum[], { correct = true } = {}): MantelHaenszel {
  strata.forEach(checkStratum);
  const used = strata.filter((s) => s.n1 > 0 && s.n0 > 0);
  if (used.length === 0) return { rr: NaN, ci95: [NaN, NaN], chiSquare: NaN, pValue: NaN, contributing: 0 };
  return { ...pooledRiskRatio(used), ...cmhTest(used, correct), contributing: used.length };
}

/** Mantel–Haenszel common odds ratio Σ(a·d/N) / Σ(b·c/N), for checks against published odds-ratio examples. */
export function mantelHaenszelOddsRatio(strata: Stratum[]): number {
  strata.forEach(checkStratum);
  let num = 0;
  let den = 0;
  for (const { a, n1, c, n0 } of strata) {
    const N = n1 + n0;
    if (N === 0) continue;
    num += (a * (n0 - c)) / N;
    den += ((n1 - a) * c) / N;
  }
  return num / den;
}
