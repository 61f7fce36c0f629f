import { UTCDate } from '@date-fns/utc';
import {
  addDays as addDaysTo,
  differenceInCalendarDays,
  getISODay,
  getISOWeek,
  getISOWeekYear,
  startOfISOWeek,
} from 'date-fns';

/**
 * Calendar dates of the lab (YYYY-MM-DD, the lab's own wall-clock days) held as UTC midnights, so that no
 * offset of the server's clock can shift a day. ISO-8601 week rules come from date-fns.
 */
function utc(date: string): UTCDate {
  const d = new UTCDate(`${date}T00:00:00Z`);
  if (Number.isNaN(d.getTime())) throw new RangeError(`not a date: ${date}`);
  return d;
}

export const formatDate = (d: Date) => d.toISOString().slice(0, 10);

export const addDays = (date: string, days: number) => formatDate(addDaysTo(utc(date), days));

export const daysBetween = (from: string, to: string) => differenceInCalendarDays(utc(to), utc(from));

/** 1 = Monday … 7 = Sunday. */
export const isoWeekday = (date: string) => getISODay(utc(date));

/** The Monday that starts the ISO week holding a date. */
export const mondayOf = (date: string) => formatDate(startOfISOWeek(utc(date)));

/** The week's label by its ISO week-year (the year that holds its Thursday), e.g. 2027-01-01 → 2026-W53. */
export function isoWeekOf(date: string): string {
  const d = utc(date);
  return `${getISOWeekYear(d)}-W${String(getISOWeek(d)).padStart(2, '0')}`;
}

/** The Monday of an ISO week label such as 2026-W53 (null for anything else): week 1 holds 4 January. */
export function mondayOfIsoWeek(label: string): string | null {
  const m = /^(\d{4})-W(\d{2})$/.exec(label);
  if (!m) return null;
  const monday = addDays(mondayOf(`${m[1]}-01-04`), 7 * (Number(m[2]) - 1));
  return isoWeekOf(monday) === label ? monday : null;
}

/** The `count` week labels ending with the week holding `lastDate`, oldest first. */
export function weeksEndingAt(lastDate: string, count: number): { week: string; monday: string }[] {
  const lastMonday = mondayOf(lastDate);
  return Array.from({ length: count }, (_, i) => {
    const monday = addDays(lastMonday, -7 * (count - 1 - i));
    return { week: isoWeekOf(monday), monday };
  });
}

/** DATE columns arrive from the driver as UTC-midnight Dates (the DataSource runs at timezone Z). */
export function dateText(value: unknown): string | null {
  if (value === null || value === undefined) return null;
  if (value instanceof Date) return formatDate(value);
  return typeof value === 'string' ? value.slice(0, 10) : null;
}

/** Date, weekday and hour of an instant on the lab's wall clock. */
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
