import { describe, expect, it } from 'vitest';
import {
  containerMinimum,
  defaultContainerMinutes,
  judgeCook,
  type CookFacts,
} from '../../../shared/stats/cook-verdict';
import { f0AtConstant } from '../../../shared/stats/lethality';

// The rule of DESIGN §4.6; minimums at about 103 kPa gauge are common practice (shared/TRADE.md §1).
const rule = { lethalityTarget: 15, containerMinutes: defaultContainerMinutes };
const run = (over: Partial<CookFacts>): CookFacts => ({
  f0: null,
  f0Source: null,
  logPlacement: null,
  minutesAtPressure: 90,
  container: '1 L jar',
  ...over,
});

describe('judgeCook', () => {
  it('fails a short 1 L run whose estimated F0 is far above the target', () => {
    // 45 min at 120.95 °C (15 psig at sea level, TRADE.md §3 [COMP]) gives F0 ≈ 43.5: an upper bound only.
    const f0 = f0AtConstant(120.95, 45);
    expect(f0).toBeGreaterThan(40);
    expect(judgeCook(run({ f0, f0Source: 'estimate', minutesAtPressure: 45 }), rule)).toEqual({
      judgedBy: 'minutes',
      f0UpperBound: true,
      minimumMinutes: 90,
      belowTarget: true,
    });
  });

  it('treats a chamber log like the estimate and judges a centre-probe log by F0 alone', () => {
    const chamber = run({ f0: 60, f0Source: 'log', logPlacement: 'chamber', minutesAtPressure: 60 });
    expect(judgeCook(chamber, rule)).toMatchObject({ judgedBy: 'minutes', belowTarget: true });
    // TRADE.md §3 [COMP]: the 1-min cycle gives F0 = 12.239, below 15 however long the hold.
    const centre = run({ f0: 12.239, f0Source: 'log', logPlacement: 'centre', minutesAtPressure: 180 });
    expect(judgeCook(centre, rule)).toEqual({
      judgedBy: 'centre-probe',
      f0UpperBound: false,
      minimumMinutes: 90,
      belowTarget: true,
    });
    expect(judgeCook({ ...centre, f0: 15 }, rule).belowTarget).toBe(false);
  });

  it('passes a run that meets its container minimum and leaves an unknown container unjudged', () => {
    expect(judgeCook(run({ minutesAtPressure: 90 }), rule).belowTarget).toBe(false);
    expect(judgeCook(run({ container: '3 kg bag', minutesAtPressure: 149 }), rule).belowTarget).toBe(true);
    expect(judgeCook(run({ container: 'crate', minutesAtPressure: 5 }), rule)).toMatchObject({
      judgedBy: 'unjudged',
      belowTarget: false,
    });
    expect(judgeCook(run({ container: null }), rule).judgedBy).toBe('unjudged');
  });

  it('matches containers without regard to case or surrounding spaces', () => {
    expect(containerMinimum(' 2 l JAR ', defaultContainerMinutes)).toBe(120);
    expect(containerMinimum('', defaultContainerMinutes)).toBeNull();
  });
});
