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
 * Each combination's stratum, its membership pattern in the leads (bit k set when it belongs to lead k),
 * and per factor the settled and contaminated jars of each stratum over the combinations that record the
 * factor. A level's own strata are summed from its combinations only when asked (strataOf), so a round
 * costs one pass over the cells plus the levels it tests, not every level of every factor.
 */
export interface StrataCounts {
  strata: number;
  cells: Cells;
  stratumOf: Int32Array;
  totalJars: Float64Array[];
  totalContaminated: Float64Array[];
}

export function countByStrata(cells: Cells, leads: LevelRef[]): StrataCounts {
  const S = 1 << leads.length;
  const { levels, levelIdx, settled, contaminated } = cells;
  const stratumOf = new Int32Array(settled.length);
  for (let k = 0; k < leads.length; k++) {
    const lead = levels[leads[k]!.fi]!;
    const id = leads[k]!.id;
    for (let m = lead.start[id]!; m < lead.start[id + 1]!; m++) stratumOf[lead.members[m]!]! |= 1 << k;
  }
  // Every combination per stratum, less, factor by factor, the few that do not record the factor.
  const allJars = new Float64Array(S);
  const allContaminated = new Float64Array(S);
  const totalJars = levels.map(() => new Float64Array(S));
  const totalContaminated = levels.map(() => new Float64Array(S));
  for (let ci = 0; ci < settled.length; ci++) {
    const n = settled[ci]!;
    if (n === 0) continue;
    const x = contaminated[ci]!;
    const s = stratumOf[ci]!;
    allJars[s]! += n;
    allContaminated[s]! += x;
    for (let fi = 0; fi < F; fi++) {
      if (levelIdx[ci * F + fi]! >= 0) continue;
      totalJars[fi]![s]! -= n;
      totalContaminated[fi]![s]! -= x;
    }
  }
  for (let fi = 0; fi < F; fi++) {
    for (let s = 0; s < S; s++) {
      totalJars[fi]![s]! += allJars[s]!;
      totalContaminated[fi]![s]! += allContaminated[s]!;
    }
  }
  return { strata: S, cells, stratumOf, totalJars, totalContaminated };
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
  const { settled, contaminated, levels } = c.cells;
  const l = levels[level.fi]!;
  for (let m = l.start[level.id]!; m < l.start[level.id + 1]!; m++) {
    const ci = l.members[m]!;
    const t = c.stratumOf[ci]! & keep;
    a[t]! += contaminated[ci]!;
    n1[t]! += settled[ci]!;
  }
  const tj = c.totalJars[level.fi]!;
  const tc = c.totalContaminated[level.fi]!;
  rest.fill(0, 0, c.strata);
  n0.fill(0, 0, c.strata);
  for (let s = 0; s < c.strata; s++) {
    rest[s & keep]! += tc[s]!;
    n0[s & keep]! += tj[s]!;
  }
  for (let s = 0; s < c.strata; s++) {
    rest[s]! -= a[s]!;
    n0[s]! -= n1[s]!;
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
  const l = c.cells.levels[level.fi]!;
  for (let m = l.start[level.id]!; m < l.start[level.id + 1]!; m++) {
    const ci = l.members[m]!;
    if (c.stratumOf[ci]! & (1 << k)) n += c.cells.settled[ci]!;
  }
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
