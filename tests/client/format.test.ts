import { afterEach, describe, expect, it } from 'vitest';
import { isoWeek, setLabTimeZone } from '../../src/lib/format';

afterEach(() => setLabTimeZone(undefined));

describe('dates on the lab clock', () => {
  // ISO 8601:2004 §3.2.2 / §4.1.4: week 1 holds the year's first Thursday. 1 January 2026 is a Thursday, so
  // 2026 has 53 weeks and Sunday 3 January 2027 closes 2026-W53; Monday 4 January opens 2027-W01.
  // Berlin keeps CET, UTC+1, in January (EU Directive 2000/84/EC: summer time ends the last Sunday of October).
  const lateSunday = new Date('2027-01-03T23:30:00Z');

  it('follows a change of the lab zone after the first date was formatted', () => {
    setLabTimeZone('UTC');
    expect(isoWeek(lateSunday)).toBe('2026-W53');
    setLabTimeZone('Europe/Berlin');
    expect(isoWeek(lateSunday)).toBe('2027-W01');
    setLabTimeZone('UTC');
    expect(isoWeek(lateSunday)).toBe('2026-W53');
  });
});
