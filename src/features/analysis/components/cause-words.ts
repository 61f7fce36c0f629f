import { factorNames } from '../../../../shared/enums';
import type { AdjustedRisk, CauseRow } from '../../../../shared/schemas/analysis-causes';
import type { FactorLevel } from '../../../../shared/schemas/analysis';
import { percent } from './labels';

/** "cook run CR-2614": a level as it reads mid-sentence. */
export const levelWords = (l: FactorLevel) => `${factorNames[l.factor]} ${l.level}`;

export const levelList = (ls: FactorLevel[]) =>
  ls.length <= 1
    ? ls[0]
      ? levelWords(ls[0])
      : ''
    : `${ls.slice(0, -1).map(levelWords).join(', ')} and ${levelWords(ls[ls.length - 1]!)}`;

const times = (v: number) => (Number.isFinite(v) ? `${v < 10 ? v.toFixed(1) : v.toFixed(0)}×` : '—');
const span = (ci: readonly [number, number]) => `${times(ci[0]).slice(0, -1)}–${times(ci[1]).slice(0, -1)}`;

/** "2.1× the rest, 1.4–3.0". */
export const timesRest = (rr: number, ci: readonly [number, number]) => `${times(rr)} the rest, ${span(ci)}`;

/** "28 of 40 settled jars lost (70.0 %) against 6.1 % in the rest". */
export const crudeWords = (r: CauseRow) =>
  `${r.contaminated} of ${r.jars} settled jars lost (${percent(r.rate)}) against ${percent(r.restRate)} in the rest`;

/** "after allowing for cook run CR-… and culture LC-…: 2.1× the rest, 1.4–3.0". */
export const adjustedWords = (a: AdjustedRisk) =>
  `after allowing for ${levelList(a.given)}: ${timesRest(a.relativeRisk, a.rr95)}`;

/** One sentence on where a row stands once the leads are chosen (DESIGN.md §4.3). */
export function standingWords(r: CauseRow, leads: FactorLevel[]): string {
  switch (r.standing) {
    case 'lead':
      return 'A lead: it stands out even after allowing for the other leads.';
    case 'same-jars':
      return `Holds the same jars as ${levelList(r.sameJarsAs)}: the data cannot tell these apart.`;
    case 'explained':
      return r.adjusted
        ? `Explained by ${levelList(r.adjusted.given)}: allowing for them, ${timesRest(r.adjusted.relativeRisk, r.adjusted.rr95)}.`
        : 'Explained by the leads.';
    case 'elevated':
      return r.adjusted
        ? `Still above the rest ${adjustedWords(r.adjusted)}, but weaker than the leads.`
        : 'Above the rest, but weaker than the leads.';
    case 'not-elevated':
      if (r.rate < r.restRate && leads.length > 0)
        return `Lower than the rest because the rest holds the jars of ${levelList(leads)}: it sits beside a lead; it does not protect.`;
      return 'Not clearly above the rest.';
  }
}
