import { mantelHaenszelArrays, type MantelHaenszel, type StrataArrays } from '../../shared/stats/mantel-haenszel';
import { CONFOUNDED_SHARE, F, type FactorLevels } from './cause-levels';

/** Leads are at most five (DESIGN.md §4.3), so strata at most 2^5. */
export const MAX_STRATA_BITS = 5;

/** A level by number: factor index and level number within it. */
export interface LevelRef {
  fi: number;
  id: number;
}

/** What the stratified passes read: each combination's settled and contaminated jars and its levels. */
export interface Cells {
  settled: Float64Array;
  contaminated: Float64Array;
  levels: FactorLevels[];
  levelIdx: Int32Array;
}

/**
 * Settled and contaminated jars per level per stratum, and per factor per stratum (over the jars that
 * record the factor, the level's rest included). A jar's stratum is its membership pattern in the
 * leads: bit k set when it belongs to lead k. One pass over the cells.
 */
export interface StrataCounts {
  strata: number;
  levelJars: Float64Array[];
  levelContaminated: Float64Array[];
  totalJars: Float64Array[];
  totalContaminated: Float64Array[];
}

export function countByStrata(cells: Cells, leads: LevelRef[]): StrataCounts {
  const S = 1 << leads.length;
  const { levels, levelIdx, settled, contaminated } = cells;
  const out: StrataCounts = {
    strata: S,
    levelJars: levels.map((l) => new Float64Array(l.names.length * S)),
    levelContaminated: levels.map((l) => new Float64Array(l.names.length * S)),
    totalJars: levels.map(() => new Float64Array(S)),
    totalContaminated: levels.map(() => new Float64Array(S)),
  };
  for (let ci = 0; ci < settled.length; ci++) {
    const n = settled[ci]!;
    if (n === 0) continue;
    const x = contaminated[ci]!;
    let s = 0;
    for (let k = 0; k < leads.length; k++) if (levelIdx[ci * F + leads[k]!.fi] === leads[k]!.id) s |= 1 << k;
    for (let fi = 0; fi < F; fi++) {
      const id = levelIdx[ci * F + fi]!;
      if (id < 0) continue;
      out.levelJars[fi]![id * S + s]! += n;
      out.levelContaminated[fi]![id * S + s]! += x;
      out.totalJars[fi]![s]! += n;
      out.totalContaminated[fi]![s]! += x;
    }
  }
  return out;
}

// Scratch strata for one level at a time: at most 2^5 strata, reused so the passes allocate nothing.
const scratch: StrataArrays = {
  a: new Float64Array(1 << MAX_STRATA_BITS),
  n1: new Float64Array(1 << MAX_STRATA_BITS),
  c: new Float64Array(1 << MAX_STRATA_BITS),
  n0: new Float64Array(1 << MAX_STRATA_BITS),
  count: 0,
};

/**
 * The level-vs-rest strata given only the leads whose bits are in `keep`: strata that differ in the
 * other bits are added together. Filled into the shared scratch arrays (read them before the next call).
 */
export function strataOf(c: StrataCounts, level: LevelRef, keep: number): StrataArrays {
  const { a, n1, c: rest, n0 } = scratch;
  a.fill(0, 0, c.strata);
  n1.fill(0, 0, c.strata);
  rest.fill(0, 0, c.strata);
  n0.fill(0, 0, c.strata);
  const base = level.id * c.strata;
  const lj = c.levelJars[level.fi]!;
  const lc = c.levelContaminated[level.fi]!;
  const tj = c.totalJars[level.fi]!;
  const tc = c.totalContaminated[level.fi]!;
  for (let s = 0; s < c.strata; s++) {
    const t = s & keep;
    a[t]! += lc[base + s]!;
    n1[t]! += lj[base + s]!;
    rest[t]! += tc[s]! - lc[base + s]!;
    n0[t]! += tj[s]! - lj[base + s]!;
  }
  scratch.count = c.strata;
  return scratch;
}

export function adjustedRisk(c: StrataCounts, level: LevelRef, keep: number): MantelHaenszel {
  return mantelHaenszelArrays(strataOf(c, level, keep));
}

/** Settled jars of the level that also belong to lead k (bit k of the strata). */
export function overlap(c: StrataCounts, level: LevelRef, k: number): number {
  let n = 0;
  const base = level.id * c.strata;
  for (let s = 0; s < c.strata; s++) if (s & (1 << k)) n += c.levelJars[level.fi]![base + s]!;
  return n;
}

/** DESIGN.md §4.3: two levels are same-jars when each holds ≥ 90 % of the other's settled jars. */
export function sameJars(c: StrataCounts, cells: Cells, level: LevelRef, lead: LevelRef, k: number): boolean {
  if (level.fi === lead.fi) return false;
  const mine = cells.levels[level.fi]!.jars[level.id]!;
  const theirs = cells.levels[lead.fi]!.jars[lead.id]!;
  // Sizes alone rule most pairs out: neither can hold 90 % of a much larger one.
  if (mine < CONFOUNDED_SHARE * theirs || theirs < CONFOUNDED_SHARE * mine) return false;
  const shared = overlap(c, level, k);
  return shared >= CONFOUNDED_SHARE * mine && shared >= CONFOUNDED_SHARE * theirs;
}
