const TABLE_SIZE = 256;
const table = new Float64Array(TABLE_SIZE);
for (let k = 2; k < TABLE_SIZE; k++) table[k] = (table[k - 1] ?? 0) + Math.log(k);

const HALF_LOG_TWO_PI = 0.5 * Math.log(2 * Math.PI);

/** ln(k!) for a non-negative integer k: exact table below 256, Stirling series above (error < 1e-20). */
export function logFactorial(k: number): number {
  if (!Number.isInteger(k) || k < 0) throw new RangeError(`logFactorial needs a non-negative integer, got ${k}`);
  if (k < TABLE_SIZE) return table[k] ?? 0;
  const inv = 1 / k;
  const inv2 = inv * inv;
  const series = inv * (1 / 12 - inv2 * (1 / 360 - inv2 * (1 / 1260 - inv2 / 1680)));
  return k * Math.log(k) - k + HALF_LOG_TWO_PI + 0.5 * Math.log(k) + series;
}
