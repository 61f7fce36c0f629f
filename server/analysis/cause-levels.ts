import { contaminants, factors, type Contaminant } from '../../shared/enums';
import type { FactorLevel } from '../../shared/schemas/analysis';
import type { CombinationRow } from './analysis.rows';
import { readDetections, type Detections } from './hints';

export const CONFOUNDED_SHARE = 0.9;

export const F = factors.length;
const C = contaminants.length;

/** One factor's levels, numbered in the order they first appear; counts are indexed by level number. */
export interface FactorLevels {
  names: string[];
  /** Settled jars. */
  jars: number[];
  contaminated: number[];
  incubating: number[];
  /** The combinations holding each level, listed level by level: members[start[i]] … members[start[i + 1] − 1]. */
  start: Int32Array;
  members: Int32Array;
}

/** Contaminated jars of every combination, flat: combination ci owns entries detStart[ci] … detStart[ci + 1] − 1. */
export interface ComboDetections {
  detStart: Int32Array;
  days: Float64Array;
  contaminant: Uint8Array;
}

export function readAllDetections(combos: CombinationRow[]): ComboDetections {
  const days: number[] = [];
  const codes: number[] = [];
  const detStart = new Int32Array(combos.length + 1);
  combos.forEach((combo, ci) => {
    readDetections(combo.detections, (d, c) => {
      days.push(d);
      codes.push(c);
    });
    detStart[ci + 1] = days.length;
  });
  return { detStart, days: Float64Array.from(days), contaminant: Uint8Array.from(codes) };
}

/**
 * Numbers each factor's levels and rolls the combinations up per level; each combination's jars count
 * once per factor. levelIdx[ci * F + fi] is combination ci's level of factor fi, −1 where not recorded.
 */
export function indexLevels(combos: CombinationRow[]): { levels: FactorLevels[]; levelIdx: Int32Array } {
  const levelIdx = new Int32Array(combos.length * F);
  const levels = factors.map((factor, fi) => {
    const ids = new Map<string, number>();
    const l: FactorLevels = {
      names: [],
      jars: [],
      contaminated: [],
      incubating: [],
      start: new Int32Array(0),
      members: new Int32Array(0),
    };
    for (let ci = 0; ci < combos.length; ci++) {
      const combo = combos[ci]!;
      const name = combo[factor];
      if (name === null) {
        levelIdx[ci * F + fi] = -1;
        continue;
      }
      let id = ids.get(name);
      if (id === undefined) {
        id = l.names.length;
        ids.set(name, id);
        l.names.push(name);
        l.jars.push(0);
        l.contaminated.push(0);
        l.incubating.push(0);
      }
      levelIdx[ci * F + fi] = id;
      l.jars[id]! += combo.settled;
      l.contaminated[id]! += combo.contaminated;
      l.incubating[id]! += combo.incubating;
    }
    // A counting sort lists the combinations of each level together, for the per-level passes below.
    const start = new Int32Array(l.names.length + 1);
    for (let ci = 0; ci < combos.length; ci++) {
      const id = levelIdx[ci * F + fi]!;
      if (id >= 0) start[id + 1]!++;
    }
    for (let i = 0; i < l.names.length; i++) start[i + 1]! += start[i]!;
    const members = new Int32Array(start[l.names.length]!);
    const fill = start.slice(0, l.names.length);
    for (let ci = 0; ci < combos.length; ci++) {
      const id = levelIdx[ci * F + fi]!;
      if (id >= 0) members[fill[id]!++] = ci;
    }
    l.start = start;
    l.members = members;
    return l;
  });
  return { levels, levelIdx };
}

/**
 * Answers, level by level and only when asked, which level of each other factor holds ≥ 90 % of the
 * level's settled jars. Such a level holds most of them, so a weighted majority vote over the level's
 * combinations names the one candidate per factor, and a second pass counts its jars; candidates come
 * out in factor order. Factors whose largest level is smaller than 90 % of the level are skipped. Only
 * the rows about to be sent ask, so a page costs a few levels' combinations, not every level's.
 */
export function confoundedLevels(
  comboJars: Float64Array,
  levels: FactorLevels[],
  levelIdx: Int32Array,
): (a: number, ia: number) => FactorLevel[] {
  // A factor with one level holds every jar of everything: it says nothing, so it is never named.
  const largest = levels.map((l) => (l.names.length < 2 ? -1 : l.jars.reduce((m, j) => Math.max(m, j), 0)));
  const candidate = new Int32Array(F);
  const weight = new Float64Array(F);
  const eligible = new Int32Array(F);
  const cache = levels.map((l) => new Array<FactorLevel[] | undefined>(l.names.length));
  return (a, ia) => {
    const known = cache[a]![ia];
    if (known) return known;
    const la = levels[a]!;
    const out: FactorLevel[] = [];
    cache[a]![ia] = out;
    const from = la.start[ia]!;
    const to = la.start[ia + 1]!;
    const need = CONFOUNDED_SHARE * la.jars[ia]!;
    let e = 0;
    for (let b = 0; b < F; b++) if (b !== a && largest[b]! >= need) eligible[e++] = b;
    if (e === 0) return out;
    candidate.fill(-1);
    weight.fill(0);
    for (let m = from; m < to; m++) {
      const ci = la.members[m]!;
      const w = comboJars[ci]!;
      for (let k = 0; k < e; k++) {
        const b = eligible[k]!;
        const ib = levelIdx[ci * F + b]!;
        if (ib < 0) continue;
        if (candidate[b] === ib) weight[b]! += w;
        else if (weight[b]! >= w) weight[b]! -= w;
        else {
          candidate[b] = ib;
          weight[b] = w - weight[b]!;
        }
      }
    }
    weight.fill(0);
    for (let m = from; m < to; m++) {
      const ci = la.members[m]!;
      for (let k = 0; k < e; k++) {
        const b = eligible[k]!;
        if (levelIdx[ci * F + b] === candidate[b]) weight[b]! += comboJars[ci]!;
      }
    }
    for (let k = 0; k < e; k++) {
      const b = eligible[k]!;
      if (candidate[b]! >= 0 && weight[b]! >= need)
        out.push({ factor: factors[b]!, level: levels[b]!.names[candidate[b]!]! });
    }
    return out;
  };
}

/** Contaminants and the median days to detection over one level's contaminated jars. */
export function detectionsOf(l: FactorLevels, ia: number, det: ComboDetections, buffer: Float64Array): Detections {
  const counts = new Int32Array(C);
  let n = 0;
  for (let m = l.start[ia]!; m < l.start[ia + 1]!; m++) {
    const ci = l.members[m]!;
    for (let k = det.detStart[ci]!; k < det.detStart[ci + 1]!; k++) {
      buffer[n++] = det.days[k]!;
      counts[det.contaminant[k]!]!++;
    }
  }
  const byContaminant: Partial<Record<Contaminant, number>> = {};
  for (let c = 0; c < C; c++) if (counts[c]! > 0) byContaminant[contaminants[c]!] = counts[c]!;
  let medianDays: number | null = null;
  if (n > 0) {
    const s = buffer.subarray(0, n).sort();
    const mid = n >> 1;
    medianDays = n % 2 ? s[mid]! : (s[mid - 1]! + s[mid]!) / 2;
  }
  return { count: n, contaminants: byContaminant, medianDays };
}
