import { clearProduction as clearProductionRecord } from '../setup/clear-production';

/** One jar of imported history, in the columns of POST /api/imports/history (DESIGN.md §5). */
export interface HistoryJar {
  label: string;
  grain: string;
  cookRun: string;
  cookMinutes: number;
  inoculatedOn: string;
  session: string;
  operator: string;
  culture: string;
  contaminant: string | null;
  foundOn: string | null;
}

export function historyCsv(jars: HistoryJar[]): string {
  const header =
    'jar_label,grain,cook_run,cook_minutes,inoculated_on,session,operator,culture,outcome,contaminant,found_on';
  const lines = jars.map((j) =>
    [
      j.label,
      j.grain,
      j.cookRun,
      j.cookMinutes,
      j.inoculatedOn,
      j.session,
      j.operator,
      j.culture,
      j.contaminant ? 'contaminated' : 'clean',
      j.contaminant ?? '',
      j.foundOn ?? '',
    ].join(','),
  );
  return [header, ...lines].join('\r\n') + '\r\n';
}

export const addDays = (date: string, days: number) =>
  new Date(Date.parse(`${date}T00:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);

/** ISO-8601 week by the ISO week-year, computed here independently of the server's SQL. */
export function isoWeekLabel(date: string): string {
  const d = new Date(`${date}T00:00:00Z`);
  const weekday = d.getUTCDay() || 7;
  d.setUTCDate(d.getUTCDate() + 4 - weekday);
  const yearStart = Date.UTC(d.getUTCFullYear(), 0, 1);
  const week = Math.ceil(((d.getTime() - yearStart) / 86_400_000 + 1) / 7);
  return `${d.getUTCFullYear()}-W${String(week).padStart(2, '0')}`;
}

/** Production and incident tables the analysis counts; emptied so a file's counts are exact. */
export const clearProduction = () => clearProductionRecord(['grain_lots']);

export const planted = {
  shortRun: 'PX-CR-SHORT',
  dilutingRun: 'PX-CR-SHORT2',
  badCulture: 'PX-LC-BAD',
  sloppyOperator: 'Dax Morrow',
  /** Monday of the first planted week. */
  firstMonday: '2025-03-03',
  weeks: 8,
  /** The week (0-based) whose Thursday jars all went through the short run. */
  shortRunWeek: 5,
};

const operators = ['Ada Vell', 'Bram Hollis', 'Cora Nyx', planted.sloppyOperator];
const cultures = ['PX-LC-1', 'PX-LC-2', 'PX-LC-3', planted.badCulture];
const grains = ['rye', 'sorghum', 'millet'];
const JARS_PER_SESSION = 12;

/**
 * Invented history with three planted problems: a short cook run (45 min) whose jars turn early with
 * bacteria, a culture whose jars turn with yeast across runs and sessions, and an operator whose jars
 * turn with green mould across runs and cultures. Everything else turns at a low background rate.
 * Each week has two cook days (Tue, Thu); each operator holds one session per cook day.
 */
export function plantedHistory(): HistoryJar[] {
  const jars: HistoryJar[] = [];
  const every = { short: 0, culture: 0, operator: 0, background: 0 };
  for (let w = 0; w < planted.weeks; w++) {
    const monday = addDays(planted.firstMonday, 7 * w);
    for (const [d, offset] of [1, 3].entries()) {
      const day = addDays(monday, offset);
      const runIndex = w * 2 + d;
      let cookRun = `PX-CR-${String(runIndex + 1).padStart(2, '0')}`;
      let cookMinutes = 90;
      if (w === planted.shortRunWeek && d === 1) [cookRun, cookMinutes] = [planted.shortRun, 45];
      if (w === 2 && d === 0) [cookRun, cookMinutes] = [planted.dilutingRun, 55];
      const grain = grains[runIndex % grains.length]!;
      operators.forEach((operator, o) => {
        const session = `PX-S-${w}${d}${o}`;
        for (let k = 0; k < JARS_PER_SESSION; k++) {
          const culture = cultures[(k + o) % cultures.length]!;
          let contaminant: string | null = null;
          let after = 0;
          if (cookRun === planted.shortRun) {
            if (every.short++ % 3 !== 2) [contaminant, after] = ['bacterial', 4];
          } else if (culture === planted.badCulture) {
            if (every.culture++ % 3 === 0) [contaminant, after] = ['yeast', 5];
          } else if (operator === planted.sloppyOperator) {
            if (every.operator++ % 3 === 0) [contaminant, after] = ['trichoderma', 10];
          } else if (every.background++ % 25 === 0) {
            [contaminant, after] = ['penicillium', 12];
          }
          jars.push({
            label: `PX-${w}${d}${o}-${String(k).padStart(2, '0')}`,
            grain,
            cookRun,
            cookMinutes,
            inoculatedOn: day,
            session,
            operator,
            culture,
            contaminant,
            foundOn: contaminant ? addDays(day, after) : null,
          });
        }
      });
    }
  }
  // A session in which nothing turned gives the causes a level with a zero cell.
  for (let k = 0; k < JARS_PER_SESSION; k++) {
    jars.push({
      label: `PX-CLEAN-${String(k).padStart(2, '0')}`,
      grain: 'rye',
      cookRun: 'PX-CR-01',
      cookMinutes: 90,
      inoculatedOn: addDays(planted.firstMonday, 1),
      session: 'PX-S-CLEAN',
      operator: 'Bram Hollis',
      culture: 'PX-LC-2',
      contaminant: null,
      foundOn: null,
    });
  }
  return jars;
}

/** A recent session: `clean` jars still inside the observation window, plus one that already turned. */
export function recentJars(today: string, daysAgo: number, clean: number): HistoryJar[] {
  const day = addDays(today, -daysAgo);
  const base = {
    grain: 'rye',
    cookRun: 'PX-CR-NOW',
    cookMinutes: 90,
    inoculatedOn: day,
    session: 'PX-S-NOW',
    operator: 'Ada Vell',
    culture: 'PX-LC-1',
  };
  return [
    ...Array.from({ length: clean }, (_, i) => ({ ...base, label: `PX-NOW-${i}`, contaminant: null, foundOn: null })),
    { ...base, label: 'PX-NOW-X', contaminant: 'penicillium', foundOn: addDays(day, 1) },
  ];
}
