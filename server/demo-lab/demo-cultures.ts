/** The demo lab's liquid cultures (invented strain names); weeks are counted back from the current ISO week. */
export interface DemoCulture {
  code: string;
  species: string;
  strain: string;
  generation: number;
  parent?: string;
  volumeMl: number;
  /** Used in sessions from `from` weeks back until `to` weeks back. */
  weeks: { from: number; to: number };
  /** Days to full colonisation on grain, common practice (shared/TRADE.md §1). */
  colonises: readonly [number, number];
}

/** Each invented strain's species and its days to full colonisation on grain, common practice (shared/TRADE.md §1). */
const strains = {
  'Grey Harbour': { species: 'Pleurotus ostreatus', colonises: [10, 14] },
  Snowdrift: { species: 'Hericium erinaceus', colonises: [14, 21] },
  'Cedar Lane': { species: 'Lentinula edodes', colonises: [21, 30] },
  'Coral Dusk': { species: 'Pleurotus djamor', colonises: [8, 12] },
  'Tall Ridge': { species: 'Pleurotus eryngii', colonises: [12, 18] },
} as const;

/** code, strain, generation, parent culture, volume (ml), used from … until … weeks back. */
const rows: [string, keyof typeof strains, number, string | null, number, number, number][] = [
  ['LC-0917', 'Grey Harbour', 1, null, 600, 15, 10],
  ['LC-0919', 'Snowdrift', 1, null, 400, 15, 10],
  ['LC-0921', 'Cedar Lane', 1, null, 400, 14, 9],
  ['LC-0925', 'Grey Harbour', 2, 'LC-0917', 600, 9, 5],
  ['LC-0927', 'Snowdrift', 2, 'LC-0919', 400, 9, 3],
  ['LC-0928', 'Cedar Lane', 2, 'LC-0921', 400, 8, 2],
  ['LC-0929', 'Grey Harbour', 3, 'LC-0925', 600, 5, 0],
  ['LC-0931', 'Coral Dusk', 2, null, 500, 8, 5],
  ['LC-0933', 'Tall Ridge', 1, null, 500, 7, 0],
  ['LC-0936', 'Grey Harbour', 3, 'LC-0925', 300, 9, 7],
  ['LC-0938', 'Snowdrift', 3, 'LC-0927', 500, 2, 0],
];

export const demoCultures: DemoCulture[] = rows.map(([code, strain, generation, parent, volumeMl, from, to]) => ({
  code,
  ...strains[strain],
  strain,
  generation,
  ...(parent ? { parent } : {}),
  volumeMl,
  weeks: { from, to },
}));

/** LC-0931 is only ever given to jars on purpose, as the planted bad culture. */
export const regularCultures = demoCultures.filter((c) => c.code !== 'LC-0931');
