export interface WeeklyGrain {
  grain: string;
  jars: number;
  contaminated: number;
  incubating: number;
  rate: number;
}

export interface WeeklyRow {
  week: string;
  jars: number;
  contaminated: number;
  incubating: number;
  rate: number;
  ucl: number;
  lcl: number;
  /** Above the upper limit: unusually many contaminated jars. */
  outOfControl: boolean;
  /** Below the lower limit: unusually few, a good signal and never an alarm. */
  belowLcl: boolean;
  /** Settled and above the lab's accepted rate, in control or not (DESIGN §4.4). */
  aboveTarget: boolean;
  provisional: boolean;
  grains: WeeklyGrain[];
}

export interface WeeklyDto {
  from: string;
  to: string;
  pBar: number | null;
  /** The contamination rate the lab accepts (a lab setting), a fraction. */
  target: number;
  observationWindowDays: number;
  weeks: WeeklyRow[];
}
