import type { LogPlacement } from '../enums';
import type { LevelPage } from './analysis';
import type { CookJudgedBy } from '../stats/cook-verdict';

export interface LethalityRow {
  cookRun: string;
  cookedOn: string | null;
  container: string | null;
  minutesAtPressure: number;
  gaugeKPa: number | null;
  altitudeM: number;
  f0: number | null;
  /** log: from the temperature log; estimate: minutes at the steam temperature (an upper bound). */
  f0Source: 'log' | 'estimate' | null;
  /** Where the logged probe sat; null without a log. */
  logPlacement: LogPlacement | null;
  /** The gauge was not recorded, so the estimate assumes the usual 15 psi set-point. */
  assumedGauge: boolean;
  /** centre-probe: F0 against the target; minutes: minutes at pressure against the container's minimum. */
  judgedBy: CookJudgedBy;
  /** The F0 is a chamber figure or an estimate: an upper bound that cannot pass the run. */
  f0UpperBound: boolean;
  minimumMinutes: number | null;
  belowTarget: boolean;
  jars: number;
  contaminated: number;
  rate: number | null;
}

/** A page of the period's cook runs (`total` counts those `only` keeps), newest first. */
export interface LethalityDto extends LevelPage {
  from: string | null;
  to: string | null;
  target: number;
  containerMinutes: Record<string, number>;
  only: 'all' | 'below';
  /** Every cook run of the period, and those below their target, whatever the page and `only`. */
  runsInPeriod: number;
  belowTarget: number;
  runs: LethalityRow[];
}
