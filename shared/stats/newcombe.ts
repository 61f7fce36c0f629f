import { wilsonInterval } from './wilson';

export interface ProportionDifference {
  difference: number;
  ci95: [number, number];
}

/**
 * p1 − p2 for two independent proportions, 95 % interval by Newcombe's hybrid score method
 * (method 10): each side combines the distances from each estimate to its own Wilson limit.
 * A group with n = 0 leaves the difference undefined (NaN).
 */
export function newcombeDifference(x1: number, n1: number, x2: number, n2: number): ProportionDifference {
  const [l1, u1] = wilsonInterval(x1, n1);
  const [l2, u2] = wilsonInterval(x2, n2);
  if (n1 === 0 || n2 === 0) return { difference: NaN, ci95: [NaN, NaN] };
  const p1 = x1 / n1;
  const p2 = x2 / n2;
  const difference = p1 - p2;
  const below = Math.hypot(p1 - l1, u2 - p2);
  const above = Math.hypot(u1 - p1, p2 - l2);
  return { difference, ci95: [Math.max(-1, difference - below), Math.min(1, difference + above)] };
}
