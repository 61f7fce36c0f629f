import type { Contaminant, Workspace } from '../../shared/enums';

export type Container = '1 L jar' | '2 L jar' | '3 kg bag';

export interface PlanRun {
  code: string;
  cookedOn: string;
  minutes: number;
  container: Container;
  grain: string;
  operator: string;
}

export interface PlanSession {
  code: string;
  heldOn: string;
  operator: string;
  workspace: Workspace;
  startHour: number;
}

export interface PlanJar {
  label: string;
  run: PlanRun;
  session: PlanSession;
  culture: string;
  /** Usually the run's grain; a mixed load holds jars of two. */
  grain: string;
  /** Grain-to-grain: the jar this one was inoculated from (its culture is then the chain's root). */
  parent: PlanJar | null;
  contaminant: Contaminant | null;
  foundOn: string | null;
  /** Days to full colonisation if it stays clean. */
  colonisesIn: number;
  /** Planted or a parent: left out of the background contamination draw. */
  fixed: boolean;
}

/** The demo lab's invented production, planned before it is imported as a history file. */
export interface DemoPlan {
  runs: PlanRun[];
  sessions: PlanSession[];
  jars: PlanJar[];
}
