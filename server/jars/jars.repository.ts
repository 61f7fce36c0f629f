import { In, IsNull, Not, type EntityManager, type QueryDeepPartialEntity, type SelectQueryBuilder } from 'typeorm';
import type { JarExportQuery, JarFilters, JarListQuery } from '../../shared/schemas/jars';
import type { JarStatus } from '../../shared/enums';
import {
  applySortAndPage,
  inIdOrder,
  likePrefix,
  pageIds,
  sortColumn,
  whereDateRange,
  type PageTotal,
} from '../core/paging';
import { findByValues, insertMany } from '../db/bulk';
import { dataSource } from '../db/data-source';
import { CookRun } from '../cook-runs/cook-run.entity';
import { Culture } from '../cultures/culture.entity';
import { GrainLot } from '../grain/grain-lot.entity';
import { Grain } from '../grain/grain.entity';
import { PrepBatch } from '../grain/prep-batch.entity';
import { InoculationSession } from '../sessions/inoculation-session.entity';
import { LabSettings } from '../settings/lab-settings.entity';
import { JarEvent } from './jar-event.entity';
import { Jar } from './jar.entity';
import type { JarRawRow } from './jars.mapper';

const sortable = {
  label: 'j.label',
  inoculatedOn: 'j.inoculatedOn',
  status: 'j.status',
  grain: 'g.name',
  room: 'j.room',
};

function rowQuery(m: EntityManager): SelectQueryBuilder<Jar> {
  return m
    .createQueryBuilder(Jar, 'j')
    .innerJoin(Grain, 'g', 'g.id = j.grainId')
    .leftJoin(PrepBatch, 'pb', 'pb.id = j.prepBatchId')
    .leftJoin(CookRun, 'cr', 'cr.id = j.cookRunId')
    .leftJoin(InoculationSession, 's', 's.id = j.sessionId')
    .leftJoin(Culture, 'c', 'c.id = j.cultureId')
    .leftJoin(Jar, 'pj', 'pj.id = j.parentJarId')
    .select([
      'j.id AS id',
      'j.label AS label',
      'j.status AS status',
      'j.grainId AS grainId',
      'g.name AS grain',
      'j.prepBatchId AS prepBatchId',
      'pb.code AS prepBatchCode',
      'j.cookRunId AS cookRunId',
      'cr.code AS cookRunCode',
      'j.sessionId AS sessionId',
      's.code AS sessionCode',
      'j.cultureId AS cultureId',
      'c.code AS cultureCode',
      'j.parentJarId AS parentJarId',
      'pj.label AS parentJarLabel',
      'j.inoculumMl AS inoculumMl',
      'j.room AS room',
      'j.shelf AS shelf',
      'j.shelfPosition AS shelfPosition',
      'j.inoculatedAt AS inoculatedAt',
      'j.inoculatedOn AS inoculatedOn',
      'j.colonisedOn AS colonisedOn',
      'j.endedOn AS endedOn',
      'j.imported AS imported',
    ]);
}

function applyFilters(qb: SelectQueryBuilder<Jar>, f: JarFilters): SelectQueryBuilder<Jar> {
  if (f.status) qb.andWhere('j.status IN (:...status)', { status: f.status });
  if (f.grainId) qb.andWhere('j.grainId = :grainId', { grainId: f.grainId });
  if (f.cookRunId) qb.andWhere('j.cookRunId = :cookRunId', { cookRunId: f.cookRunId });
  if (f.sessionId) qb.andWhere('j.sessionId = :sessionId', { sessionId: f.sessionId });
  if (f.cultureId) qb.andWhere('j.cultureId = :cultureId', { cultureId: f.cultureId });
  if (f.room) qb.andWhere('j.room = :room', { room: f.room });
  if (f.shelf) qb.andWhere('j.shelf = :shelf', { shelf: f.shelf });
  if (f.q) qb.andWhere('j.label LIKE :q', { q: likePrefix(f.q) });
  return whereDateRange(qb, 'j.inoculatedOn', f);
}

export const jarsRepository = {
  findById: (id: number, m: EntityManager = dataSource.manager) => m.findOneBy(Jar, { id }),
  findByLabel: (label: string, m: EntityManager = dataSource.manager) => m.findOneBy(Jar, { label }),
  findByLabels: (m: EntityManager, labels: string[]) =>
    findByValues(m, Jar, 'label', labels, { id: true, label: true, status: true }),
  any: () => dataSource.manager.exists(Jar),
  updateByIds: (m: EntityManager, ids: number[], fields: Partial<Jar>) =>
    ids.length === 0 ? Promise.resolve() : m.update(Jar, { id: In(ids) }, fields),
  insertMany: (m: EntityManager, rows: QueryDeepPartialEntity<Jar>[]) => insertMany(m, Jar, rows),

  /** The jar and every jar made from it, at any depth. */
  async idsFromJar(m: EntityManager, id: number): Promise<number[]> {
    const rows: { id: number | string }[] = await m.query(
      `WITH RECURSIVE below (id) AS (
        SELECT id FROM jars WHERE id = ?
        UNION SELECT j.id FROM jars j JOIN below b ON j.parentJarId = b.id
      ) SELECT id FROM below`,
      [id],
    );
    return rows.map((r) => Number(r.id));
  },

  /**
   * The page's ids from the jar table's own indexes first, then the display columns joined for those
   * ids alone: neither the page nor its capped total joins every jar.
   */
  async list(q: JarListQuery): Promise<[JarRawRow[], PageTotal]> {
    const filtered = applyFilters(dataSource.manager.createQueryBuilder(Jar, 'j'), q);
    if (sortColumn(sortable, q.sort ?? 'label').column.startsWith('g.')) {
      filtered.innerJoin(Grain, 'g', 'g.id = j.grainId');
    }
    const [ids, total] = await pageIds(filtered, q, {
      sortable,
      defaultSort: 'label',
      tieBreak: 'j.id',
      unique: ['j.label'],
    });
    return [await jarsRepository.rowsByIds(ids), total];
  },

  async exportRows(q: JarExportQuery): Promise<JarRawRow[]> {
    const qb = applyFilters(rowQuery(dataSource.manager), q);
    return applySortAndPage(
      qb,
      { ...q, page: 1, pageSize: Number.MAX_SAFE_INTEGER },
      sortable,
      'label',
      'j.id',
    ).getRawMany<JarRawRow>();
  },

  /** Rows in the order of the ids given. */
  async rowsByIds(ids: number[], m: EntityManager = dataSource.manager): Promise<JarRawRow[]> {
    if (ids.length === 0) return [];
    const rows = await rowQuery(m).where('j.id IN (:...ids)', { ids }).getRawMany<JarRawRow>();
    return inIdOrder(ids, rows, (r) => Number(r.id));
  },

  async rowsBySession(sessionId: number): Promise<JarRawRow[]> {
    return rowQuery(dataSource.manager)
      .where('j.sessionId = :sessionId', { sessionId })
      .orderBy('j.label', 'ASC')
      .getRawMany<JarRawRow>();
  },

  /** Jars still incubating on one shelf, in the order a technician walks them. */
  shelf(room: string, shelf: string): Promise<JarRawRow[]> {
    return rowQuery(dataSource.manager)
      .where('j.room = :room AND j.shelf = :shelf', { room, shelf })
      .andWhere('j.endedOn IS NULL')
      .andWhere("j.status = 'incubating'")
      .orderBy('j.shelfPosition IS NULL', 'ASC')
      .addOrderBy('j.shelfPosition', 'ASC')
      .addOrderBy('j.label', 'ASC')
      .getRawMany<JarRawRow>();
  },

  /** The lab's own rooms and shelves that hold incubating jars, for the walk's pickers. */
  async shelfPlaces(): Promise<{ room: string; shelf: string; incubating: number }[]> {
    const rows = await dataSource.manager
      .createQueryBuilder(Jar, 'j')
      .select('j.room', 'room')
      .addSelect('j.shelf', 'shelf')
      .addSelect('COUNT(*)', 'incubating')
      .where("j.status = 'incubating' AND j.endedOn IS NULL")
      .andWhere('j.room IS NOT NULL AND j.shelf IS NOT NULL')
      .groupBy('j.room')
      .addGroupBy('j.shelf')
      .orderBy('j.room', 'ASC')
      .addOrderBy('j.shelf', 'ASC')
      .getRawMany<{ room: string; shelf: string; incubating: string | number }>();
    return rows.map((r) => ({ room: r.room, shelf: r.shelf, incubating: Number(r.incubating) }));
  },

  async lastEventId(m: EntityManager, jarId: number): Promise<number | null> {
    const e = await m.findOne(JarEvent, { where: { jarId }, order: { id: 'DESC' }, select: { id: true } });
    return e?.id ?? null;
  },

  findEvent: (m: EntityManager, id: number) => m.findOneBy(JarEvent, { id }),
  deleteEvent: (m: EntityManager, id: number) => m.delete(JarEvent, { id }),

  /**
   * Locks the settings row as the lab-wide mutex for label numbers and shelf positions: two batches
   * made at once never take the same label, and two moves never take the same shelf place.
   */
  async lockSequences(m: EntityManager): Promise<void> {
    await m
      .createQueryBuilder(LabSettings, 's')
      .select('s.id')
      .where('s.id = 1')
      .setLock('pessimistic_write')
      .getRawOne();
  },

  /** Call after lockSequences. */
  async nextShelfPosition(m: EntityManager, room: string, shelf: string): Promise<number> {
    const raw = await m
      .createQueryBuilder(Jar, 'j')
      .select('MAX(j.shelfPosition)', 'n')
      .where('j.room = :room AND j.shelf = :shelf', { room, shelf })
      .getRawOne<{ n: string | number | null }>();
    return Number(raw?.n ?? 0) + 1;
  },

  lockJars: (ids: number[], m: EntityManager) =>
    ids.length === 0
      ? Promise.resolve([])
      : m.find(Jar, { where: { id: In(ids) }, lock: { mode: 'pessimistic_write' }, order: { id: 'ASC' } }),

  async insertJars(m: EntityManager, rows: Partial<Jar>[]): Promise<Jar[]> {
    await m.insert(Jar, rows);
    return m.find(Jar, { where: { label: In(rows.map((r) => r.label)) }, order: { label: 'ASC' } });
  },

  async lastPercentColonised(m: EntityManager, jarId: number): Promise<number | null> {
    const e = await m.findOne(JarEvent, {
      where: { jarId, percentColonised: Not(IsNull()) },
      order: { at: 'DESC', id: 'DESC' },
      select: { id: true, percentColonised: true },
    });
    return e?.percentColonised ?? null;
  },

  insertEvents: (m: EntityManager, rows: Partial<JarEvent>[]) =>
    rows.length ? m.insert(JarEvent, rows) : Promise.resolve(),

  updateJar: (
    m: EntityManager,
    id: number,
    changes: Partial<Pick<Jar, 'status' | 'room' | 'shelf' | 'shelfPosition' | 'colonisedOn' | 'endedOn'>>,
  ) => m.update(Jar, { id }, changes),

  setStatus: (m: EntityManager, ids: number[], status: JarStatus) =>
    ids.length === 0 ? Promise.resolve() : m.update(Jar, { id: In(ids), endedOn: IsNull() }, { status }),

  findSession: (id: number, m: EntityManager = dataSource.manager) => m.findOneBy(InoculationSession, { id }),
  findGrain: (id: number, m: EntityManager = dataSource.manager) => m.findOneBy(Grain, { id }),
  findGrainLot: (id: number, m: EntityManager = dataSource.manager) => m.findOneBy(GrainLot, { id }),
  findPrepBatch: (id: number, m: EntityManager = dataSource.manager) => m.findOneBy(PrepBatch, { id }),
  findCookRun: (id: number, m: EntityManager = dataSource.manager) => m.findOneBy(CookRun, { id }),
  findCulture: (id: number, m: EntityManager = dataSource.manager) => m.findOneBy(Culture, { id }),
};
