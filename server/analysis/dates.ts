const DAY_MS = 86_400_000;

const toUtc = (date: string) => Date.parse(`${date}T00:00:00Z`);
const fromUtc = (ms: number) => new Date(ms).toISOString().slice(0, 10);

export const addDays = (date: string, days: number) => fromUtc(toUtc(date) + days * DAY_MS);
export const daysBetween = (from: string, to: string) => Math.round((toUtc(to) - toUtc(from)) / DAY_MS);

/** The Monday that starts the ISO week holding a local date. */
export function isoWeekMonday(date: string): string {
  const weekday = new Date(toUtc(date)).getUTCDay() || 7;
  return addDays(date, 1 - weekday);
}

/** DATE columns arrive from the driver as UTC-midnight Dates (the DataSource runs at timezone Z). */
export function dateText(value: unknown): string | null {
  if (value === null || value === undefined) return null;
  if (value instanceof Date) return value.toISOString().slice(0, 10);
  return typeof value === 'string' ? value.slice(0, 10) : null;
}
