import { config } from './config';

/** The local calendar date (YYYY-MM-DD) of an instant in the lab's time zone. */
export function localDate(at: Date, timeZone = config().LAB_TIME_ZONE): string {
  const parts = new Intl.DateTimeFormat('en-CA', {
    timeZone,
    year: 'numeric',
    month: '2-digit',
    day: '2-digit',
  }).formatToParts(at);
  const get = (t: string) => parts.find((p) => p.type === t)?.value ?? '';
  return `${get('year')}-${get('month')}-${get('day')}`;
}

export const todayLocal = () => localDate(new Date());
