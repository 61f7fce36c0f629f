import type { ColonisationDto } from '../../shared/schemas/analysis-colonisation';
import { kaplanMeier } from '../../shared/stats/kaplan-meier';
import { todayLocal } from '../core/local-time';
import { analysisRepository, type Period } from './analysis.repository';

export async function colonisation(p: Period): Promise<ColonisationDto> {
  const raw = await analysisRepository.colonisation(p, todayLocal());
  const byGrain = new Map<string, typeof raw>();
  for (const r of raw) byGrain.set(r.grain, [...(byGrain.get(r.grain) ?? []), r]);
  const curves = [...byGrain.entries()].map(([grain, rows]) => {
    const times: number[] = [];
    const events: boolean[] = [];
    for (const r of rows) {
      for (let i = 0; i < r.jars; i++) {
        times.push(r.day);
        events.push(r.colonised);
      }
    }
    const km = kaplanMeier(times, events);
    const colonised = events.filter(Boolean).length;
    return {
      grain,
      jars: times.length,
      colonised,
      censored: times.length - colonised,
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
