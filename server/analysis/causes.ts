import { factors, type Factor } from '../../shared/enums';
import type { AdjustedRisk, CauseRow, LeadDto, Standing } from '../../shared/schemas/analysis-causes';
import type { FactorLevel } from '../../shared/schemas/analysis';
import { bhAdjust } from '../../shared/stats/benjamini-hochberg';
import { fisherExactTwoSided } from '../../shared/stats/fisher';
import { relativeRisk, type RelativeRisk } from '../../shared/stats/relative-risk';
import type { CombinationRow } from './analysis.rows';
import { confoundedLevels, detectionsOf, indexLevels, readAllDetections } from './cause-levels';
import { hintFor } from './hints';
import { selectLeads, type Candidate } from './lead-selection';
import { adjustedRisk, sameJars, type Cells, type LevelRef, type StrataCounts } from './lead-strata';

export { CONFOUNDED_SHARE } from './cause-levels';

const factorOrder = Object.fromEntries(factors.map((f, i) => [f, i])) as Record<Factor, number>;
const compareText = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);
const faresWorse = (r: CauseRow) => r.rate > r.restRate;

/** DESIGN.md §5: rows that fare worse first (rate > restRate), then q, relativeRisk descending, p, factor order, level. */
export function compareCauses(a: CauseRow, b: CauseRow): number {
  return (
    Number(faresWorse(b)) - Number(faresWorse(a)) ||
    a.qValue - b.qValue ||
    b.relativeRisk - a.relativeRisk ||
    a.pValue - b.pValue ||
    factorOrder[a.factor] - factorOrder[b.factor] ||
    compareText(a.level, b.level)
  );
}

const standingOrder: Record<Standing, number> = {
  lead: 0,
  'same-jars': 1,
  elevated: 2,
  explained: 3,
  'not-elevated': 4,
};

/** The screen's order: by standing, then the order of DESIGN.md §5 within each (a stable sort keeps it). */
export const byStanding = (a: CauseRow, b: CauseRow) =>
  standingOrder[a.standing] - standingOrder[b.standing] || compareCauses(a, b);

/** DESIGN.md §4.3: crude interval above 1 and adjusted not → explained; both → elevated. */
function standingOf(row: CauseRow, isLead: boolean): Standing {
  if (isLead) return 'lead';
  if (row.sameJarsAs.length > 0) return 'same-jars';
  const crudeAbove = row.rr95[0] > 1;
  if (!crudeAbove) return 'not-elevated';
  if (row.adjusted === null) return 'elevated';
  return row.adjusted.rr95[0] > 1 ? 'elevated' : 'explained';
}

export interface Causes {
  leads: LeadDto[];
  rows: CauseRow[];
  /** Fills in the contaminants, days to detection and hint of the rows about to be sent (work done per row shown). */
  describe: (shown: CauseRow[]) => void;
}

/**
 * Level vs rest for every level of every factor, over settled jars. The rest is the other jars that
 * record the factor, so a jar without a room never counts against or for any room. Then the leads,
 * adjusted for each other, and every row's adjusted figures and standing.
 */
export function buildCauses(combos: CombinationRow[], minJars: number): Causes {
  const { levels, levelIdx } = indexLevels(combos);
  const det = readAllDetections(combos);
  const buffer = new Float64Array(det.days.length);
  const cells: Cells = {
    settled: Float64Array.from(combos, (c) => c.settled),
    contaminated: Float64Array.from(combos, (c) => c.contaminated),
    levels,
    levelIdx,
  };
  const rows: CauseRow[] = [];
  const refs: LevelRef[] = [];
  const confoundedOf = confoundedLevels(cells.settled, levels, levelIdx);
  // Row number of each tested level, −1 for a level too small to test.
  const rowOf = levels.map((l) => new Int32Array(l.names.length).fill(-1));
  levels.forEach((l, fi) => {
    const factor = factors[fi]!;
    let universeJars = 0;
    let universeContaminated = 0;
    for (let i = 0; i < l.names.length; i++) {
      universeJars += l.jars[i]!;
      universeContaminated += l.contaminated[i]!;
    }
    // Within a factor N and the contaminated total are fixed, so levels of equal size and count share one test.
    const tests = new Map<number, { rr: RelativeRisk; pValue: number }>();
    for (let i = 0; i < l.names.length; i++) {
      const jars = l.jars[i]!;
      const contaminated = l.contaminated[i]!;
      const restJars = universeJars - jars;
      const restContaminated = universeContaminated - contaminated;
      if (jars < Math.max(1, minJars) || restJars < 1) continue;
      const key = jars * (universeContaminated + 1) + contaminated;
      let test = tests.get(key);
      if (!test) {
        test = {
          rr: relativeRisk(contaminated, jars, restContaminated, restJars),
          pValue: fisherExactTwoSided(contaminated, jars - contaminated, restContaminated, restJars - restContaminated),
        };
        tests.set(key, test);
      }
      rows.push({
        factor,
        level: l.names[i]!,
        jars,
        contaminated,
        incubating: l.incubating[i]!,
        restJars,
        restContaminated,
        rate: contaminated / jars,
        restRate: restContaminated / restJars,
        relativeRisk: test.rr.rr,
        rr95: test.rr.ci95,
        pValue: test.pValue,
        qValue: 1,
        confoundedWith: [],
        standing: 'not-elevated',
        sameJarsAs: [],
        adjusted: null,
        hint: null,
        hintBasis: null,
        contaminants: {},
        medianDaysToDetection: null,
      });
      rowOf[fi]![i] = refs.length;
      refs.push({ fi, id: i });
    }
  });
  // Rows are sorted below; this copy keeps each row's place beside its ref for the few rows described.
  const created = rows.slice();
  const q = bhAdjust(rows.map((r) => r.pValue));
  rows.forEach((r, i) => (r.qValue = q[i] ?? 1));

  const candidates: Candidate[] = [];
  rows.forEach((r, i) => faresWorse(r) && candidates.push({ fi: refs[i]!.fi, id: refs[i]!.id, name: r.level }));
  const { leads, counts } = selectLeads(cells, candidates);
  const named = (l: LevelRef): FactorLevel => ({ factor: factors[l.fi]!, level: levels[l.fi]!.names[l.id]! });
  const all = counts.strata - 1;
  const leadNames = leads.map(named);
  // Rows adjusted for the same leads share one list of them.
  const givenByKeep = new Map<number, FactorLevel[]>();
  const givenFor = (keep: number) => {
    let given = givenByKeep.get(keep);
    if (!given) {
      given = leadNames.filter((_, k) => keep & (1 << k));
      givenByKeep.set(keep, given);
    }
    return given;
  };
  const leadRows: CauseRow[] = [];
  const sameJarsOfLead: FactorLevel[][] = leads.map(() => []);
  rows.forEach((row, i) => {
    const ref = refs[i]!;
    const leadIndex = leads.findIndex((l) => l.fi === ref.fi && l.id === ref.id);
    let keep = all;
    if (leadIndex >= 0) keep &= ~(1 << leadIndex);
    leads.forEach((lead, k) => {
      if (leadIndex < 0 && sameJars(counts, cells, ref, lead, k)) {
        keep &= ~(1 << k);
        row.sameJarsAs.push(leadNames[k]!);
        sameJarsOfLead[k]!.push({ factor: row.factor, level: row.level });
      }
    });
    row.adjusted = adjustedFigures(counts, ref, keep, givenFor);
    row.standing = standingOf(row, leadIndex >= 0);
    if (leadIndex >= 0) leadRows[leadIndex] = row;
  });
  const idByName: (Map<string, number> | undefined)[] = [];
  const isTested = (l: FactorLevel) => {
    const fi = factorOrder[l.factor];
    const ids = (idByName[fi] ??= new Map(levels[fi]!.names.map((n, i) => [n, i])));
    const id = ids.get(l.level) ?? -1;
    return id >= 0 && rowOf[fi]![id]! >= 0 ? { fi, id } : null;
  };
  const describe = (shown: CauseRow[]) => {
    for (const r of shown) {
      const ref = refs[created.indexOf(r)]!;
      const d = detectionsOf(levels[ref.fi]!, ref.id, det, buffer);
      r.contaminants = d.contaminants;
      r.medianDaysToDetection = d.medianDays;
      r.confoundedWith = confoundedOf(ref.fi, ref.id);
    }
    addHints(shown, (l) => {
      const ref = isTested(l);
      return ref ? confoundedOf(ref.fi, ref.id) : [];
    });
  };
  return {
    describe,
    leads: leads.map((l, k) => ({
      ...named(l),
      row: leadRows[k]!,
      sameJars: sameJarsOfLead[k]!,
    })),
    rows: rows.sort(compareCauses),
  };
}

function adjustedFigures(
  counts: StrataCounts,
  ref: LevelRef,
  keep: number,
  givenFor: (keep: number) => FactorLevel[],
): AdjustedRisk | null {
  if (keep === 0) return null;
  const mh = adjustedRisk(counts, ref, keep);
  if (mh.contributing === 0) return null;
  return {
    given: givenFor(keep),
    relativeRisk: mh.rr,
    rr95: mh.ci95,
    pValue: mh.pValue,
  };
}

/**
 * Only a level that fares worse gets a trade hint; it says the data cannot tell levels apart only for
 * levels that hold each other's jars both ways (each in the other's confoundedWith, both tested rows).
 */
function addHints(shown: CauseRow[], confoundedWithOf: (l: FactorLevel) => FactorLevel[]) {
  for (const r of shown) {
    if (!faresWorse(r)) continue;
    const mutual = r.confoundedWith.filter((c) =>
      confoundedWithOf(c).some((x) => x.factor === r.factor && x.level === r.level),
    );
    const hint = hintFor(
      r.factor,
      { count: r.contaminated, contaminants: r.contaminants, medianDays: r.medianDaysToDetection },
      mutual,
    );
    r.hint = hint?.hint ?? null;
    r.hintBasis = hint?.basis ?? null;
  }
}
