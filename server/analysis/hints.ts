import { contaminantNames, contaminants, factorNames, type Contaminant, type Factor } from '../../shared/enums';
import type { FactorLevel } from '../../shared/schemas/analysis';

/** What is known of a level's contaminated jars: how many, jars per contaminant, median days to detection. */
export interface Detections {
  count: number;
  contaminants: Partial<Record<Contaminant, number>>;
  medianDays: number | null;
}

const CP = 'common practice';
const STAMETS = 'Stamets & Chilton, The Mushroom Cultivator (1983)';

/** The trade's pick-list profile of each contaminant (TRADE.md §2), with where each line comes from. */
const profiles: Record<Contaminant, { pointsTo: string; basis: string }> = {
  bacterial: {
    pointsTo: 'endospores that survived the cook: under-sterilisation, over-wet or burst grain, no soak',
    basis: `${CP}; ${STAMETS}, ch. XIII`,
  },
  trichoderma: { pointsTo: 'air or technique: open jars, ports, gloves, needle, hood', basis: CP },
  penicillium: { pointsTo: 'air and people', basis: STAMETS },
  aspergillus: { pointsTo: 'air and hygiene (and a health hazard)', basis: STAMETS },
  'pin-mould': { pointsTo: 'over-wet grain, warm incubation, under-sterilisation', basis: CP },
  neurospora: {
    pointsTo: 'inadequate sterilisation or a lab infestation',
    basis: 'trade knowledge recalled from memory, not yet checked against a source',
  },
  cobweb: { pointsTo: 'humidity and stagnant air', basis: CP },
  yeast: { pointsTo: 'a contaminated culture or technique', basis: CP },
  unknown: { pointsTo: 'nothing in particular until the organism is identified', basis: CP },
};

const sterilisationSide = new Set<Contaminant>(['bacterial', 'pin-mould', 'neurospora']);
const airSide = new Set<Contaminant>(['trichoderma', 'penicillium', 'aspergillus', 'cobweb']);
const EARLY_DAYS = 7;
const LATE_DAYS = 15;

function dominant(d: Detections): { contaminant: Contaminant; count: number } {
  let best: Contaminant = 'unknown';
  let count = -1;
  for (const c of contaminants) {
    const n = d.contaminants[c] ?? 0;
    if (n > count) [best, count] = [c, n];
  }
  return { contaminant: best, count };
}

const factorWords: Record<Factor, string> = {
  grain: 'this grain',
  cookRun: 'this cook run',
  cookMinutes: 'this cook-duration bucket',
  session: 'this session',
  operator: 'this operator',
  culture: 'this culture',
  week: 'this week',
  transfers: 'this number of grain-to-grain transfers',
  prepBatch: 'this prep batch',
  workspace: 'this workspace',
  room: 'this room',
};

/**
 * The attribution rules of thumb of the trade (TRADE.md §2, common practice): leads to check, never a verdict.
 * Rule numbers follow that list.
 */
function lead(factor: Factor, contaminant: Contaminant, medianDays: number): string {
  const early = medianDays <= EARLY_DAYS;
  const late = medianDays >= LATE_DAYS;
  const where = factorWords[factor];
  if (late && (airSide.has(contaminant) || factor === 'room')) {
    return `Late surface moulds point to the incubation room or a breached seal; check ${where}'s shelves and lids.`;
  }
  switch (factor) {
    case 'cookRun':
    case 'cookMinutes':
    case 'prepBatch':
    case 'grain':
      if (early || sterilisationSide.has(contaminant)) {
        return `Early contamination across ${where}'s jars points to the sterilisation cycle or the grain: time at pressure, venting, gauge, overloading, grain moisture.`;
      }
      return `Contamination in ${where} that is not early points less to the cook than to handling after it: compare sessions and cultures.`;
    case 'culture':
      return 'Contamination confined to one culture across cook runs and sessions points to the culture: test it on agar before using it again.';
    case 'operator':
    case 'session':
    case 'workspace':
      return `Contamination spread over ${where}'s jars across cook runs and cultures points to technique or the workspace: ports, gloves, needle flaming, hood or still-air box.`;
    case 'room':
      return 'Contamination gathered in one room points to the incubation conditions: temperature, air and cleanliness.';
    case 'transfers':
      return 'Contamination that grows with grain-to-grain transfers points to the transfers themselves: every step opens jars again; check technique at transfer and the parent jars.';
    case 'week':
      return 'Contamination gathered in one week: look at what changed that week (a cook run, a culture, a person, the room).';
  }
}

export interface Hint {
  hint: string;
  basis: string;
}

/** `sameJars`: levels of other factors that share ≥ 90 % of this level's jars both ways. */
export function hintFor(factor: Factor, detections: Detections, sameJars: FactorLevel[]): Hint | null {
  const n = detections.count;
  if (n === 0) return null;
  if (n === 1) {
    return { hint: 'A single contaminated jar is weak evidence.', basis: CP };
  }
  const top = dominant(detections);
  const days = detections.medianDays ?? 0;
  const profile = profiles[top.contaminant];
  const parts = [
    lead(factor, top.contaminant, days),
    `Mostly ${contaminantNames[top.contaminant]} (${top.count} of ${n}), found after a median of ${days} days; it usually points to ${profile.pointsTo}.`,
  ];
  const others = sameJars.filter((c) => c.factor !== factor);
  if (others.length > 0) {
    const names = others.map((c) => `${factorNames[c.factor]} ${c.level}`).join(', ');
    parts.push(`Its jars are also almost all ${names}: the data cannot tell these apart.`);
  }
  const basis = profile.basis === CP ? CP : profile.basis.startsWith(CP) ? profile.basis : `${CP}; ${profile.basis}`;
  return { hint: parts.join(' '), basis };
}

const contaminantIndex = new Map<string, number>(contaminants.map((c, i) => [c, i]));
const UNKNOWN = contaminants.indexOf('unknown');

/**
 * Reads the `days:contaminant,…` list the causes query builds for a combination's contaminated jars,
 * handing each jar's days and contaminant (its index in `contaminants`; unknown codes count as unknown) to `add`.
 */
export function readDetections(text: string | null, add: (days: number, contaminant: number) => void): void {
  if (!text) return;
  // Tokens are days:contaminant:jars (server/analysis/grouped-jars.ts).
  for (const token of text.split(',')) {
    const [daysText, name, jarsText] = token.split(':');
    const days = Number(daysText);
    const jars = Number(jarsText);
    if (name === undefined || !Number.isFinite(days) || !Number.isInteger(jars)) continue;
    const code = contaminantIndex.get(name) ?? UNKNOWN;
    for (let i = 0; i < jars; i += 1) add(days, code);
  }
}
