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

export const demoCultures: DemoCulture[] = [
  {
    code: 'LC-0917',
    species: 'Pleurotus ostreatus',
    strain: 'Grey Harbour',
    generation: 1,
    volumeMl: 600,
    weeks: { from: 15, to: 10 },
    colonises: [10, 14],
  },
  {
    code: 'LC-0919',
    species: 'Hericium erinaceus',
    strain: 'Snowdrift',
    generation: 1,
    volumeMl: 400,
    weeks: { from: 15, to: 10 },
    colonises: [14, 21],
  },
  {
    code: 'LC-0921',
    species: 'Lentinula edodes',
    strain: 'Cedar Lane',
    generation: 1,
    volumeMl: 400,
    weeks: { from: 14, to: 9 },
    colonises: [21, 30],
  },
  {
    code: 'LC-0925',
    species: 'Pleurotus ostreatus',
    strain: 'Grey Harbour',
    generation: 2,
    parent: 'LC-0917',
    volumeMl: 600,
    weeks: { from: 9, to: 5 },
    colonises: [10, 14],
  },
  {
    code: 'LC-0927',
    species: 'Hericium erinaceus',
    strain: 'Snowdrift',
    generation: 2,
    parent: 'LC-0919',
    volumeMl: 400,
    weeks: { from: 9, to: 3 },
    colonises: [14, 21],
  },
  {
    code: 'LC-0928',
    species: 'Lentinula edodes',
    strain: 'Cedar Lane',
    generation: 2,
    parent: 'LC-0921',
    volumeMl: 400,
    weeks: { from: 8, to: 2 },
    colonises: [21, 30],
  },
  {
    code: 'LC-0929',
    species: 'Pleurotus ostreatus',
    strain: 'Grey Harbour',
    generation: 3,
    parent: 'LC-0925',
    volumeMl: 600,
    weeks: { from: 5, to: 0 },
    colonises: [10, 14],
  },
  {
    code: 'LC-0931',
    species: 'Pleurotus djamor',
    strain: 'Coral Dusk',
    generation: 2,
    volumeMl: 500,
    weeks: { from: 8, to: 5 },
    colonises: [8, 12],
  },
  {
    code: 'LC-0933',
    species: 'Pleurotus eryngii',
    strain: 'Tall Ridge',
    generation: 1,
    volumeMl: 500,
    weeks: { from: 7, to: 0 },
    colonises: [12, 18],
  },
  {
    code: 'LC-0936',
    species: 'Pleurotus ostreatus',
    strain: 'Grey Harbour',
    generation: 3,
    parent: 'LC-0925',
    volumeMl: 300,
    weeks: { from: 9, to: 7 },
    colonises: [10, 14],
  },
  {
    code: 'LC-0938',
    species: 'Hericium erinaceus',
    strain: 'Snowdrift',
    generation: 3,
    parent: 'LC-0927',
    volumeMl: 500,
    weeks: { from: 2, to: 0 },
    colonises: [14, 21],
  },
];

/** LC-0931 is only ever given to jars on purpose, as the planted bad culture. */
export const regularCultures = demoCultures.filter((c) => c.code !== 'LC-0931');
