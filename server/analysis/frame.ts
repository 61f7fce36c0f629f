import type { Tally } from '../../shared/schemas/analysis';
import { wilsonInterval } from '../../shared/stats/wilson';
import { todayLocal } from '../core/local-time';
import { getLabSettings } from '../settings/settings.service';
import type { CountRow } from './analysis.queries';
import type { Frame, Period } from './analysis.repository';
import { addDays } from '../core/calendar';

export async function frameFor(p: Period, today = todayLocal()): Promise<Frame> {
  const s = await getLabSettings();
  return {
    from: p.from,
    to: p.to,
    windowStart: addDays(today, -s.observationWindowDays),
    windowDays: s.observationWindowDays,
    edges: s.cookBucketEdges,
  };
}

export function tally(c: CountRow): Tally {
  return {
    jars: c.jars,
    contaminated: c.contaminated,
    incubating: c.incubating,
    rate: c.jars > 0 ? c.contaminated / c.jars : null,
    ci95: wilsonInterval(c.contaminated, c.jars),
  };
}

export const sum = (rows: CountRow[]): CountRow =>
  rows.reduce(
    (a, r) => ({
      jars: a.jars + r.jars,
      contaminated: a.contaminated + r.contaminated,
      incubating: a.incubating + r.incubating,
    }),
    {
      jars: 0,
      contaminated: 0,
      incubating: 0,
    },
  );
