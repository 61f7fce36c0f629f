export interface KaplanMeierStep {
  time: number;
  atRisk: number;
  events: number;
  censored: number;
  /** S(t) just after this time. */
  survival: number;
}

export interface KaplanMeier {
  /** One step per distinct time, censor-only times included (survival unchanged there) so a curve can mark them. */
  steps: KaplanMeierStep[];
  /** Smallest time with S(t) <= 0.5; null when the curve never gets there. */
  median: number | null;
}

/** Subjects sharing one time: how many had the event there and how many were censored there. */
export interface KaplanMeierGroup {
  time: number;
  events: number;
  censored: number;
}

/** Product-limit estimate. At a tied time, events count before censorings, so the censored are still at risk. */
export function kaplanMeier(times: number[], events: boolean[]): KaplanMeier {
  if (times.length !== events.length) throw new RangeError('kaplanMeier needs times and events of the same length');
  return kaplanMeierOfGroups(
    times.map((time, i) => ({ time, events: events[i] ? 1 : 0, censored: events[i] ? 0 : 1 })),
  );
}

/**
 * The same estimate from subjects counted per time (groups may repeat a time), so that a million jars
 * need not be spread into a million entries first.
 */
export function kaplanMeierOfGroups(groups: KaplanMeierGroup[]): KaplanMeier {
  const byTime = new Map<number, { events: number; censored: number }>();
  let atRisk = 0;
  for (const g of groups) {
    if (!Number.isFinite(g.time)) throw new RangeError(`kaplanMeier needs finite times, got ${g.time}`);
    if (!(Number.isInteger(g.events) && g.events >= 0 && Number.isInteger(g.censored) && g.censored >= 0))
      throw new RangeError('kaplanMeier needs whole, non-negative counts');
    const tally = byTime.get(g.time) ?? { events: 0, censored: 0 };
    tally.events += g.events;
    tally.censored += g.censored;
    byTime.set(g.time, tally);
    atRisk += g.events + g.censored;
  }

  let survival = 1;
  let median: number | null = null;
  const steps: KaplanMeierStep[] = [];
  for (const time of [...byTime.keys()].sort((u, v) => u - v)) {
    const tally = byTime.get(time) ?? { events: 0, censored: 0 };
    survival *= 1 - tally.events / atRisk;
    steps.push({ time, atRisk, events: tally.events, censored: tally.censored, survival });
    // The tolerance keeps an exact half (e.g. 3/4 · 2/3) from missing by one ulp.
    if (median === null && tally.events > 0 && survival <= 0.5 + 1e-12) median = time;
    atRisk -= tally.events + tally.censored;
  }
  return { steps, median };
}
