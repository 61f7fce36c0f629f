import type { RateComparison } from '../../shared/schemas/analysis-actions';
import { fisherExactTwoSided } from '../../shared/stats/fisher';
import { newcombeDifference } from '../../shared/stats/newcombe';

export interface Proportion {
  jars: number;
  contaminated: number;
}

/**
 * After minus before: the difference of the two rates with Newcombe's (1998) method-10 interval and
 * the two-sided Fisher exact p-value of the 2×2 table. Without jars on either side there is nothing to compare.
 */
export function compareRates(before: Proportion, after: Proportion): RateComparison {
  if (before.jars === 0 || after.jars === 0) return { difference: null, ci95: [null, null], pValue: null };
  const d = newcombeDifference(after.contaminated, after.jars, before.contaminated, before.jars);
  const pValue = fisherExactTwoSided(
    after.contaminated,
    after.jars - after.contaminated,
    before.contaminated,
    before.jars - before.contaminated,
  );
  return { difference: d.difference, ci95: d.ci95, pValue };
}
