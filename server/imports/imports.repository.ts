import { In, type EntityManager, type EntityTarget, type ObjectLiteral, type QueryDeepPartialEntity } from 'typeorm';
import { CookRun } from '../cook-runs/cook-run.entity';
import { Culture } from '../cultures/culture.entity';
import { Grain } from '../grain/grain.entity';
import { Jar } from '../jars/jar.entity';
import { InoculationSession } from '../sessions/inoculation-session.entity';
import { User } from '../users/user.entity';

/** Rows per multi-row INSERT: well under max_allowed_packet, few enough round trips for 50,000 jars. */
const insertChunk = 1000;
const lookupChunk = 2000;

function chunks<T>(items: T[], size: number): T[][] {
  const out: T[][] = [];
  for (let i = 0; i < items.length; i += size) out.push(items.slice(i, i + size));
  return out;
}

async function findIn<T>(items: string[], find: (chunk: string[]) => Promise<T[]>): Promise<T[]> {
  const found: T[] = [];
  for (const chunk of chunks(items, lookupChunk)) found.push(...(await find(chunk)));
  return found;
}

export interface JarInsert {
  label: string;
  grainId: number;
  cookRunId: number;
  sessionId: number;
  cultureId: number;
  status: 'incubating' | 'colonised' | 'contaminated';
  inoculatedAt: string;
  inoculatedOn: string;
  endedOn: string | null;
}

export interface IncidentInsert {
  foundAt: string;
  foundOn: string;
  foundById: number | null;
  foundByName: string;
  contaminant: string;
  createdById: number | null;
}

const jarColumns = [
  'label',
  'grainId',
  'cookRunId',
  'sessionId',
  'cultureId',
  'status',
  'inoculatedAt',
  'inoculatedOn',
  'endedOn',
  'imported',
];
const incidentColumns = [
  'foundAt',
  'foundOn',
  'foundById',
  'foundByName',
  'stage',
  'contaminant',
  'status',
  'verdict',
  'imported',
  'createdById',
  'version',
];

function valuesSql(columns: string[], rowCount: number): string {
  const row = `(${columns.map(() => '?').join(', ')})`;
  return Array.from({ length: rowCount }, () => row).join(', ');
}

/** The ids are read back by code, so the ORM need not reload generated columns row by row. */
function insertPlain<T extends ObjectLiteral>(
  m: EntityManager,
  target: EntityTarget<T>,
  rows: QueryDeepPartialEntity<T>[],
) {
  if (rows.length === 0) return Promise.resolve();
  return m.createQueryBuilder().insert().into(target).values(rows).updateEntity(false).execute();
}

const columnList = (columns: string[]) => columns.map((c) => `\`${c}\``).join(', ');

export const importsRepository = {
  grains: (m: EntityManager) => m.find(Grain, { select: { id: true, name: true } }),
  users: (m: EntityManager) => m.find(User, { select: { id: true, username: true, displayName: true } }),

  storedLabels: (m: EntityManager, labels: string[]) =>
    findIn(labels, (chunk) => m.find(Jar, { select: { id: true, label: true }, where: { label: In(chunk) } })),
  cookRuns: (m: EntityManager, codes: string[]) =>
    findIn(codes, (chunk) =>
      m.find(CookRun, { select: { id: true, code: true, minutesAtPressure: true }, where: { code: In(chunk) } }),
    ),
  sessions: (m: EntityManager, codes: string[]) =>
    findIn(codes, (chunk) =>
      m.find(InoculationSession, {
        select: { id: true, code: true, heldOn: true, operatorId: true, operatorName: true },
        where: { code: In(chunk) },
      }),
    ),
  cultures: (m: EntityManager, codes: string[]) =>
    findIn(codes, (chunk) => m.find(Culture, { select: { id: true, code: true }, where: { code: In(chunk) } })),

  async insertCookRuns(m: EntityManager, rows: { code: string; minutesAtPressure: number }[]) {
    for (const chunk of chunks(rows, insertChunk)) await insertPlain(m, CookRun, chunk);
  },
  async insertSessions(
    m: EntityManager,
    rows: { code: string; heldOn: string; operatorId: number | null; staffId: number | null; operatorName: string }[],
  ) {
    for (const chunk of chunks(rows, insertChunk)) await insertPlain(m, InoculationSession, chunk);
  },
  async insertCultures(m: EntityManager, rows: { code: string }[]) {
    for (const chunk of chunks(rows, insertChunk)) {
      await insertPlain(
        m,
        Culture,
        chunk.map((r) => ({ code: r.code, state: 'released' as const })),
      );
    }
  },

  /** Raw multi-row INSERT … RETURNING: the ORM's per-entity path is far too slow for 50,000 rows. */
  async insertJars(m: EntityManager, rows: JarInsert[]): Promise<Map<string, number>> {
    const ids = new Map<string, number>();
    for (const chunk of chunks(rows, insertChunk)) {
      const params = chunk.flatMap((r) => [
        r.label,
        r.grainId,
        r.cookRunId,
        r.sessionId,
        r.cultureId,
        r.status,
        r.inoculatedAt,
        r.inoculatedOn,
        r.endedOn,
        true,
      ]);
      const returned = await m.query<{ id: number; label: string }[]>(
        `INSERT INTO \`jars\` (${columnList(jarColumns)}) VALUES ${valuesSql(jarColumns, chunk.length)} RETURNING \`id\`, \`label\``,
        params,
      );
      for (const r of returned) ids.set(r.label, Number(r.id));
    }
    return ids;
  },

  /** RETURNING lists the rows in VALUES order, which pairs each new incident with its jar. */
  async insertIncidents(m: EntityManager, rows: IncidentInsert[]): Promise<number[]> {
    const ids: number[] = [];
    for (const chunk of chunks(rows, insertChunk)) {
      const params = chunk.flatMap((r) => [
        r.foundAt,
        r.foundOn,
        r.foundById,
        r.foundByName,
        'incubation',
        r.contaminant,
        'closed',
        'confirmed',
        true,
        r.createdById,
        1,
      ]);
      const returned = await m.query<{ id: number }[]>(
        `INSERT INTO \`incidents\` (${columnList(incidentColumns)}) VALUES ${valuesSql(incidentColumns, chunk.length)} RETURNING \`id\``,
        params,
      );
      if (returned.length !== chunk.length) throw new Error('incident insert returned a different number of rows');
      ids.push(...returned.map((r) => Number(r.id)));
    }
    return ids;
  },

  async linkIncidentJars(m: EntityManager, links: { incidentId: number; jarId: number }[]) {
    for (const chunk of chunks(links, insertChunk)) {
      await m.query(
        `INSERT INTO \`incident_jars\` (\`incidentId\`, \`jarId\`) VALUES ${valuesSql(['i', 'j'], chunk.length)}`,
        chunk.flatMap((l) => [l.incidentId, l.jarId]),
      );
    }
  },
};
