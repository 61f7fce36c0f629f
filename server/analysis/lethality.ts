import type { LethalityQuery } from '../../shared/schemas/analysis';
import type { LethalityDto, LethalityRow } from '../../shared/schemas/analysis-lethality';
import { judgeCook } from '../../shared/stats/cook-verdict';
import { f0AtConstant } from '../../shared/stats/lethality';
import { psiToKPa, sterilisingTemperatureC } from '../../shared/stats/steam';
import { getLabSettings } from '../settings/settings.service';
import { analysisRepository } from './analysis.repository';
import { pageOf } from './level-pages';

/** The usual sterilising set-point (TRADE.md §1, common practice), assumed when a run has no gauge reading. */
export const USUAL_GAUGE_PSI = 15;
function estimateF0(minutes: number, gaugeKPa: number, altitudeM: number): number | null {
  try {
    return f0AtConstant(sterilisingTemperatureC(gaugeKPa, altitudeM), minutes);
  } catch {
    return null;
  }
}

/** F0 estimates by cycle: a lab's runs share a handful of cycles, and each estimate solves the steam tables. */
function estimatorOnce(): typeof estimateF0 {
  const known = new Map<string, number | null>();
  return (minutes, gaugeKPa, altitudeM) => {
    const key = `${minutes}|${gaugeKPa}|${altitudeM}`;
    if (!known.has(key)) known.set(key, estimateF0(minutes, gaugeKPa, altitudeM));
    return known.get(key)!;
  };
}

/**
 * Every run of the period is judged, so that the counts below target speak of the period, not of the page;
 * the judging is arithmetic on a few columns, the jars come from the counts.
 */
export async function lethality(q: LethalityQuery): Promise<LethalityDto> {
  const [settings, raw] = await Promise.all([getLabSettings(), analysisRepository.lethality(q)]);
  const rule = { lethalityTarget: settings.lethalityTarget, containerMinutes: settings.containerMinutes };
  const estimate = estimatorOnce();
  const runs = raw.map((r): LethalityRow => {
    const assumedGauge = r.f0 === null && r.gaugeKPa === null;
    const f0 = r.f0 ?? estimate(r.minutesAtPressure, r.gaugeKPa ?? psiToKPa(USUAL_GAUGE_PSI), r.altitudeM);
    const f0Source = r.f0 !== null ? r.f0Source : f0 === null ? null : 'estimate';
    return {
      cookRun: r.code,
      cookedOn: r.cookedOn,
      container: r.container,
      minutesAtPressure: r.minutesAtPressure,
      gaugeKPa: r.gaugeKPa,
      altitudeM: r.altitudeM,
      f0,
      f0Source,
      logPlacement: r.logPlacement,
      assumedGauge,
      ...judgeCook({ ...r, f0, f0Source }, rule),
      jars: r.jars,
      contaminated: r.contaminated,
      rate: r.jars > 0 ? r.contaminated / r.jars : null,
    };
  });
  const below = runs.filter((r) => r.belowTarget);
  const [shown, at] = pageOf(q.only === 'below' ? below : runs, q.page, q.pageSize);
  return {
    from: q.from ?? null,
    to: q.to ?? null,
    target: rule.lethalityTarget,
    containerMinutes: rule.containerMinutes,
    only: q.only,
    runsInPeriod: runs.length,
    belowTarget: below.length,
    runs: shown,
    ...at,
  };
}
