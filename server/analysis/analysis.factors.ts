import type { Factor } from '../../shared/enums';
import { cookBucketLabels } from '../../shared/schemas/settings';
import {
  cookRunKey,
  cultureKey,
  dayKey,
  grainKey,
  prepBatchKey,
  roomKey,
  sessionKey,
  transfersKey,
  transfersLevelSql,
  type JarKey,
} from './tally-keys';

export interface FactorSql {
  /** What the counts are grouped on first (tally-keys.ts). */
  key: JarKey;
  /** Joins from the grouped key to the names, made on the grouped rows rather than on every jar. */
  joins: string[];
  /** The level as a string; NULL where the jar does not record this attribute. */
  level: string;
  /** Orders levels for display (bucket order for cook minutes, else the level itself). */
  order: string;
}

const isoWeekOf = (date: string) =>
  `CONCAT(FLOOR(YEARWEEK(${date}, 3) / 100), '-W', LPAD(MOD(YEARWEEK(${date}, 3), 100), 2, '0'))`;
export const isoWeekFromYearWeek = (yw: string) => `CONCAT(FLOOR(${yw} / 100), '-W', LPAD(MOD(${yw}, 100), 2, '0'))`;

/** Whole minutes at pressure into the lab's buckets; edges are validated integers, so inlining them is safe. */
export function cookBucketSql(edges: readonly number[], column = 'cr.minutesAtPressure'): string {
  if (edges.length === 0 || !edges.every((e) => Number.isInteger(e)))
    throw new Error('cook bucket edges must be integers');
  const labels = cookBucketLabels(edges);
  const whens = edges.map((edge, i) => `WHEN ${column} < ${edge} THEN '${labels[i] ?? ''}'`).join(' ');
  return `CASE WHEN ${column} IS NULL THEN NULL ${whens} ELSE '${labels[labels.length - 1] ?? ''}' END`;
}

/**
 * The whitelist: a factor name from the zod enum is the only way a SQL expression enters a query.
 * `keyRef` is the grouped key's column; `p` suffixes the aliases so two factors can share a query.
 */
export function factorSql(factor: Factor, edges: readonly number[], keyRef: string, p = ''): FactorSql {
  const by = (key: JarKey, table: string, alias: string, level: string, order = level): FactorSql => ({
    key,
    joins: [`LEFT JOIN ${table} ${alias}${p} ON ${alias}${p}.id = ${keyRef}`],
    level: level.replaceAll('@', `${alias}${p}`),
    order: order.replaceAll('@', `${alias}${p}`),
  });
  switch (factor) {
    case 'grain':
      return by(grainKey, 'grains', 'g', '@.name');
    case 'cookRun':
      return by(cookRunKey, 'cook_runs', 'cr', '@.code');
    case 'cookMinutes':
      return by(cookRunKey, 'cook_runs', 'cr', cookBucketSql(edges, '@.minutesAtPressure'), 'MIN(@.minutesAtPressure)');
    case 'session':
      return by(sessionKey, 'inoculation_sessions', 's', '@.code');
    case 'operator': {
      const level = `NULLIF(COALESCE(s${p}.operatorName, ou${p}.displayName), '')`;
      return {
        key: sessionKey,
        joins: [
          `LEFT JOIN inoculation_sessions s${p} ON s${p}.id = ${keyRef}`,
          `LEFT JOIN users ou${p} ON ou${p}.id = s${p}.operatorId`,
        ],
        level,
        order: level,
      };
    }
    case 'culture':
      return by(cultureKey, 'cultures', 'c', '@.code');
    case 'week':
      return { key: dayKey, joins: [], level: isoWeekOf(keyRef), order: isoWeekOf(keyRef) };
    case 'transfers':
      return { key: transfersKey, joins: [], level: transfersLevelSql(keyRef), order: keyRef };
    case 'prepBatch':
      return by(prepBatchKey, 'prep_batches', 'pb', '@.code');
    case 'workspace':
      return by(sessionKey, 'inoculation_sessions', 's', '@.workspace');
    case 'room':
      return { key: roomKey, joins: [], level: keyRef, order: keyRef };
  }
}
