import type { StepGroupDto, StepStatsDto, StepStatsQuery } from '../../shared/schemas/procedures';
import { fisherExactTwoSided } from '../../shared/stats/fisher';
import { notFound } from '../core/errors';
import { todayLocal } from '../core/local-time';
import { getLabSettings } from '../settings/settings.service';
import { proceduresRepository } from './procedures.repository';
import { stepStatsRepository, type GroupCounts } from './step-stats.repository';
import { addDays } from '../core/calendar';

const group = (g: GroupCounts): StepGroupDto => ({ ...g, rate: g.jars > 0 ? g.contaminated / g.jars : null });

const daysBefore = (date: string, days: number) => addDays(date, -days);

/**
 * Contamination of jars from sessions where the step was ticked vs not ticked, with Fisher's exact
 * test on the 2×2 table. Jars of one session are not independent, so p ranks a lead, not a cause.
 */
export async function stepStats(stepId: number, q: StepStatsQuery): Promise<StepStatsDto> {
  const step = await proceduresRepository.findStep(stepId);
  if (!step) throw notFound('Procedure step');
  const settings = await getLabSettings();
  const incubatingAfter = daysBefore(todayLocal(), settings.observationWindowDays);
  const [{ ticked, notTicked }, incidentsLinked] = await Promise.all([
    stepStatsRepository.countsByTick(stepId, incubatingAfter, q.from, q.to),
    stepStatsRepository.incidentsLinked(stepId),
  ]);
  const pValue =
    ticked.jars > 0 && notTicked.jars > 0
      ? fisherExactTwoSided(
          ticked.contaminated,
          ticked.jars - ticked.contaminated,
          notTicked.contaminated,
          notTicked.jars - notTicked.contaminated,
        )
      : null;
  return { stepId, incidentsLinked, ticked: group(ticked), notTicked: group(notTicked), pValue };
}
