import { describe, expect, it } from 'vitest';

import { localDate } from '../../server/core/local-time';

import { addDays, isoWeek, mondayOf } from '../../server/demo-lab/demo-calendar';
import { planDemoGrain } from '../../server/demo-lab/demo-grain';
import { demoWeeks, planDemoHistory } from '../../server/demo-lab/demo-history';
import type { PlanJar } from '../../server/demo-lab/demo-plan';

import { plantedProblems, sloppyIsoWeek } from '../../server/demo-lab/planted-problems';

const today = localDate(new Date());
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

  it('holds sixteen ISO weeks ending that day, 1000–1400 jars, and a background rate of 3–5 %', () => {
    const weeks = new Set(plan.jars.map((j) => isoWeek(j.session.heldOn)));
    expect(weeks.size).toBe(demoWeeks);
    expect(weeks.has(isoWeek(addDays(mondayOf(day), -7 * (demoWeeks - 1))))).toBe(true);
    expect(plan.jars.every((j) => j.session.heldOn <= day)).toBe(true);
    expect(plan.jars.length).toBeGreaterThanOrEqual(1000);
    expect(plan.jars.length).toBeLessThanOrEqual(1400);
    const background = rate(plan.jars.filter((j) => !j.fixed));
    expect(background).toBeGreaterThanOrEqual(0.03);
    expect(background).toBeLessThanOrEqual(0.05);
    expect(plan.jars.every((j) => !j.foundOn || (j.foundOn >= j.session.heldOn && j.foundOn <= day))).toBe(true);
  });

  it('gives every jar the prep batch of its grain and cook day, from a lot of that grain received before it', () => {
    const grain = planDemoGrain(plan);
    expect(grain.batches.flatMap((b) => b.jars).sort((a, b) => a.label.localeCompare(b.label))).toEqual(plan.jars);
    for (const b of grain.batches) {
      expect(new Set(b.jars.map((j) => `${j.grain} ${j.run.cookedOn}`))).toEqual(
        new Set([`${b.lot.grain} ${b.preparedOn}`]),
      );
      expect(b.lot.receivedOn < b.preparedOn).toBe(true);
    }
    expect(new Set(grain.batches.map((b) => b.code)).size).toBe(grain.batches.length);
    expect(new Set(grain.lots.map((l) => `${l.grain} ${l.supplierLotCode}`)).size).toBe(grain.lots.length);
    // A fresh lot every four weeks: sixteen weeks hold four or five lots of a grain used throughout.
    const ryeLots = grain.lots.filter((l) => l.grain === 'rye').length;
    expect(ryeLots).toBeGreaterThanOrEqual(4);
    expect(ryeLots).toBeLessThanOrEqual(5);
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
