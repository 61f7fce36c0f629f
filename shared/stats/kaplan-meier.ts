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

/** Product-limit estimate. At a tied time, events count before censorings, so the censored are still at risk. */
export function kaplanMeier(times: number[], events: boolean[]): KaplanMeier {
  if (times.length !== events.length) throw new RangeError('kaplanMeier needs times and events of the same length');
  for (const t of times) {
    if (!Number.isFinite(t)) throw new RangeError(`kaplanMeier needs finite times, got ${t}`);
  }
  const byTime = new Map<number, { events: number; censored: number }>();
  times.forEach((t, i) => {
    const tally = byTime.get(t) ?? { events: 0, censored: 0 };
    if (events[i]) tally.events++;
    else tally.censored++;
    byTime.set(t, tally);
  });

  let atRisk = times.length;
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
