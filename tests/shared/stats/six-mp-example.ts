/**
 * The 6-MP arm of Freireich E.J. et al. (1963) as tabulated by Gehan E.A. (1965), Biometrika 52:203–223
 * [data and page numbers from memory]; the Kaplan–Meier survival at each death time as listed in TRADE.md §4.
 * A trailing + marks a censored time.
 */
export const sixMpTimes = '6 6 6 6+ 7 9+ 10 10+ 11+ 13 16 17+ 19+ 20+ 22 23 25+ 32+ 32+ 34+ 35+'.split(' ');

/** [time, survival just after it], to four places. */
export const sixMpSurvival: [number, number][] = [
  [6, 0.8571],
  [7, 0.8067],
  [10, 0.7529],
  [13, 0.6902],
  [16, 0.6275],
  [22, 0.5378],
  [23, 0.4482],
];

export const sixMpMedian = 23;
