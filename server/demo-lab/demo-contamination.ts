import type { Contaminant } from '../../shared/enums';
import { addDays } from './demo-calendar';
import { demoOperators } from './demo-people';
import type { PlanJar, PlanRun, PlanSession } from './demo-plan';
import { plantedProblems as planted } from './planted-problems';
import type { Random } from './prng';

/** Share of the other jars found contaminated so far: a few per cent is good practice (shared/TRADE.md §1). */
const backgroundRate = 0.035;
/** Days from inoculation to a visible contaminant, common practice (shared/TRADE.md §2). */
const background: readonly (readonly [Contaminant, number, number, number])[] = [
  ['trichoderma', 30, 5, 14],
  ['penicillium', 20, 6, 14],
  ['bacterial', 20, 2, 7],
  ['pin-mould', 10, 2, 4],
  ['aspergillus', 6, 6, 14],
  ['yeast', 6, 2, 6],
  ['cobweb', 5, 12, 20],
  ['neurospora', 3, 1, 3],
];

/**
 * LC-0931 goes to five jars in each of eight sessions, two in each of its four weeks, away from the
 * other planted causes; an even spread keeps the culture, not one of its weeks, the lead.
 */
export function plantBadCulture(
  rng: Random,
  jars: PlanJar[],
  sessions: PlanSession[],
  weeksBack: (s: PlanSession) => number,
  shortRunDay: string,
) {
  const c = planted.badCulture;
  const weeks = new Set(c.weeksBeforeCurrent as readonly number[]);
  const eligible = sessions.filter(
    (s) => weeks.has(weeksBack(s)) && s.operator !== demoOperators.relief && s.heldOn !== shortRunDay,
  );
  const chosen = [...weeks].flatMap((w) =>
    rng.shuffle(eligible.filter((s) => weeksBack(s) === w)).slice(0, c.sessions / weeks.size),
  );
  const perSession = c.jars / c.sessions;
  for (const s of chosen) {
    const own = jars.filter((j) => j.session === s && !j.fixed && !j.parent).slice(0, perSession);
    for (const j of own) Object.assign(j, { culture: c.code, fixed: true });
  }
}

export function contaminate(
  rng: Random,
  today: string,
  jars: PlanJar[],
  shortRun: PlanRun | undefined,
  weeksBack: (s: PlanSession) => number,
) {
  const plant = (set: PlanJar[], count: number, kinds: Contaminant[], [lo, hi]: readonly [number, number]) => {
    for (const j of rng.shuffle(set).slice(0, count)) {
      j.contaminant = rng.pick(kinds);
      j.foundOn = addDays(j.session.heldOn, rng.int(lo, hi));
    }
  };
  const s = planted.shortCookRun;
  const b = planted.badCulture;
  const w = planted.sloppyWeek;
  plant(
    jars.filter((j) => j.run === shortRun),
    s.contaminated,
    s.contaminants,
    s.daysToDetection,
  );
  for (const week of b.weeksBeforeCurrent)
    plant(
      jars.filter((j) => j.culture === b.code && weeksBack(j.session) === week),
      b.contaminated / b.weeksBeforeCurrent.length,
      b.contaminants,
      b.daysToDetection,
    );
  plant(
    jars.filter((j) => j.fixed && j.session.operator === w.operator),
    w.contaminated,
    w.contaminants,
    w.daysToDetection,
  );
  const others = jars.filter((j) => !j.fixed);
  const drawn = rng.shuffle(others).slice(0, Math.round(backgroundRate * others.length));
  for (const j of drawn) {
    const [kind, , lo, hi] = rng.weighted(background.map((x) => [x, x[1]] as const));
    const foundOn = addDays(j.session.heldOn, rng.int(lo, hi));
    // Still clean on the shelf until its contaminant shows; redrawing it onto an older jar would inflate settled weeks.
    if (foundOn <= today) Object.assign(j, { contaminant: kind, foundOn });
  }
}
