import type { FactorLevel, Interval } from './analysis';

/** DESIGN.md §4.3: where a row stands once the leads are chosen. */
export const standings = ['lead', 'same-jars', 'explained', 'elevated', 'not-elevated'] as const;
export type Standing = (typeof standings)[number];

/** Mantel–Haenszel relative risk of a level against its rest, stratified by the leads in `given`. */
export interface AdjustedRisk {
  given: FactorLevel[];
  relativeRisk: number;
  rr95: Interval;
  /** Two-sided Cochran–Mantel–Haenszel test with the continuity correction. */
  pValue: number;
}

/** Settled jars only (DESIGN.md §3); `incubating` counts the level's jars left out as still at risk. */
export interface CauseRow extends FactorLevel {
  jars: number;
  contaminated: number;
  incubating: number;
  restJars: number;
  restContaminated: number;
  rate: number;
  restRate: number;
  relativeRisk: number;
  rr95: Interval;
  pValue: number;
  qValue: number;
  confoundedWith: FactorLevel[];
  standing: Standing;
  /** The leads this level shares ≥ 90 % of its settled jars with, both ways. */
  sameJarsAs: FactorLevel[];
  adjusted: AdjustedRisk | null;
  hint: string | null;
  /** Where the hint comes from: the trade's common practice, or a named source beside it. */
  hintBasis: string | null;
  /** Contaminant code → jars, over this level's contaminated jars. */
  contaminants: Record<string, number>;
  medianDaysToDetection: number | null;
}

/** A lead in the order chosen, its row, and the levels that hold the same jars as it. */
export interface LeadDto extends FactorLevel {
  row: CauseRow;
  sameJars: FactorLevel[];
}

export interface CausesDto {
  from: string | null;
  to: string | null;
  minJars: number;
  leads: LeadDto[];
  causes: CauseRow[];
  total: number;
  page: number | null;
  pageSize: number | null;
}
