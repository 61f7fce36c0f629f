import type { ObjectLiteral, SelectQueryBuilder } from 'typeorm';
import { liveIncidentJarsSubquery } from './live-incidents';

/** What every summary of a group of jars shows. */
export interface JarOutcomeCounts {
  jars: number;
  contaminated: number;
  /** Clean and younger than the observation window: still at risk. */
  incubating: number;
}

export type JarOutcomeRaw = Record<keyof JarOutcomeCounts, string | number>;

/**
 * Adds the counts to a grouped query over jars aliased `j`: all jars, those with a live incident, and the
 * clean ones inoculated after `incubatingAfter` (today less the observation window, a local date).
 */
export function selectJarOutcomeCounts<T extends ObjectLiteral>(
  qb: SelectQueryBuilder<T>,
  incubatingAfter: string,
): SelectQueryBuilder<T> {
  return qb
    .leftJoin(`(${liveIncidentJarsSubquery()})`, 'cj', 'cj.jarId = j.id')
    .addSelect('COUNT(*)', 'jars')
    .addSelect('SUM(CASE WHEN cj.jarId IS NOT NULL THEN 1 ELSE 0 END)', 'contaminated')
    .addSelect('SUM(CASE WHEN cj.jarId IS NULL AND j.inoculatedOn > :incubatingAfter THEN 1 ELSE 0 END)', 'incubating')
    .setParameter('incubatingAfter', incubatingAfter);
}

/** MariaDB answers COUNT and SUM as strings. */
export const jarOutcomeCounts = (r: JarOutcomeRaw): JarOutcomeCounts => ({
  jars: Number(r.jars),
  contaminated: Number(r.contaminated),
  incubating: Number(r.incubating),
});
