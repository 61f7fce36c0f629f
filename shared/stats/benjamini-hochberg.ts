/** Benjamini–Hochberg step-up q-values, returned in the input order and capped at 1. */
export function bhAdjust(pValues: number[]): number[] {
  for (const p of pValues) {
    if (!(p >= 0 && p <= 1)) throw new RangeError(`bhAdjust needs p-values in [0, 1], got ${p}`);
  }
  const m = pValues.length;
  const order = pValues.map((p, i) => ({ p, i })).sort((u, v) => u.p - v.p);
  const q = new Array<number>(m);
  let running = 1;
  for (let rank = m; rank >= 1; rank--) {
    const entry = order[rank - 1];
    if (!entry) continue;
    running = Math.min(running, (entry.p * m) / rank);
    q[entry.i] = running;
  }
  return q;
}
