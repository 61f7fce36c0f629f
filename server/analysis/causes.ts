import { factors, type Factor } from '../../shared/enums';
import type { CauseRow, FactorLevel } from '../../shared/schemas/analysis';
import { bhAdjust } from '../../shared/stats/benjamini-hochberg';
import { fisherExactTwoSided } from '../../shared/stats/fisher';
import { relativeRisk } from '../../shared/stats/relative-risk';
import type { CombinationRow } from './analysis.repository';
import { factorIndex, hintFor, median, parseDetections, type Detections } from './hints';

interface LevelTally {
  level: string;
  jars: number;
  contaminated: number;
  incubating: number;
  detections: Detections;
  confoundedWith: FactorLevel[];
}

export const CONFOUNDED_SHARE = 0.9;

/**
 * Rolls the combinations up per factor level; each combination's jars count once per factor.
 * Levels are numbered per factor first, so the pairwise overlap for confoundedWith is counted on
 * integer keys rather than nested maps of strings.
 */
function tallyLevels(combos: CombinationRow[]): Map<Factor, LevelTally[]> {
  const index = factors.map(() => new Map<string, number>());
  const tallies: LevelTally[][] = factors.map(() => []);
  const levelIdx = new Int32Array(combos.length * factors.length);
  combos.forEach((combo, ci) => {
    const detections = parseDetections(combo.detections);
    factors.forEach((factor, fi) => {
      const level = combo[factor];
      if (level === null) {
        levelIdx[ci * factors.length + fi] = -1;
        return;
      }
      const ids = index[fi]!;
      let id = ids.get(level);
      if (id === undefined) {
        id = ids.size;
        ids.set(level, id);
        tallies[fi]!.push({
          level,
          jars: 0,
          contaminated: 0,
          incubating: 0,
          detections: { days: [], contaminants: {} },
          confoundedWith: [],
        });
      }
      levelIdx[ci * factors.length + fi] = id;
      const t = tallies[fi]![id]!;
      t.jars += combo.jars;
      t.contaminated += combo.contaminated;
      t.incubating += combo.incubating;
      if (detections.days.length > 0) {
        for (const d of detections.days) t.detections.days.push(d);
        for (const [c, n] of Object.entries(detections.contaminants) as [keyof Detections['contaminants'], number][]) {
          t.detections.contaminants[c] = (t.detections.contaminants[c] ?? 0) + n;
        }
      }
    });
  });
  const F = factors.length;
  for (let a = 0; a < F; a++) {
    const levelsA = tallies[a]!;
    if (levelsA.length === 0) continue;
    // Combinations listed per level of a (a counting sort), then one pass per other factor with a reused tally array.
    const start = new Int32Array(levelsA.length + 1);
    for (let ci = 0; ci < combos.length; ci++) {
      const ia = levelIdx[ci * F + a]!;
      if (ia >= 0) start[ia + 1]!++;
    }
    for (let i = 0; i < levelsA.length; i++) start[i + 1]! += start[i]!;
    const members = new Int32Array(start[levelsA.length]!);
    const fill = start.slice(0, levelsA.length);
    for (let ci = 0; ci < combos.length; ci++) {
      const ia = levelIdx[ci * F + a]!;
      if (ia >= 0) members[fill[ia]!++] = ci;
    }
    for (let b = 0; b < F; b++) {
      const levelsB = tallies[b]!;
      if (a === b || levelsB.length === 0) continue;
      const sums = new Float64Array(levelsB.length);
      const touched: number[] = [];
      for (let ia = 0; ia < levelsA.length; ia++) {
        const ta = levelsA[ia]!;
        for (let m = start[ia]!; m < start[ia + 1]!; m++) {
          const ci = members[m]!;
          const ib = levelIdx[ci * F + b]!;
          if (ib < 0) continue;
          if (sums[ib] === 0) touched.push(ib);
          sums[ib]! += combos[ci]!.jars;
        }
        for (const ib of touched) {
          if (sums[ib]! >= CONFOUNDED_SHARE * ta.jars)
            ta.confoundedWith.push({ factor: factors[b]!, level: levelsB[ib]!.level });
          sums[ib] = 0;
        }
        touched.length = 0;
      }
    }
  }
  for (const list of tallies) {
    for (const t of list) {
      t.confoundedWith.sort((x, y) => factorIndex(x.factor) - factorIndex(y.factor) || compareText(x.level, y.level));
    }
  }
  return new Map(factors.map((f, fi) => [f, tallies[fi]!]));
}

const compareText = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);

/** DESIGN.md §5: relativeRisk > 1 first, then q, relativeRisk descending, p, factor order, level. */
export function compareCauses(a: CauseRow, b: CauseRow): number {
  return (
    Number(b.relativeRisk > 1) - Number(a.relativeRisk > 1) ||
    a.qValue - b.qValue ||
    b.relativeRisk - a.relativeRisk ||
    a.pValue - b.pValue ||
    factorIndex(a.factor) - factorIndex(b.factor) ||
    compareText(a.level, b.level)
  );
}

/**
 * Level vs rest for every level of every factor. The rest is the other jars that record the factor,
 * so a jar without a room never counts against or for any room.
 */
export function buildCauses(combos: CombinationRow[], minJars: number): CauseRow[] {
  const rows: CauseRow[] = [];
  for (const [factor, levels] of tallyLevels(combos)) {
    let universeJars = 0;
    let universeContaminated = 0;
    for (const t of levels) {
      universeJars += t.jars;
      universeContaminated += t.contaminated;
    }
    for (const t of levels) {
      const level = t.level;
      const restJars = universeJars - t.jars;
      const restContaminated = universeContaminated - t.contaminated;
      if (t.jars < minJars || restJars < 1) continue;
      const rr = relativeRisk(t.contaminated, t.jars, restContaminated, restJars);
      const pValue = fisherExactTwoSided(
        t.contaminated,
        t.jars - t.contaminated,
        restContaminated,
        restJars - restContaminated,
      );
      const confoundedWith = t.confoundedWith;
      // Only a level that fares worse than its rest is a likely cause, so only it gets a trade hint.
      const hint = rr.rr > 1 ? hintFor(factor, t.detections, confoundedWith) : null;
      rows.push({
        factor,
        level,
        jars: t.jars,
        contaminated: t.contaminated,
        incubating: t.incubating,
        restJars,
        restContaminated,
        rate: t.contaminated / t.jars,
        restRate: restContaminated / restJars,
        relativeRisk: rr.rr,
        rr95: rr.ci95,
        pValue,
        qValue: 1,
        confoundedWith,
        hint: hint?.hint ?? null,
        hintBasis: hint?.basis ?? null,
        contaminants: t.detections.contaminants,
        medianDaysToDetection: median(t.detections.days),
      });
    }
  }
  const q = bhAdjust(rows.map((r) => r.pValue));
  rows.forEach((r, i) => (r.qValue = q[i] ?? 1));
  return rows.sort(compareCauses);
}
