/** ISO-8601 week arithmetic on local calendar dates (YYYY-MM-DD), done in UTC so no offset can shift a day. */

const DAY_MS = 86_400_000;

function toUtc(date: string): Date {
  const d = new Date(`${date}T00:00:00Z`);
  if (Number.isNaN(d.getTime())) throw new RangeError(`not a date: ${date}`);
  return d;
}

export const formatDate = (d: Date) => d.toISOString().slice(0, 10);

export function addDays(date: string, days: number): string {
  return formatDate(new Date(toUtc(date).getTime() + days * DAY_MS));
}

/** 1 = Monday … 7 = Sunday. */
export function isoWeekday(date: string): number {
  return ((toUtc(date).getUTCDay() + 6) % 7) + 1;
}

/** The week's label by its ISO week-year: the week belongs to the year that holds its Thursday. */
export function isoWeekOf(date: string): string {
  const thursday = toUtc(addDays(date, 4 - isoWeekday(date)));
  const year = thursday.getUTCFullYear();
  const week = Math.floor((thursday.getTime() - Date.UTC(year, 0, 1)) / (7 * DAY_MS)) + 1;
  return `${year}-W${String(week).padStart(2, '0')}`;
}

export const mondayOf = (date: string) => addDays(date, 1 - isoWeekday(date));

/** The `count` week labels ending with the week holding `lastDate`, oldest first. */
export function weeksEndingAt(lastDate: string, count: number): { week: string; monday: string }[] {
  const lastMonday = mondayOf(lastDate);
  return Array.from({ length: count }, (_, i) => {
    const monday = addDays(lastMonday, -7 * (count - 1 - i));
    return { week: isoWeekOf(monday), monday };
  });
}

/** Weekday and hour of an instant on the lab's wall clock. */
export function labClock(at: Date, timeZone: string): { date: string; weekday: number; hour: number } {
  const parts = new Intl.DateTimeFormat('en-CA', {
    timeZone,
    year: 'numeric',
    month: '2-digit',
    day: '2-digit',
    hour: '2-digit',
    hourCycle: 'h23',
  }).formatToParts(at);
  const get = (t: string) => parts.find((p) => p.type === t)?.value ?? '';
  const date = `${get('year')}-${get('month')}-${get('day')}`;
  return { date, weekday: isoWeekday(date), hour: Number(get('hour')) };
}
