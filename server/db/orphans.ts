import type { QueryRunner } from 'typeorm';

/** A reference column and the table whose `id` it points at. */
export interface Reference {
  table: string;
  column: string;
  references: string;
}

export interface Orphan extends Reference {
  rows: number;
  /** The first few values that point at no row, smallest first. */
  missing: number[];
}

const SHOWN = 5;

/** Rows whose reference points at no row, per reference; an empty list means every key can be added. */
export async function findOrphans(runner: QueryRunner, refs: readonly Reference[]): Promise<Orphan[]> {
  const found: Orphan[] = [];
  for (const ref of refs) {
    const [row] = (await runner.query(
      `SELECT COUNT(*) AS \`rows\`, GROUP_CONCAT(DISTINCT c.\`${ref.column}\` ORDER BY c.\`${ref.column}\`) AS missing
         FROM \`${ref.table}\` c LEFT JOIN \`${ref.references}\` p ON p.id = c.\`${ref.column}\`
        WHERE c.\`${ref.column}\` IS NOT NULL AND p.id IS NULL`,
    )) as { rows: string | number; missing: string | null }[];
    const rows = Number(row?.rows ?? 0);
    if (rows === 0) continue;
    const missing = (row?.missing ?? '').split(',').slice(0, SHOWN).map(Number);
    found.push({ table: ref.table, column: ref.column, references: ref.references, rows, missing });
  }
  return found;
}

export function describeOrphan(o: Orphan): string {
  return `${o.table}.${o.column} → ${o.references}.id: ${o.rows} row(s) point at missing ids ${o.missing.join(', ')}`;
}

/**
 * Checked before any key is added: MariaDB commits each ALTER on its own, so a key refused halfway would
 * leave some tables keyed and others not. Fails naming every orphan so they can be fixed in one pass.
 */
export async function assertNoOrphans(runner: QueryRunner, refs: readonly Reference[]): Promise<void> {
  const orphans = await findOrphans(runner, refs);
  if (orphans.length === 0) return;
  throw new Error(
    `Foreign keys not added: ${orphans.length} reference(s) point at rows that do not exist. ` +
      `Fix or remove these rows, then run the migrations again:\n${orphans.map(describeOrphan).join('\n')}`,
  );
}
