import { In, type EntityManager } from 'typeorm';
import type { JarStatus } from '../../shared/enums';
import { dataSource } from '../db/data-source';
import { Culture } from '../cultures/culture.entity';
import { IncidentJar } from '../incidents/incident-jar.entity';
import { IncidentPhoto } from '../incidents/incident-photo.entity';
import { Incident } from '../incidents/incident.entity';
import { Photo } from '../photos/photo.entity';
import { JarEvent } from './jar-event.entity';

/** Guards the walks up the tree against a cycle someone typed into parent links. */
const maxDepth = 1000;

export interface AncestorJarRaw {
  id: number;
  label: string;
  status: JarStatus;
  inoculatedOn: Date | string;
  cultureId: number | null;
  depth: number;
}

export const jarStoryRepository = {
  events: (jarId: number, m: EntityManager = dataSource.manager) =>
    m.find(JarEvent, { where: { jarId }, order: { at: 'ASC', id: 'ASC' } }),

  /** The parent-jar chain above a jar, nearest first (grain-to-grain transfers). */
  async ancestorJars(jarId: number): Promise<AncestorJarRaw[]> {
    const rows: AncestorJarRaw[] = await dataSource.query(
      `WITH RECURSIVE up (id, parentJarId, depth) AS (
         SELECT id, parentJarId, 0 FROM jars WHERE id = ?
         UNION ALL
         SELECT p.id, p.parentJarId, up.depth + 1 FROM jars p JOIN up ON p.id = up.parentJarId WHERE up.depth < ?
       )
       SELECT j.id, j.label, j.status, j.inoculatedOn, j.cultureId, up.depth
         FROM up JOIN jars j ON j.id = up.id WHERE up.depth > 0 ORDER BY up.depth`,
      [jarId, maxDepth],
    );
    return rows.map((r) => ({
      ...r,
      id: Number(r.id),
      depth: Number(r.depth),
      cultureId: r.cultureId === null ? null : Number(r.cultureId),
    }));
  },

  /** A culture and the cultures it was made from, nearest first. */
  async cultureChain(cultureId: number): Promise<Culture[]> {
    const rows: { id: number; depth: number }[] = await dataSource.query(
      `WITH RECURSIVE up (id, parentCultureId, depth) AS (
         SELECT id, parentCultureId, 0 FROM cultures WHERE id = ?
         UNION ALL
         SELECT c.id, c.parentCultureId, up.depth + 1 FROM cultures c JOIN up ON c.id = up.parentCultureId WHERE up.depth < ?
       )
       SELECT id, depth FROM up ORDER BY depth`,
      [cultureId, maxDepth],
    );
    if (rows.length === 0) return [];
    const cultures = await dataSource.manager.findBy(Culture, { id: In(rows.map((r) => Number(r.id))) });
    const byId = new Map(cultures.map((c) => [c.id, c]));
    return rows.flatMap((r) => byId.get(Number(r.id)) ?? []);
  },

  /** Read-only view of the incidents register for this jar; the incidents module owns the writes. */
  incidents: (jarId: number) =>
    dataSource.manager
      .createQueryBuilder(Incident, 'i')
      .innerJoin(IncidentJar, 'ij', 'ij.incidentId = i.id')
      .where('ij.jarId = :jarId', { jarId })
      .orderBy('i.foundAt', 'ASC')
      .addOrderBy('i.id', 'ASC')
      .getMany(),

  async photos(eventPhotoIds: number[], incidentIds: number[]) {
    const incidentPhotos = incidentIds.length
      ? await dataSource.manager
          .createQueryBuilder(IncidentPhoto, 'ip')
          .where('ip.incidentId IN (:...incidentIds)', { incidentIds })
          .getMany()
      : [];
    const ids = [...new Set([...eventPhotoIds, ...incidentPhotos.map((p) => p.photoId)])];
    const photos = ids.length
      ? await dataSource.manager.createQueryBuilder(Photo, 'p').where('p.id IN (:...ids)', { ids }).getMany()
      : [];
    return { photos, incidentPhotos };
  },
};
