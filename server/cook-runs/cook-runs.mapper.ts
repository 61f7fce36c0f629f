import { f0SourceLabels, type CookRunDto } from '../../shared/schemas/cook-runs';
import { kPaToPsi } from '../../shared/stats/steam';
import { cycleTemperatureC } from './cook-run-lethality';
import type { CookRun } from './cook-run.entity';

export const toCookRunDto = (r: CookRun, lethalityTarget: number): CookRunDto => ({
  id: r.id,
  code: r.code,
  vessel: r.vessel,
  startedAt: r.startedAt ? r.startedAt.toISOString() : null,
  cookedOn: r.cookedOn,
  minutesAtPressure: r.minutesAtPressure,
  gaugeKPa: r.gaugeKPa,
  gaugePsi: r.gaugeKPa === null ? null : kPaToPsi(r.gaugeKPa),
  ventingMinutes: r.ventingMinutes,
  altitudeM: r.altitudeM,
  container: r.container,
  loadCount: r.loadCount,
  operatorId: r.operatorId,
  operatorName: r.operatorName,
  f0: r.f0,
  f0Source: r.f0Source,
  f0Label: r.f0Source ? f0SourceLabels[r.f0Source] : null,
  sterilisingTemperatureC: cycleTemperatureC(r),
  lethalityTarget,
  lowLethality: r.f0 !== null && r.f0 < lethalityTarget,
  notes: r.notes,
  createdAt: r.createdAt.toISOString(),
});
