export interface ColonisationCurve {
  grain: string;
  jars: number;
  colonised: number;
  censored: number;
  medianDays: number | null;
  steps: { day: number; atRisk: number; colonised: number; censored: number; stillColonising: number }[];
}

export interface ColonisationDto {
  from: string | null;
  to: string | null;
  curves: ColonisationCurve[];
}
