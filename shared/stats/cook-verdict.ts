import type { F0Source, LogPlacement } from '../enums';

/**
 * How a cook run is judged (DESIGN §4.6). Only a log from a probe at the jar centre measures the dose
 * the grain received, so only such a log is held to the F0 target. A chamber log and the estimate from
 * minutes at the steam temperature can only overstate it: they never pass a run; the minutes at pressure
 * are judged against the container's minimum instead.
 */
export type CookJudgedBy = 'centre-probe' | 'minutes' | 'unjudged';

export interface CookFacts {
  f0: number | null;
  f0Source: F0Source | null;
  logPlacement: LogPlacement | null;
  minutesAtPressure: number;
  container: string | null;
}

export interface CookRule {
  lethalityTarget: number;
  /** Container name → least whole minutes at pressure (about 103 kPa gauge). */
  containerMinutes: Record<string, number>;
}

export interface CookVerdict {
  judgedBy: CookJudgedBy;
  /** The F0 shown is an upper bound on the jar centre's dose: it cannot pass a run. */
  f0UpperBound: boolean;
  minimumMinutes: number | null;
  belowTarget: boolean;
}

/** The container's minimum, matched case-insensitively (imports write containers as typed). */
export function containerMinimum(container: string | null, minutes: Record<string, number>): number | null {
  if (!container) return null;
  const key = container.trim().toLowerCase();
  const hit = Object.entries(minutes).find(([name]) => name.trim().toLowerCase() === key);
  return hit ? hit[1] : null;
}

export function judgeCook(run: CookFacts, rule: CookRule): CookVerdict {
  const centre = run.f0Source === 'log' && run.logPlacement === 'centre' && run.f0 !== null;
  const minimumMinutes = containerMinimum(run.container, rule.containerMinutes);
  if (centre)
    return {
      judgedBy: 'centre-probe',
      f0UpperBound: false,
      minimumMinutes,
      belowTarget: run.f0! < rule.lethalityTarget,
    };
  if (minimumMinutes === null)
    return { judgedBy: 'unjudged', f0UpperBound: run.f0 !== null, minimumMinutes, belowTarget: false };
  return {
    judgedBy: 'minutes',
    f0UpperBound: run.f0 !== null,
    minimumMinutes,
    belowTarget: run.minutesAtPressure < minimumMinutes,
  };
}

/**
 * Defaults at about 103 kPa gauge (15 psi), the lower ends of what the trade uses — common practice,
 * no single published source (shared/TRADE.md §1): 1 L jars 90 min, 2 L jars about 120 min, 3 kg
 * bags 150–210 min. A lab sets its own.
 */
export const defaultContainerMinutes: Record<string, number> = {
  '1 L jar': 90,
  '2 L jar': 120,
  '3 kg bag': 150,
};
