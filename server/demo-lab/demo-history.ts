import { addDays, isoWeekday, mondayOf } from './demo-calendar';
import { contaminate, plantBadCulture } from './demo-contamination';
import { demoCultures, regularCultures } from './demo-cultures';
import { demoOperators } from './demo-people';
import type { DemoPlan, PlanJar, PlanRun, PlanSession } from './demo-plan';
import { plantedProblems as planted } from './planted-problems';
import { seededRandom, type Random } from './prng';

const grains = [
  ['rye', 30],
  ['sorghum', 20],
  ['brown rice', 18],
  ['millet', 14],
  ['wheat', 13],
  ['maize', 3],
  ['oats', 2],
] as const;
const containers = [
  ['1 L jar', 60],
  ['2 L jar', 25],
  ['3 kg bag', 15],
] as const;
/** ISO weeks of history, the current one included: enough settled weeks for a steady p-chart centre line. */
export const demoWeeks = 16;

function makeRun(rng: Random, cookedOn: string, over: Partial<PlanRun> = {}): PlanRun {
  const container = rng.weighted(containers);
  const minutes =
    container === '1 L jar'
      ? rng.weighted([
          [90, 85],
          [120, 15],
        ] as const)
      : container === '2 L jar'
        ? 120
        : rng.pick([150, 180]);
  return {
    code: '',
    cookedOn,
    minutes,
    container,
    grain: rng.weighted(grains),
    operator: rng.weighted([
      [demoOperators.technician, 3],
      [demoOperators.supervisor, 1],
    ] as const),
    ...over,
  };
}

/** Sixteen ISO weeks of invented production ending on `today`, with the planted problems built in. */
export function planDemoHistory(today: string): DemoPlan {
  const rng = seededRandom(0x2614_0931);
  const monday = mondayOf(today);
  const day = (weeksBack: number, weekday: number) => addDays(monday, -7 * weeksBack + weekday - 1);
  const shortRunDay = day(planted.shortCookRun.weeksBeforeCurrent, 2);
  const ferrisSloppy = [1, 3, 4].map((d) => day(planted.sloppyWeek.weeksBeforeCurrent, d));
  const parentDay = day(9, 2);
  const childDay = day(6, 3);
  const grandchildDay = day(3, 2);
  const forced = new Set([shortRunDay, ...ferrisSloppy, parentDay, childDay, grandchildDay]);

  const runs: PlanRun[] = [];
  const sessions: PlanSession[] = [];
  const jars: PlanJar[] = [];
  let shortRun: PlanRun | undefined;
  const parents: PlanJar[] = [];
  const children: PlanJar[] = [];

  const addJar = (run: PlanRun, session: PlanSession, culture: string, over: Partial<PlanJar> = {}) => {
    const c = demoCultures.find((x) => x.code === culture) ?? demoCultures[0]!;
    const jar: PlanJar = {
      label: '',
      run,
      session,
      culture,
      grain: run.grain,
      parent: null,
      contaminant: null,
      foundOn: null,
      colonisesIn: rng.int(...c.colonises) + (run.container === '3 kg bag' ? 4 : 0),
      fixed: false,
      ...over,
    };
    jars.push(jar);
    return jar;
  };

  for (let d = day(demoWeeks - 1, 1); d <= today; d = addDays(d, 1)) {
    if (isoWeekday(d) > 5 || (!forced.has(d) && rng.next() < 0.08)) continue;
    const back = Math.round((Date.parse(monday) - Date.parse(mondayOf(d))) / (7 * 86_400_000));
    // The short run's grains also went into sound runs that day, so their prep batches are not the cause.
    const dayRuns =
      d === shortRunDay
        ? planted.shortCookRun.grains.map((grain) => makeRun(rng, addDays(d, -1), { grain }))
        : Array.from({ length: rng.next() < 0.45 ? 2 : 1 }, () => makeRun(rng, addDays(d, -1)));
    runs.push(...dayRuns);
    const pool = regularCultures.filter((c) => c.weeks.from >= back && c.weeks.to <= back).map((c) => c.code);
    const staff = rng.shuffle([
      demoOperators.technician,
      demoOperators.technician,
      demoOperators.supervisor,
      ...demoOperators.staff,
    ]);
    const operators: string[] = [...new Set(staff)];
    if (ferrisSloppy.includes(d)) operators.unshift(demoOperators.relief);
    const count = d === shortRunDay ? planted.shortCookRun.sessions : rng.next() < 0.65 ? 2 : 1;
    const daySessions = operators.slice(0, count).map((operator, i): PlanSession => ({
      code: `IS-${d.replace(/-/g, '').slice(2)}-${'ABC'[i]}`,
      heldOn: d,
      operator,
      workspace: operator === demoOperators.staff[1] ? 'still-air-box' : 'flow-hood',
      startHour: i === 0 ? 9 : 14,
    }));
    sessions.push(...daySessions);
    for (const session of daySessions) {
      const sloppy = ferrisSloppy.includes(d) && session.operator === demoOperators.relief;
      const cultures = rng.shuffle(pool).slice(0, rng.int(1, 2));
      const n = sloppy ? planted.sloppyWeek.jars / planted.sloppyWeek.sessions : rng.int(7, 12);
      for (let i = 0; i < n; i += 1)
        addJar(dayRuns[i % dayRuns.length]!, session, cultures[i % cultures.length]!, { fixed: sloppy });
    }
    const first = daySessions[0]!;
    if (d === shortRunDay) {
      shortRun = makeRun(rng, addDays(d, -1), {
        minutes: planted.shortCookRun.minutesAtPressure,
        container: planted.shortCookRun.container,
        grain: planted.shortCookRun.grains[0],
      });
      runs.push(shortRun);
      const perSession = planted.shortCookRun.jars / planted.shortCookRun.sessions;
      const runCultures = rng.shuffle(pool.filter((c) => c !== 'LC-0936'));
      daySessions.forEach((s, i) => {
        for (let k = 0; k < perSession; k += 1)
          addJar(shortRun!, s, runCultures[i % runCultures.length]!, {
            fixed: true,
            grain: planted.shortCookRun.grains[k % planted.shortCookRun.grains.length],
          });
      });
    }
    if (d === parentDay)
      for (let k = 0; k < 3; k += 1) parents.push(addJar(dayRuns[0]!, first, 'LC-0936', { fixed: true }));
    if (d === childDay || d === grandchildDay) {
      const bagRun = makeRun(rng, addDays(d, -1), {
        container: '3 kg bag',
        minutes: 180,
        grain: d === childDay ? 'rye' : 'millet',
      });
      runs.push(bagRun);
      const from = d === childDay ? parents : children.slice(0, 2);
      const made = Array.from({ length: d === childDay ? 12 : 6 }, (_, k) =>
        addJar(bagRun, first, 'LC-0936', { parent: from[k % from.length] ?? null, fixed: k < 2 && d === childDay }),
      );
      if (d === childDay) children.push(...made);
    }
  }

  const weeksBack = (date: string) => Math.round((Date.parse(monday) - Date.parse(mondayOf(date))) / (7 * 86_400_000));
  plantBadCulture(rng, jars, sessions, (s) => weeksBack(s.heldOn), shortRunDay);
  contaminate(rng, today, jars, shortRun, (s) => weeksBack(s.heldOn));
  return finish(runs, sessions, jars, shortRun);
}

/** Labels and codes in date order, numbered so the planted short run is CR-2614 in its natural place. */
function finish(runs: PlanRun[], sessions: PlanSession[], jars: PlanJar[], shortRun: PlanRun | undefined): DemoPlan {
  const ordered = [...runs].sort((a, b) => a.cookedOn.localeCompare(b.cookedOn));
  const base = Number(planted.shortCookRun.code.slice(3)) - (shortRun ? ordered.indexOf(shortRun) : 0);
  ordered.forEach((r, i) => (r.code = `CR-${base + i}`));
  const byDate = [...jars].sort(
    (a, b) => a.session.heldOn.localeCompare(b.session.heldOn) || a.session.code.localeCompare(b.session.code),
  );
  byDate.forEach((j, i) => (j.label = `J${String(i + 1).padStart(5, '0')}`));
  return { runs: ordered, sessions, jars: byDate };
}
