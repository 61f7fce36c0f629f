import { IsNull, Not } from 'typeorm';
import { beforeAll, describe, expect, it } from 'vitest';
import { localDate } from '../../server/core/local-time';
import { dataSource } from '../../server/db/data-source';
import { Incident } from '../../server/incidents/incident.entity';
import { Jar } from '../../server/jars/jar.entity';
import { addDays, isoWeek } from '../../seed/demo-calendar';
import { planDemoHistory, type PlanJar } from '../../seed/demo-history';
import { loadDemoLab } from '../../seed/demo-lab';
import { plantedProblems, sloppyIsoWeek } from '../../seed/planted-problems';

const today = localDate(new Date());
const plan = planDemoHistory(today);
// Loaded on any day: today, across a year boundary (2027-01-01 is in 2026-W53) and across the change to summer time.
const days = [today, '2027-01-06', '2026-04-01'];
const rate = (jars: PlanJar[]) => jars.filter((j) => j.contaminant).length / jars.length;

describe.each(days)('the demo lab plan loaded on %s', (day) => {
  const plan = planDemoHistory(day);

  it('is the same on every run for the same day', () => {
    const again = planDemoHistory(day);
    expect(again.jars.map((j) => [j.label, j.run.code, j.session.code, j.culture, j.contaminant, j.foundOn])).toEqual(
      plan.jars.map((j) => [j.label, j.run.code, j.session.code, j.culture, j.contaminant, j.foundOn]),
    );
  });

  it('holds ten ISO weeks ending that day, 600–900 jars, and a background rate of 3–5 %', () => {
    const weeks = new Set(plan.jars.map((j) => isoWeek(j.session.heldOn)));
    expect(weeks.size).toBe(10);
    expect(plan.jars.every((j) => j.session.heldOn <= day)).toBe(true);
    expect(plan.jars.length).toBeGreaterThanOrEqual(600);
    expect(plan.jars.length).toBeLessThanOrEqual(900);
    const background = rate(plan.jars.filter((j) => !j.fixed));
    expect(background).toBeGreaterThanOrEqual(0.03);
    expect(background).toBeLessThanOrEqual(0.05);
    expect(plan.jars.every((j) => !j.foundOn || (j.foundOn >= j.session.heldOn && j.foundOn <= day))).toBe(true);
  });

  it('plants the short cook run: 45 min on 1 L jars, the only run under 60 min, across sessions and cultures', () => {
    const p = plantedProblems.shortCookRun;
    const jars = plan.jars.filter((j) => j.run.code === p.code);
    expect(jars).toHaveLength(p.jars);
    expect(jars.filter((j) => j.contaminant === 'bacterial')).toHaveLength(p.contaminated);
    expect(new Set(jars.map((j) => `${j.run.minutes} ${j.run.container}`))).toEqual(new Set(['45 1 L jar']));
    expect(plan.runs.filter((r) => r.minutes < 60).map((r) => r.code)).toEqual([p.code]);
    expect(new Set(jars.map((j) => j.session.code)).size).toBeGreaterThanOrEqual(3);
    expect(new Set(jars.map((j) => j.culture)).size).toBeGreaterThanOrEqual(2);
    expect(new Set(jars.map((j) => j.grain))).toEqual(new Set(p.grains));
    for (const j of jars.filter((x) => x.foundOn)) {
      const days = (Date.parse(j.foundOn!) - Date.parse(j.session.heldOn)) / 86_400_000;
      expect(days).toBeGreaterThanOrEqual(2);
      expect(days).toBeLessThanOrEqual(5);
    }
  });

  it('plants the bad culture across several cook runs and sessions', () => {
    const p = plantedProblems.badCulture;
    const jars = plan.jars.filter((j) => j.culture === p.code);
    expect(jars).toHaveLength(p.jars);
    expect(jars.filter((j) => j.contaminant)).toHaveLength(p.contaminated);
    expect(jars.every((j) => !j.contaminant || ['bacterial', 'yeast'].includes(j.contaminant))).toBe(true);
    expect(new Set(jars.map((j) => j.run.code)).size).toBeGreaterThanOrEqual(4);
    expect(new Set(jars.map((j) => j.session.code)).size).toBe(p.sessions);
    expect(jars.some((j) => j.run.code === plantedProblems.shortCookRun.code)).toBe(false);
  });

  it("plants Ferris Quell's sloppy ISO week, four weeks before the current one, across runs and cultures", () => {
    const p = plantedProblems.sloppyWeek;
    const week = sloppyIsoWeek(day);
    expect(week).toBe(isoWeek(addDays(day, -28)));
    const jars = plan.jars.filter((j) => j.session.operator === p.operator && isoWeek(j.session.heldOn) === week);
    expect(jars).toHaveLength(p.jars);
    expect(plan.jars.filter((j) => j.session.operator === p.operator)).toHaveLength(p.jars);
    expect(jars.filter((j) => j.contaminant && ['trichoderma', 'penicillium'].includes(j.contaminant))).toHaveLength(
      p.contaminated,
    );
    expect(new Set(jars.map((j) => j.run.code)).size).toBeGreaterThanOrEqual(3);
    expect(new Set(jars.map((j) => j.culture)).size).toBeGreaterThanOrEqual(3);
    expect(jars.some((j) => j.culture === plantedProblems.badCulture.code)).toBe(false);
  });
});

describe('loadDemoLab', () => {
  beforeAll(async () => {
    // The loader only runs into an empty production record, so this file clears the worker's.
    for (const t of [
      'incident_photos',
      'incident_step_links',
      'corrective_actions',
      'incident_jars',
      'incidents',
      'jar_events',
      'jars',
    ]) {
      await dataSource.query(`DELETE FROM \`${t}\``);
    }
    await loadDemoLab(() => undefined);
  }, 120_000);

  it('imports the plan, with its open incidents, and loads nothing twice', async () => {
    expect(await dataSource.manager.count(Jar)).toBe(plan.jars.length);
    const imported = await dataSource.manager.countBy(Incident, {
      imported: true,
      status: 'closed',
      verdict: 'confirmed',
    });
    expect(imported).toBe(plan.jars.filter((j) => j.contaminant).length);
    const open = await dataSource.manager.findBy(Incident, { imported: false });
    expect(open.length).toBeGreaterThanOrEqual(3);
    expect(open.every((i) => i.status === 'open' && i.verdict === 'pending' && i.foundOn >= addDays(today, -9))).toBe(
      true,
    );
    await loadDemoLab(() => undefined);
    expect(await dataSource.manager.count(Jar)).toBe(plan.jars.length);
    expect(await dataSource.manager.countBy(Incident, { imported: false })).toBe(open.length);
  });

  it('links grain-to-grain jars to their parent jar instead of a culture', async () => {
    const linked = await dataSource.manager.find(Jar, { where: { parentJarId: Not(IsNull()) } });
    expect(linked).toHaveLength(plan.jars.filter((j) => j.parent).length);
    expect(linked.every((j) => j.cultureId === null)).toBe(true);
    const grandchildren = linked.filter((j) => linked.some((p) => p.id === j.parentJarId));
    expect(grandchildren.length).toBeGreaterThan(0);
  });

  it('keeps the last two weeks of clean jars incubating and older clean jars colonised', async () => {
    const rows = await dataSource.query<{ status: string; recent: string; n: string }[]>(
      `SELECT status, inoculatedOn > ? AS recent, COUNT(*) AS n FROM jars WHERE status <> 'contaminated' GROUP BY status, recent`,
      [addDays(today, -21)],
    );
    const recent = rows.filter((r) => Number(r.recent) === 1).map((r) => r.status);
    const old = rows.filter((r) => Number(r.recent) === 0).map((r) => r.status);
    expect(new Set(recent)).toEqual(new Set(['incubating']));
    expect(new Set(old)).toEqual(new Set(['colonised']));
  });
});
