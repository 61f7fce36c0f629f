import type { Factor } from '../enums';
import type { LevelPage, Tally } from './analysis';

export interface RateRow extends Tally {
  level: string;
}

export interface RatesDto {
  by: Factor;
  from: string | null;
  to: string | null;
  overall: Tally;
  /** Jars in the period without this attribute: left out of the rows. */
  notRecorded: number;
  rows: RateRow[];
}
export type RatesPageDto = RatesDto & LevelPage;

export interface CrosstabCell extends Tally {
  row: string;
  col: string;
}

export interface CrosstabDto {
  rowFactor: Factor;
  colFactor: Factor;
  rows: string[];
  cols: string[];
  cells: CrosstabCell[];
}

/** A window of the grid: `rows`, `cols` and `cells` hold only the levels of the page on each axis. */
export interface CrosstabPageDto extends CrosstabDto {
  rowPage: LevelPage;
  colPage: LevelPage;
}
