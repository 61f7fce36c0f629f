// Raw query results (getRawMany, dataSource.query) come back as the driver hands them: BIGINT and
// DECIMAL columns as strings, DATE columns as Dates at UTC midnight (the DataSource runs at timezone Z).
import { dateText } from './calendar';

/** An id or a measure that may be NULL; null and undefined stay null. */
export const numberOrNull = (value: unknown): number | null =>
  value === null || value === undefined ? null : Number(value);

/** A NOT NULL DATE column as YYYY-MM-DD. */
export const dateOnly = (value: Date | string): string => dateText(value) ?? String(value);

export const dateOrNull = (value: Date | string | null | undefined): string | null =>
  value === null || value === undefined ? null : dateOnly(value);
