const TABLE_SIZE = 256;
const table = new Float64Array(TABLE_SIZE);
for (let k = 2; k < TABLE_SIZE; k++) table[k] = (table[k - 1] ?? 0) + Math.log(k);

const HALF_LOG_TWO_PI = 0.5 * Math.log(2 * Math.PI);

function stirling(k: number): number {
  const inv = 1 / k;
  const inv2 = inv * inv;
  const series = inv * (1 / 12 - inv2 * (1 / 360 - inv2 * (1 / 1260 - inv2 / 1680)));
  return k * Math.log(k) - k + HALF_LOG_TWO_PI + 0.5 * Math.log(k) + series;
}

// A causes answer runs thousands of Fisher tests over one population: each Stirling value is worked out
// once and kept (NaN marks a slot not yet filled), so the same k gives the same bits on every call.
const MEMO_LIMIT = 1 << 22;
let memo = new Float64Array(0);

function remembered(k: number): number {
  if (k >= memo.length) {
    const grown = new Float64Array(Math.min(MEMO_LIMIT, Math.max(1024, 2 ** Math.ceil(Math.log2(k + 1)))));
    grown.fill(NaN);
    grown.set(memo);
    memo = grown;
  }
  let v = memo[k]!;
  if (v !== v) memo[k] = v = stirling(k);
  return v;
}

/** ln(k!) for a non-negative integer k: exact table below 256, Stirling series above (error < 1e-20). */
export function logFactorial(k: number): number {
  if (!Number.isInteger(k) || k < 0) throw new RangeError(`logFactorial needs a non-negative integer, got ${k}`);
  if (k < TABLE_SIZE) return table[k] ?? 0;
  return k < MEMO_LIMIT ? remembered(k) : stirling(k);
}
