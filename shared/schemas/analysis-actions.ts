import type { Factor } from '../enums';
import type { Interval } from './analysis';

export interface PeriodCount {
  from: string;
  to: string;
  jars: number;
  contaminated: number;
  incubating: number;
  rate: number | null;
  ci95: Interval;
}

export interface RateComparison {
  /** after − before; negative means fewer contaminated jars after the action. */
  difference: number | null;
  ci95: [number | null, number | null];
  pValue: number | null;
}

export interface BeforeAfterDto extends RateComparison {
  actionId: number;
  factor: Factor;
  level: string;
  /** The done date: it belongs to neither period. */
  pivot: string;
  days: number;
  /** The after-period ended at least the observation window ago, so every jar in it is settled. */
  settled: boolean;
  /** Until then: days until it has; the comparison fields stay null. */
  daysRemaining: number | null;
  before: PeriodCount;
  after: PeriodCount;
}
export interface ActionSummary {
  id: number;
  incidentId: number;
  what: string;
  ownerName: string;
  dueOn: string;
  doneOn: string | null;
  factor: Factor | null;
  level: string | null;
}

/** A corrective action with its before/after verdict, or why there is none yet. */
export interface ActionVerdictDto extends ActionSummary {
  comparison: BeforeAfterDto | null;
  unavailable: string | null;
}

export interface ActionVerdictsDto {
  items: ActionVerdictDto[];
  total: number;
  page: number;
  pageSize: number;
}
