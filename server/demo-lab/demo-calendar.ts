const DAY = 86_400_000;
const toTime = (date: string) => Date.parse(`${date}T00:00:00Z`);

export const addDays = (date: string, days: number) => new Date(toTime(date) + days * DAY).toISOString().slice(0, 10);

/** 1 = Monday … 7 = Sunday. */
export const isoWeekday = (date: string) => ((new Date(toTime(date)).getUTCDay() + 6) % 7) + 1;

export const mondayOf = (date: string) => addDays(date, 1 - isoWeekday(date));

/** ISO-8601 week label, by the ISO week-year: the week holding the year's first Thursday is W01. */
export function isoWeek(date: string): string {
  const thursday = addDays(date, 4 - isoWeekday(date));
  const year = Number(thursday.slice(0, 4));
  const week = Math.floor((toTime(thursday) - toTime(`${year}-01-01`)) / (7 * DAY)) + 1;
  return `${year}-W${String(week).padStart(2, '0')}`;
}
