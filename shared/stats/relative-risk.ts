import { Z_95 } from './wilson';

export interface RelativeRisk {
  rr: number;
  ci95: [number, number];
}

/**
 * Risk a/n1 relative to c/n2 with the log-method (Katz) 95 % interval.
 * A zero cell adds 0.5 to all four cells, for the estimate and the interval alike.
 * With n1 = 0 or n2 = 0 there is no risk to compare, so every field is NaN.
 */
export function relativeRisk(a: number, n1: number, c: number, n2: number): RelativeRisk {
  for (const v of [a, n1, c, n2]) {
    if (!Number.isInteger(v) || v < 0) throw new RangeError(`relativeRisk needs non-negative integers, got ${v}`);
  }
  if (a > n1 || c > n2) throw new RangeError(`relativeRisk needs a <= n1 and c <= n2`);
  if (n1 === 0 || n2 === 0) return { rr: NaN, ci95: [NaN, NaN] };

  const cells = [a, n1 - a, c, n2 - c];
  const shift = cells.includes(0) ? 0.5 : 0;
  const [e1, f1, e2, f2] = cells.map((v) => v + shift) as [number, number, number, number];
  const rr = e1 / (e1 + f1) / (e2 / (e2 + f2));
  const se = Math.sqrt(1 / e1 - 1 / (e1 + f1) + 1 / e2 - 1 / (e2 + f2));
  return { rr, ci95: [rr * Math.exp(-Z_95 * se), rr * Math.exp(Z_95 * se)] };
}
