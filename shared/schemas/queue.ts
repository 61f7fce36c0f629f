import type { Contaminant, IncidentStatus } from '../enums';

export interface QueueIncident {
  id: number;
  foundOn: string;
  contaminant: Contaminant;
  status: IncidentStatus;
  jarCount: number;
}

export interface QueueAction {
  id: number;
  incidentId: number;
  what: string;
  ownerName: string;
  dueOn: string;
}

export interface QueueWeek {
  week: string;
  rate: number;
  outOfControl: boolean;
  aboveTarget: boolean;
}

export interface QueueRun {
  id: number;
  code: string;
  cookedOn: string | null;
  container: string | null;
  minutesAtPressure: number;
  minimumMinutes: number | null;
  judgedBy: string;
}

export interface QueueClusterAlert {
  id: number;
  dimension: 'cookRun' | 'culture' | 'session';
  levelId: number;
  levelCode: string;
  incidentCount: number;
  lastFoundOn: string;
}

export interface QueueList<T> {
  items: T[];
  total: number;
}

/** What waits for a supervisor; each list is short, with its total, and each item links to its record. */
export interface QueueDto {
  incidentsToReview: QueueList<QueueIncident>;
  actionsOverdue: QueueList<QueueAction>;
  actionsDueSoon: QueueList<QueueAction>;
  weeks: QueueWeek[];
  target: number;
  runsBelowTarget: QueueList<QueueRun>;
  clusterAlerts: QueueList<QueueClusterAlert>;
}
