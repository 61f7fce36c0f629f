// Dates and times show on the lab's clock (its time-zone setting), not the browser's or the server's:
// a supervisor reading from home and the lab's own screens agree on "today" and on each event's hour.
let labTimeZone: string | undefined;

/** Set once the lab settings are read; until then the browser's zone is the best guess. */
export function setLabTimeZone(timeZone: string | undefined) {
  labTimeZone = timeZone;
}

// Making a formatter costs far more than using one (a jar's timeline dates dozens of events on a phone's
// first render), so each locale, zone and option set is made once.
const formatters = new Map<string, Intl.DateTimeFormat>();
function formatter(locale: string | undefined, options: Intl.DateTimeFormatOptions): Intl.DateTimeFormat {
  const key = JSON.stringify([locale, options]);
  let made = formatters.get(key);
  if (!made) formatters.set(key, (made = new Intl.DateTimeFormat(locale, options)));
  return made;
}

const inZone = (options: Intl.DateTimeFormatOptions) => formatter(undefined, { ...options, timeZone: labTimeZone });

/** Calendar parts of an instant on the lab's clock. */
function labParts(date: Date): { year: number; month: number; day: number; hour: number } {
  const parts = formatter('en-CA', {
    timeZone: labTimeZone,
    year: 'numeric',
    month: '2-digit',
    day: '2-digit',
    hour: '2-digit',
    hourCycle: 'h23',
  }).formatToParts(date);
  const get = (t: string) => Number(parts.find((p) => p.type === t)?.value ?? 0);
  return { year: get('year'), month: get('month'), day: get('day'), hour: get('hour') };
}

const dateOnly = /^\d{4}-\d{2}-\d{2}$/;

export function formatDate(value: string | Date): string {
  // A local date (YYYY-MM-DD) is already the lab's calendar day: show it as written, not shifted by a zone.
  if (typeof value === 'string' && dateOnly.test(value)) {
    const d = new Date(`${value}T00:00:00Z`);
    return Number.isNaN(d.getTime()) ? '—' : formatter(undefined, { dateStyle: 'medium', timeZone: 'UTC' }).format(d);
  }
  const date = typeof value === 'string' ? new Date(value) : value;
  return Number.isNaN(date.getTime()) ? '—' : inZone({ dateStyle: 'medium' }).format(date);
}

export function formatDateTime(value: string | Date): string {
  const date = typeof value === 'string' ? new Date(value) : value;
  return Number.isNaN(date.getTime()) ? '—' : inZone({ dateStyle: 'medium', timeStyle: 'short' }).format(date);
}

/** Today's date on the lab's clock as YYYY-MM-DD, the value a date input takes. */
export const todayIso = () => {
  const p = labParts(new Date());
  return `${p.year}-${String(p.month).padStart(2, '0')}-${String(p.day).padStart(2, '0')}`;
};

export const formatLongDate = (date: Date) => inZone({ weekday: 'long', day: 'numeric', month: 'long' }).format(date);

/** ISO-8601 week of the lab's calendar day, labelled by its week-year, e.g. 2027-01-01 → 2026-W53. */
export function isoWeek(date: Date): string {
  const p = labParts(date);
  const d = new Date(Date.UTC(p.year, p.month - 1, p.day));
  const weekday = d.getUTCDay() || 7;
  d.setUTCDate(d.getUTCDate() + 4 - weekday);
  const yearStart = Date.UTC(d.getUTCFullYear(), 0, 1);
  const week = Math.ceil(((d.getTime() - yearStart) / 86_400_000 + 1) / 7);
  return `${d.getUTCFullYear()}-W${String(week).padStart(2, '0')}`;
}

export function greeting(date: Date): string {
  const hour = labParts(date).hour;
  if (hour < 5) return 'Good evening';
  if (hour < 12) return 'Good morning';
  if (hour < 18) return 'Good afternoon';
  return 'Good evening';
}
