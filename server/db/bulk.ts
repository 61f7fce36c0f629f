import {
  In,
  type EntityManager,
  type EntityTarget,
  type FindOptionsSelect,
  type FindOptionsWhere,
  type ObjectLiteral,
  type QueryDeepPartialEntity,
} from 'typeorm';

/** Rows per multi-row INSERT: well under max_allowed_packet, few enough round trips for 50,000 rows. */
export const insertChunk = 1000;
/** Values per IN (…) list when looking many codes up at once. */
const lookupChunk = 2000;

export function chunks<T>(items: T[], size: number): T[][] {
  const out: T[][] = [];
  for (let i = 0; i < items.length; i += size) out.push(items.slice(i, i + size));
  return out;
}

/** The rows whose `column` is one of `values`, looked up a chunk at a time. */
export async function findByValues<T extends ObjectLiteral>(
  m: EntityManager,
  target: EntityTarget<T>,
  column: keyof T & string,
  values: string[],
  select: FindOptionsSelect<T>,
): Promise<T[]> {
  const found: T[] = [];
  for (const chunk of chunks(values, lookupChunk)) {
    found.push(...(await m.find(target, { select, where: { [column]: In(chunk) } as FindOptionsWhere<T> })));
  }
  return found;
}

/**
 * Inserts the rows a chunk at a time and answers their ids in the rows' order: the ORM writes the
 * INSERT, and MariaDB's RETURNING lists the new ids in VALUES order, with no reload of each row.
 */
export async function insertMany<T extends ObjectLiteral>(
  m: EntityManager,
  target: EntityTarget<T>,
  rows: QueryDeepPartialEntity<T>[],
): Promise<number[]> {
  const ids: number[] = [];
  for (const chunk of chunks(rows, insertChunk)) {
    const [sql, params] = m.createQueryBuilder().insert().into(target).values(chunk).getQueryAndParameters();
    const returned = await m.query<{ id: unknown }[]>(`${sql} RETURNING \`id\``, params);
    if (returned.length !== chunk.length) throw new Error('an insert returned a different number of rows');
    for (const r of returned) ids.push(Number(r.id));
  }
  return ids;
}
