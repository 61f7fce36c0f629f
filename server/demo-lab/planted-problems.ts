import type { Contaminant } from '../../shared/enums';
import { addDays, isoWeek, mondayOf } from './demo-calendar';

/**
 * The three causes planted in the demo lab for the analysis to find. Counts are exact: the loader
 * builds these jars on purpose and leaves them out of the background contamination draw.
 */
export const plantedProblems = {
  /** Cause 1: a cook cycle far too short for 1 L jars of grain. */
  shortCookRun: {
    code: 'CR-2614',
    minutesAtPressure: 45,
    container: '1 L jar',
    /** A mixed load, so the run is not one grain's run. */
    grains: ['rye', 'millet'],
    jars: 24,
    contaminated: 18,
    contaminants: ['bacterial'] as Contaminant[],
    daysToDetection: [2, 5] as const,
    weeksBeforeCurrent: 6,
    sessions: 3,
  },
  /** Cause 2: a liquid culture carrying bacteria and yeast, used across cook runs and sessions. */
  badCulture: {
    code: 'LC-0931',
    jars: 40,
    contaminated: 16,
    contaminants: ['bacterial', 'yeast'] as Contaminant[],
    daysToDetection: [2, 6] as const,
    weeksBeforeCurrent: [8, 7, 6, 5] as const,
    sessions: 8,
  },
  /** Cause 3: one operator's poor technique in one ISO week, across cook runs and cultures. */
  sloppyWeek: {
    operator: 'Ferris Quell',
    weeksBeforeCurrent: 4,
    jars: 30,
    contaminated: 11,
    contaminants: ['trichoderma', 'penicillium'] as Contaminant[],
    daysToDetection: [6, 12] as const,
    sessions: 3,
  },
} as const;

/** The ISO week label `weeksBefore` weeks before the week holding `today` (YYYY-MM-DD, lab-local). */
export const weekBefore = (today: string, weeksBefore: number) => isoWeek(addDays(mondayOf(today), -7 * weeksBefore));

/** The sloppy operator's ISO week for a demo lab loaded on `today`. */
export const sloppyIsoWeek = (today: string) => weekBefore(today, plantedProblems.sloppyWeek.weeksBeforeCurrent);
