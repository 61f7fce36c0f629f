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

/** Strata as parallel arrays; the first `count` entries are read. For callers that pool many levels. */
export interface StrataArrays {
  a: Float64Array;
  n1: Float64Array;
  c: Float64Array;
  n0: Float64Array;
  count: number;
}

/**
 * Mantel & Haenszel (1959) risk ratio with the Greenland & Robins (1985) variance of its log: sums
 * R = Σ a·n0/N, S = Σ c·n1/N, V = Σ (n1·n0·(a + c)/N² − a·c/N).
 */
function pooledSums(s: StrataArrays, shift: number) {
  let r = 0;
  let q = 0;
  let v = 0;
  for (let i = 0; i < s.count; i++) {
    if (s.n1[i]! === 0 || s.n0[i]! === 0) continue;
    const a = s.a[i]! + shift;
    const c = s.c[i]! + shift;
    const n1 = s.n1[i]! + 2 * shift;
    const n0 = s.n0[i]! + 2 * shift;
    const N = n1 + n0;
    r += (a * n0) / N;
    q += (c * n1) / N;
    v += (n1 * n0 * (a + c)) / (N * N) - (a * c) / N;
  }
  return { r, q, v };
}

/**
 * Pooled risk ratio and interval, and the Cochran–Mantel–Haenszel test with the continuity correction
 * applied as R's mantelhaen.test applies it (only when |Σa − ΣE(a)| ≥ 0.5), on the counts as they are.
 * Strata without jars on both sides are left out. When either pooled sum is zero the ratio is 0 or
 * infinite, so 0.5 is added to the four cells of every contributing stratum for the estimate and
 * interval (DESIGN.md §4.3), as the crude ratio does. Inputs are trusted: mantelHaenszel() checks them.
 */
export function mantelHaenszelArrays(s: StrataArrays, { correct = true } = {}): MantelHaenszel {
  let contributing = 0;
  let delta = 0;
  let variance = 0;
  for (let i = 0; i < s.count; i++) {
    const n1 = s.n1[i]!;
    const n0 = s.n0[i]!;
    if (n1 === 0 || n0 === 0) continue;
    contributing++;
    const N = n1 + n0;
    const m1 = s.a[i]! + s.c[i]!;
    delta += s.a[i]! - (n1 * m1) / N;
    if (N > 1) variance += (n1 * n0 * m1 * (N - m1)) / (N * N * (N - 1));
  }
  if (contributing === 0) return { rr: NaN, ci95: [NaN, NaN], chiSquare: NaN, pValue: NaN, contributing };
  let { r, q, v } = pooledSums(s, 0);
  if (r === 0 || q === 0) ({ r, q, v } = pooledSums(s, 0.5));
  const rr = r / q;
  const se = Math.sqrt(v / (r * q));
  // Every stratum all contaminated or all clean: nothing varies, nothing to reject.
  let chiSquare = 0;
  let pValue = 1;
  if (variance > 0) {
    const yates = correct && Math.abs(delta) >= 0.5 ? 0.5 : 0;
    chiSquare = (Math.abs(delta) - yates) ** 2 / variance;
    pValue = chiSquare1UpperTail(chiSquare);
  }
  return { rr, ci95: [rr * Math.exp(-Z_95 * se), rr * Math.exp(Z_95 * se)], chiSquare, pValue, contributing };
}

function checkStratum(s: Stratum) {
  for (const v of [s.a, s.n1, s.c, s.n0]) {
    if (!Number.isInteger(v) || v < 0) throw new RangeError(`mantelHaenszel needs non-negative integers, got ${v}`);
  }
  if (s.a > s.n1 || s.c > s.n0) throw new RangeError('mantelHaenszel needs a <= n1 and c <= n0');
}

/** Pooled risk ratio, interval and CMH test over 2×2 strata, inputs checked. */
export function mantelHaenszel(strata: Stratum[], options: { correct?: boolean } = {}): MantelHaenszel {
  strata.forEach(checkStratum);
  return mantelHaenszelArrays(
    {
      a: Float64Array.from(strata, (s) => s.a),
      n1: Float64Array.from(strata, (s) => s.n1),
      c: Float64Array.from(strata, (s) => s.c),
      n0: Float64Array.from(strata, (s) => s.n0),
      count: strata.length,
    },
    options,
  );
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
