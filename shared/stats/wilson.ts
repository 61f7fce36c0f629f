export const Z_95 = 1.959963984540054;

/**
 * Wilson score interval for x successes in n trials.
 * n = 0 carries no information, so the whole range [0, 1] is returned.
 */
export function wilsonInterval(x: number, n: number, z: number = Z_95): [number, number] {
  if (!Number.isInteger(x) || !Number.isInteger(n) || x < 0 || n < 0 || x > n) {
    throw new RangeError(`wilsonInterval needs integers 0 <= x <= n, got x=${x}, n=${n}`);
  }
  if (n === 0) return [0, 1];
  const p = x / n;
  const z2 = z * z;
  const denom = 1 + z2 / n;
  const centre = (p + z2 / (2 * n)) / denom;
  const half = (z / denom) * Math.sqrt((p * (1 - p)) / n + z2 / (4 * n * n));
  // The bounds at x = 0 and x = n are exactly 0 and 1; rounding would otherwise leave ±1e-17.
  const lo = x === 0 ? 0 : Math.max(0, centre - half);
  const hi = x === n ? 1 : Math.min(1, centre + half);
  return [lo, hi];
}
