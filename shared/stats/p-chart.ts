export interface PChartLimits {
  /** NaN when no included point has any jars. */
  pBar: number;
  limits: { ucl: number; lcl: number }[];
}

/**
 * p-chart with a varying sample size: centre Σx/Σn over the included points, 3-sigma limits
 * for each point's own n. A point with n = 0 (or an undefined centre) gets [0, 1], so it can
 * never be out of control.
 */
export function pChartLimits(x: number[], n: number[], include?: boolean[]): PChartLimits {
  if (x.length !== n.length || (include && include.length !== x.length)) {
    throw new RangeError('pChartLimits needs x, n and include of the same length');
  }
  let sumX = 0;
  let sumN = 0;
  x.forEach((xi, i) => {
    const ni = n[i] ?? 0;
    if (!Number.isInteger(xi) || !Number.isInteger(ni) || xi < 0 || xi > ni) {
      throw new RangeError(`pChartLimits needs integers 0 <= x <= n, got x=${xi}, n=${ni} at ${i}`);
    }
    if (include?.[i] ?? true) {
      sumX += xi;
      sumN += ni;
    }
  });
  const pBar = sumN > 0 ? sumX / sumN : NaN;
  const limits = n.map((ni) => {
    if (ni === 0 || Number.isNaN(pBar)) return { ucl: 1, lcl: 0 };
    const spread = 3 * Math.sqrt((pBar * (1 - pBar)) / ni);
    return { ucl: Math.min(1, pBar + spread), lcl: Math.max(0, pBar - spread) };
  });
  return { pBar, limits };
}
