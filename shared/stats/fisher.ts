import { logFactorial } from './log-factorial';

/** ln P(X = x) for X ~ Hypergeometric(population N, K successes in it, n drawn). */
export function hypergeometricLogPmf(x: number, N: number, K: number, n: number): number {
  if (x < Math.max(0, n - (N - K)) || x > Math.min(K, n)) return -Infinity;
  return (
    logFactorial(K) -
    logFactorial(x) -
    logFactorial(K - x) +
    logFactorial(N - K) -
    logFactorial(n - x) -
    logFactorial(N - K - n + x) -
    logFactorial(N) +
    logFactorial(n) +
    logFactorial(N - n)
  );
}

const RELATIVE_TOLERANCE = Math.log1p(1e-7);
// exp() below this is 0 in doubles.
const LOG_UNDERFLOW = -750;
// Terms e^-50 (≈ 2e-22) below the observed one cannot move the sum: past them the pmf falls off geometrically.
const LOG_NEGLIGIBLE = 50;

/**
 * Two-sided Fisher exact test for the 2×2 table [[a, b], [c, d]]: the total probability of every
 * table with the same margins that is no more likely than the observed one (R's rule, 1 + 1e-7).
 * The pmf is log-concave, so walking out from the mode visits only the terms that matter; dividing
 * by the visited total cancels the rounding shared by every term's log-factorials.
 */
export function fisherExactTwoSided(a: number, b: number, c: number, d: number): number {
  for (const v of [a, b, c, d]) {
    if (!Number.isInteger(v) || v < 0)
      throw new RangeError(`fisherExactTwoSided needs non-negative integers, got ${v}`);
  }
  const K = a + b;
  const n = a + c;
  const N = a + b + c + d;
  const lo = Math.max(0, n - (N - K));
  const hi = Math.min(K, n);
  if (lo === hi) return 1;

  const limit = hypergeometricLogPmf(a, N, K, n) + RELATIVE_TOLERANCE;
  const cutoff = Math.max(limit - LOG_NEGLIGIBLE, LOG_UNDERFLOW);
  const mode = Math.min(hi, Math.max(lo, Math.floor(((n + 1) * (K + 1)) / (N + 2))));
  let included = 0;
  let total = 0;
  for (const step of [-1, 1]) {
    for (let x = step < 0 ? mode : mode + 1; x >= lo && x <= hi; x += step) {
      const logP = hypergeometricLogPmf(x, N, K, n);
      if (logP < cutoff) break;
      const p = Math.exp(logP);
      total += p;
      if (logP <= limit) included += p;
    }
  }
  return total > 0 ? Math.min(1, included / total) : 0;
}
