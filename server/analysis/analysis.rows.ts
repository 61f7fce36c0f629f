import type { Factor } from '../../shared/enums';
import type { ActionSummary } from '../../shared/schemas/analysis-actions';
import type { LethalityRow } from '../../shared/schemas/analysis-lethality';
import { dateText } from '../core/calendar';
import { num, str, type CountRow } from './analysis.queries';

export type CombinationRow = Record<Factor, string | null> &
  CountRow & {
    /** Contaminated jars, and clean ones at least the observation window old (DESIGN.md §3). */
    settled: number;
    detections: string | null;
  };

export interface ColonisationRow {
  grain: string;
  colonised: boolean;
  day: number;
  jars: number;
}

/** A cook run's row as read, before it is judged: the fields the answer shares, named as stored. */
export type LethalityRawRow = Pick<
  LethalityRow,
  'cookedOn' | 'container' | 'minutesAtPressure' | 'gaugeKPa' | 'altitudeM' | 'f0' | 'f0Source' | 'logPlacement'
> & { code: string; jars: number; contaminated: number };

export interface ActionRow {
  id: number;
  factor: Factor | null;
  level: string | null;
  doneOn: string | null;
  summary: ActionSummary;
}
export const actionColumns = 'id, incidentId, what, ownerName, dueOn, doneOn, factor, level';

export function toAction(r: Record<string, unknown>): ActionRow {
  const summary: ActionSummary = {
    id: num(r.id),
    incidentId: num(r.incidentId),
    what: String(r.what),
    ownerName: String(r.ownerName),
    dueOn: dateText(r.dueOn) ?? '',
    doneOn: dateText(r.doneOn),
    factor: (r.factor as Factor | null) ?? null,
    level: str(r.level),
  };
  return { id: summary.id, factor: summary.factor, level: summary.level, doneOn: summary.doneOn, summary };
}
