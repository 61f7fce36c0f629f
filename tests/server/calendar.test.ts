import { describe, expect, it } from 'vitest';
import { isoWeekOf, mondayOfIsoWeek } from '../../server/core/calendar';

describe('ISO weeks (ISO 8601:2004, §3.2.2 and §4.1.4: weeks start on Monday; week 1 holds the first Thursday)', () => {
  it('finds the Monday of a week label, across a year boundary and in a 53-week year', () => {
    // ISO 8601 week-date examples as commonly cited (from memory): Monday 29 December 2008 is 2009-W01-1,
    // and Sunday 3 January 2010 is 2009-W53-7, so 2009-W53 starts on 28 December 2009.
    expect(mondayOfIsoWeek('2009-W01')).toBe('2008-12-29');
    expect(mondayOfIsoWeek('2009-W53')).toBe('2009-12-28');
    expect(isoWeekOf('2010-01-03')).toBe('2009-W53');
  });

  it('refuses a label that names no week', () => {
    // 2010 has 52 weeks: its 28 December falls in week 52.
    expect(isoWeekOf('2010-12-28')).toBe('2010-W52');
    expect(mondayOfIsoWeek('2010-W53')).toBeNull();
    expect(mondayOfIsoWeek('2010-W00')).toBeNull();
    expect(mondayOfIsoWeek('rye')).toBeNull();
  });
});
