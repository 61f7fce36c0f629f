import { describe, it, expect } from 'vitest';
import { kaplanMeier, kaplanMeierOfGroups } from '../../../shared/stats/kaplan-meier';
import { sixMpMedian, sixMpSurvival, sixMpTimes } from './six-mp-example';

describe('kaplanMeier', () => {
  // The 6-MP arm of Freireich et al. (1963) as tabulated by Gehan (1965): see six-mp-example.ts.
  const raw = sixMpTimes;
  const times = raw.map((t) => Number.parseInt(t, 10));
  const events = raw.map((t) => !t.endsWith('+'));

  it('reproduces the 6-MP survival curve and median 23', () => {
    const { steps, median } = kaplanMeier(times, events);
    const at = (t: number) => steps.find((s) => s.time === t)?.survival;
    for (const [time, survival] of sixMpSurvival) expect(at(time)).toBeCloseTo(survival, 4);
    expect(median).toBe(sixMpMedian);
  });

  it('gives the same curve from subjects counted per time, in any order and with a time split over groups', () => {
    const groups = [...new Set(times)].reverse().flatMap((time) => {
      const at = times.flatMap((t, i) => (t === time ? [events[i]] : []));
      const withEvent = at.filter(Boolean).length;
      // Each time's subjects in two groups, to show repeats add up.
      return [
        { time, events: withEvent, censored: 0 },
        { time, events: 0, censored: at.length - withEvent },
      ];
    });
    expect(kaplanMeierOfGroups(groups)).toEqual(kaplanMeier(times, events));
    expect(() => kaplanMeierOfGroups([{ time: 1, events: -1, censored: 0 }])).toThrow(RangeError);
  });

  it('counts events before censorings at a tied time and keeps censor-only times as flat steps', () => {
    const { steps } = kaplanMeier(times, events);
    expect(steps[0]).toMatchObject({ time: 6, atRisk: 21, events: 3, censored: 1 });
    expect(steps[0]?.survival).toBeCloseTo(18 / 21, 14);
    const ten = steps.find((s) => s.time === 10);
    expect(ten).toMatchObject({ atRisk: 15, events: 1, censored: 1 });
    const nine = steps.find((s) => s.time === 9);
    expect(nine).toMatchObject({ events: 0, censored: 1, survival: steps[1]?.survival });
    expect(steps).toHaveLength(new Set(times).size);
  });

  it('takes the first time at which survival reaches exactly one half', () => {
    expect(kaplanMeier([1, 2, 3, 4], [true, true, true, true]).median).toBe(2);
    // 0.8 · 2/3 = 0.533 at 3 is still above one half; 0.267 at 4 is the first below.
    expect(kaplanMeier([1, 2, 3, 4, 5], [true, false, true, true, true]).median).toBe(4);
  });

  it('gives no median when the curve stays above one half, and copes with empty input', () => {
    expect(kaplanMeier([3, 5, 8], [true, false, false]).median).toBeNull();
    expect(kaplanMeier([], [])).toEqual({ steps: [], median: null });
  });

  it('drops to 0 when the last jar at risk has the event', () => {
    const { steps, median } = kaplanMeier([2, 4], [false, true]);
    expect(steps[1]?.survival).toBe(0);
    expect(median).toBe(4);
  });

  it('rejects mismatched lengths and non-finite times', () => {
    expect(() => kaplanMeier([1, 2], [true])).toThrow(RangeError);
    expect(() => kaplanMeier([Number.NaN], [true])).toThrow(RangeError);
  });
});
