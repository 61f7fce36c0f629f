import { f0SourceLabels, type CookRunDto } from '../../shared/schemas/cook-runs';
import { judgeCook, type CookRule } from '../../shared/stats/cook-verdict';
import { kPaToPsi } from '../../shared/stats/steam';
import { cycleTemperatureC } from './cook-run-lethality';
import type { CookRun } from './cook-run.entity';

export const toCookRunDto = (r: CookRun, rule: CookRule): CookRunDto => {
  const verdict = judgeCook(r, rule);
  return {
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
    lethalityTarget: rule.lethalityTarget,
    logPlacement: r.logPlacement,
    ...verdict,
    lowLethality: verdict.belowTarget,
    notes: r.notes,
    createdAt: r.createdAt.toISOString(),
  };
};

export const cookRunCsv = {
  filename: 'cook-runs.csv',
  header: [
    'code',
    'cooked_on',
    'started_at',
    'vessel',
    'container',
    'minutes_at_pressure',
    'gauge_kpa',
    'gauge_psi',
    'venting_minutes',
    'altitude_m',
    'load_count',
    'operator',
    'f0',
    'f0_source',
    'log_placement',
    'judged_by',
    'minimum_minutes',
    'below_target',
    'notes',
  ],
  row: (r: CookRunDto): unknown[] => [
    r.code,
    r.cookedOn,
    r.startedAt,
    r.vessel,
    r.container,
    r.minutesAtPressure,
    r.gaugeKPa,
    r.gaugePsi === null ? null : r.gaugePsi.toFixed(2),
    r.ventingMinutes,
    r.altitudeM,
    r.loadCount,
    r.operatorName,
    r.f0 === null ? null : r.f0.toFixed(2),
    r.f0Label,
    r.logPlacement,
    r.judgedBy,
    r.minimumMinutes,
    r.belowTarget ? 'yes' : 'no',
    r.notes,
  ],
};
