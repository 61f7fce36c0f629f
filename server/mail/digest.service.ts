import type { DigestResultDto } from '../../shared/schemas/mail';
import { mailAudience } from '../../shared/schemas/mail';
import { pChartLimits } from '../../shared/stats/p-chart';
import { config } from '../core/config';
import { getLabSettings } from '../settings/settings.service';
import { digestRepository } from './digest.repository';
import { addDays, isoWeekOf, labClock, mondayOf, weeksEndingAt } from '../core/calendar';
import { mailRepository } from './mail.repository';
import { weeklyDigestMail, type DigestFacts, type DigestWeek } from './mail-templates';
import { deliver } from './mailer';
import { withNamedLock } from './named-lock';

export const DIGEST_WEEKS = 8;
const DIGEST_LOCK = 'asepta-digest';

const rate = (x: number, n: number) => (n > 0 ? x / n : null);

/** The complete weeks before `today`'s week, with p-chart flags and the last week's grains. */
export async function buildDigestFacts(today: string): Promise<DigestFacts> {
  const settings = await getLabSettings();
  const lastDay = addDays(mondayOf(today), -1);
  const weeks = weeksEndingAt(lastDay, DIGEST_WEEKS);
  const from = weeks[0]?.monday ?? lastDay;
  const counts = await digestRepository.weeklyCounts(from, lastDay, addDays(today, -settings.observationWindowDays));

  const rows: DigestWeek[] = weeks.map(({ week }) => {
    const mine = counts.filter((c) => c.week === week);
    const jars = mine.reduce((s, c) => s + c.jars, 0);
    const contaminated = mine.reduce((s, c) => s + c.contaminated, 0);
    const incubating = mine.reduce((s, c) => s + c.incubating, 0);
    return {
      week,
      jars,
      contaminated,
      incubating,
      rate: rate(contaminated, jars),
      provisional: incubating > 0,
      outOfControl: false,
    };
  });
  const chart = pChartLimits(
    rows.map((r) => r.contaminated),
    rows.map((r) => r.jars),
    rows.map((r) => !r.provisional),
  );
  rows.forEach((r, i) => {
    const limit = chart.limits[i];
    if (!limit || r.provisional || r.rate === null) return;
    // Only above the upper limit is out of control: a week below the lower one is a good week (DESIGN.md §4.4).
    r.outOfControl = r.rate > limit.ucl;
  });
  const reportWeek = isoWeekOf(lastDay);
  return {
    reportWeek,
    weeks: rows,
    pBar: Number.isNaN(chart.pBar) ? null : chart.pBar,
    grains: counts
      .filter((c) => c.week === reportWeek)
      .map((c) => ({ grain: c.grain, jars: c.jars, contaminated: c.contaminated, rate: rate(c.contaminated, c.jars) })),
    url: `${config().publicUrl}/analysis/weekly`,
  };
}

/**
 * One digest per ISO week across every app instance: GET_LOCK keeps two senders apart and the
 * unique digest_runs row records that the week is done. A manual run sends even when the week
 * is already done, and claims the week so the schedule does not repeat it.
 */
export async function sendWeeklyDigest(options: {
  now?: Date;
  trigger: 'schedule' | 'manual';
}): Promise<DigestResultDto> {
  const now = options.now ?? new Date();
  const clock = labClock(now, config().LAB_TIME_ZONE);
  const sendWeek = isoWeekOf(clock.date);
  const waitSeconds = options.trigger === 'schedule' ? 0 : 30;
  const result = await withNamedLock(DIGEST_LOCK, waitSeconds, async (m) => {
    const claimed = await digestRepository.claimWeek(m, sendWeek, options.trigger);
    if (!claimed && options.trigger === 'schedule') return undefined;
    const facts = await buildDigestFacts(clock.date);
    const roles = mailAudience['weekly-digest'];
    const recipients = await mailRepository.recipients('weekly-digest', roles === 'addressee' ? [] : roles);
    const delivery = await deliver('weekly-digest', recipients, weeklyDigestMail(facts));
    await digestRepository.finishRun(m, sendWeek, delivery.sent, delivery.failed);
    return { week: facts.reportWeek, ...delivery, skipped: false };
  });
  return result ?? { week: isoWeekOf(addDays(clock.date, -7)), sent: 0, failed: 0, skipped: true };
}

/** Whether the scheduler should try now: Monday from 07:00 on the lab's clock. */
export function isDigestTime(now: Date): boolean {
  const clock = labClock(now, config().LAB_TIME_ZONE);
  return clock.weekday === 1 && clock.hour >= 7;
}

export async function digestAlreadySent(now: Date): Promise<boolean> {
  const clock = labClock(now, config().LAB_TIME_ZONE);
  return (await digestRepository.findRun(isoWeekOf(clock.date))) !== null;
}
