import { countByStrata, sameJars, adjustedRisk, type Cells, type LevelRef, type StrataCounts } from './lead-strata';

export const MAX_LEADS = 5;
export const ALPHA = 0.05;

/** A tested level that fares worse than its rest (rate > restRate): a candidate lead. */
export interface Candidate extends LevelRef {
  name: string;
}

const compareText = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);

/**
 * DESIGN.md §4.3 forward selection (Mantel & Haenszel 1959; Greenland & Robins 1985). Each round every
 * candidate not chosen and not same-jars with a chosen lead is tested against its rest, stratified by
 * the leads so far; eligible when its adjusted relative risk > 1 and p < 0.05 / (candidates evaluated
 * that round). The eligible one with the smallest p is chosen (ties: larger adjusted relative risk,
 * then factor order, then level). One pass over the cells per round.
 */
export function selectLeads(cells: Cells, candidates: Candidate[]): { leads: LevelRef[]; counts: StrataCounts } {
  const chosen: Candidate[] = [];
  let counts = countByStrata(cells, chosen);
  while (chosen.length < MAX_LEADS) {
    const keepAll = counts.strata - 1;
    const open = candidates.filter(
      (c) => !chosen.includes(c) && !chosen.some((lead, k) => sameJars(counts, cells, c, lead, k)),
    );
    if (open.length === 0) break;
    const bar = ALPHA / open.length;
    let best: { c: Candidate; p: number; rr: number } | null = null;
    for (const c of open) {
      const mh = adjustedRisk(counts, c, keepAll);
      if (!(mh.rr > 1) || !(mh.pValue < bar)) continue;
      const better =
        !best ||
        mh.pValue < best.p ||
        (mh.pValue === best.p &&
          (mh.rr > best.rr ||
            (mh.rr === best.rr && (c.fi < best.c.fi || (c.fi === best.c.fi && compareText(c.name, best.c.name) < 0)))));
      if (better) best = { c, p: mh.pValue, rr: mh.rr };
    }
    if (!best) break;
    chosen.push(best.c);
    // Counted here for the next round, or for the caller's figures once no round follows.
    counts = countByStrata(cells, chosen);
  }
  return { leads: chosen, counts };
}
