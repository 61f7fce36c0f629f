import type { ColonisationDto } from '../../shared/schemas/analysis-colonisation';
import { kaplanMeierOfGroups } from '../../shared/stats/kaplan-meier';
import { todayLocal } from '../core/local-time';
import { analysisRepository, type Period } from './analysis.repository';

export async function colonisation(p: Period): Promise<ColonisationDto> {
  const raw = await analysisRepository.colonisation(p, todayLocal());
  const byGrain = new Map<string, typeof raw>();
  for (const r of raw) {
    const rows = byGrain.get(r.grain);
    if (rows) rows.push(r);
    else byGrain.set(r.grain, [r]);
  }
  const curves = [...byGrain.entries()].map(([grain, rows]) => {
    const km = kaplanMeierOfGroups(
      rows.map((r) => ({ time: r.day, events: r.colonised ? r.jars : 0, censored: r.colonised ? 0 : r.jars })),
    );
    const jars = rows.reduce((n, r) => n + r.jars, 0);
    const colonised = rows.reduce((n, r) => n + (r.colonised ? r.jars : 0), 0);
    return {
      grain,
      jars,
      colonised,
      censored: jars - colonised,
      medianDays: km.median,
      steps: km.steps.map((s) => ({
        day: s.time,
        atRisk: s.atRisk,
        colonised: s.events,
        censored: s.censored,
        stillColonising: s.survival,
      })),
    };
  });
  return { from: p.from ?? null, to: p.to ?? null, curves };
}
