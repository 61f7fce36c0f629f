import type { Factor, LogPlacement } from '../../shared/enums';
import type { ActionSummary } from '../../shared/schemas/analysis-actions';
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

export interface LethalityRawRow {
  code: string;
  cookedOn: string | null;
  container: string | null;
  minutesAtPressure: number;
  gaugeKPa: number | null;
  altitudeM: number;
  f0: number | null;
  f0Source: 'log' | 'estimate' | null;
  logPlacement: LogPlacement | null;
  jars: number;
  contaminated: number;
}

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
