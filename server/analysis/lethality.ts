import type { LethalityDto } from '../../shared/schemas/analysis-lethality';
import { judgeCook } from '../../shared/stats/cook-verdict';
import { f0AtConstant } from '../../shared/stats/lethality';
import { psiToKPa, sterilisingTemperatureC } from '../../shared/stats/steam';
import { getLabSettings } from '../settings/settings.service';
import { analysisRepository, type Period } from './analysis.repository';

/** The usual sterilising set-point (TRADE.md §1, common practice), assumed when a run has no gauge reading. */
export const USUAL_GAUGE_PSI = 15;
function estimateF0(minutes: number, gaugeKPa: number, altitudeM: number): number | null {
  try {
    return f0AtConstant(sterilisingTemperatureC(gaugeKPa, altitudeM), minutes);
  } catch {
    return null;
  }
}

export async function lethality(p: Period): Promise<LethalityDto> {
  const [settings, runs] = await Promise.all([getLabSettings(), analysisRepository.lethality(p)]);
  const rule = { lethalityTarget: settings.lethalityTarget, containerMinutes: settings.containerMinutes };
  return {
    from: p.from ?? null,
    to: p.to ?? null,
    target: rule.lethalityTarget,
    containerMinutes: rule.containerMinutes,
    runs: runs.map((r) => {
      const assumedGauge = r.f0 === null && r.gaugeKPa === null;
      const f0 = r.f0 ?? estimateF0(r.minutesAtPressure, r.gaugeKPa ?? psiToKPa(USUAL_GAUGE_PSI), r.altitudeM);
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
    }),
  };
}
