import { In } from 'typeorm';
import type { JarStatus } from '../../shared/enums';
import type { IncidentJarDto, IncidentStepLinkDto } from '../../shared/schemas/incident-detail';
import { dataSource } from '../db/data-source';
import { Jar } from '../jars/jar.entity';
import { Photo } from '../photos/photo.entity';
import { IncidentJar } from './incident-jar.entity';
import { IncidentPhoto } from './incident-photo.entity';
import { dateText } from '../core/calendar';
import { numberOrNull } from '../core/raw-values';

interface JarRow {
  id: number;
  label: string;
  status: JarStatus;
  grain: string;
  inoculatedOn: string | Date;
  room: string | null;
  shelf: string | null;
  cookRunId: number | null;
  cookRunCode: string | null;
  sessionId: number | null;
  sessionCode: string | null;
  operatorName: string | null;
  cultureId: number | null;
  cultureCode: string | null;
  parentJarId: number | null;
}

const maxAncestry = 25;
// Raw DATE columns arrive as Date at UTC midnight (the connection's time zone is Z).

/** Walks parent jars level by level (one query per generation) up to the culture at the root. */
async function ancestryOf(rows: JarRow[]): Promise<Map<number, IncidentJarDto['ancestry']>> {
  const byId = new Map<number, { label: string; parentJarId: number | null; cultureId: number | null }>();
  let pending = [...new Set(rows.map((r) => r.parentJarId).filter((id): id is number => id !== null))];
  for (let depth = 0; pending.length && depth < maxAncestry; depth += 1) {
    const parents = await dataSource.manager.find(Jar, {
      where: { id: In(pending) },
      select: { id: true, label: true, parentJarId: true, cultureId: true },
    });
    for (const p of parents) byId.set(p.id, p);
    pending = parents.map((p) => p.parentJarId).filter((id): id is number => id !== null && !byId.has(id));
  }
  const cultureIds = [...new Set([...byId.values()].map((j) => j.cultureId).filter((id): id is number => id !== null))];
  const cultures: { id: number; code: string }[] = cultureIds.length
    ? await dataSource.manager
        .createQueryBuilder()
        .select(['c.id AS id', 'c.code AS code'])
        .from('cultures', 'c')
        .where('c.id IN (:...ids)', { ids: cultureIds })
        .getRawMany()
    : [];
  const cultureCode = new Map(cultures.map((c) => [Number(c.id), c.code]));
  const out = new Map<number, IncidentJarDto['ancestry']>();
  for (const r of rows) {
    const chain: IncidentJarDto['ancestry'] = [];
    let next = r.parentJarId;
    while (next !== null && chain.length < maxAncestry) {
      const parent = byId.get(next);
      if (!parent) break;
      chain.push({ kind: 'jar', id: next, code: parent.label });
      if (parent.cultureId !== null)
        chain.push({
          kind: 'culture',
          id: parent.cultureId,
          code: cultureCode.get(parent.cultureId) ?? `#${parent.cultureId}`,
        });
      next = parent.parentJarId;
    }
    out.set(r.id, chain);
  }
  return out;
}

export const incidentDetailRepository = {
  async jars(incidentId: number): Promise<IncidentJarDto[]> {
    const rows: JarRow[] = await dataSource.manager
      .createQueryBuilder()
      .select([
        'j.id AS id',
        'j.label AS label',
        'j.status AS status',
        'g.name AS grain',
        'j.inoculatedOn AS inoculatedOn',
        'j.room AS room',
        'j.shelf AS shelf',
        'j.cookRunId AS cookRunId',
        'cr.code AS cookRunCode',
        'j.sessionId AS sessionId',
        's.code AS sessionCode',
        's.operatorName AS operatorName',
        'j.cultureId AS cultureId',
        'c.code AS cultureCode',
        'j.parentJarId AS parentJarId',
      ])
      .from(IncidentJar, 'ij')
      .innerJoin(Jar, 'j', 'j.id = ij.jarId')
      .innerJoin('grains', 'g', 'g.id = j.grainId')
      .leftJoin('cook_runs', 'cr', 'cr.id = j.cookRunId')
      .leftJoin('inoculation_sessions', 's', 's.id = j.sessionId')
      .leftJoin('cultures', 'c', 'c.id = j.cultureId')
      .where('ij.incidentId = :incidentId', { incidentId })
      .orderBy('j.label', 'ASC')
      .getRawMany();
    const ancestry = await ancestryOf(rows);
    return rows.map((r) => {
      const chain = ancestry.get(r.id) ?? [];
      const parent = chain[0];
      return {
        id: Number(r.id),
        label: r.label,
        status: r.status,
        grain: r.grain,
        inoculatedOn: dateText(r.inoculatedOn) ?? '',
        room: r.room,
        shelf: r.shelf,
        cookRun: r.cookRunId !== null ? { id: Number(r.cookRunId), code: r.cookRunCode ?? '' } : null,
        session:
          r.sessionId !== null
            ? { id: Number(r.sessionId), code: r.sessionCode ?? '', operatorName: r.operatorName }
            : null,
        culture: r.cultureId !== null ? { id: Number(r.cultureId), code: r.cultureCode ?? '' } : null,
        parentJar: parent?.kind === 'jar' ? { id: parent.id, label: parent.code } : null,
        ancestry: chain,
      };
    });
  },

  async photos(incidentId: number) {
    const links = await dataSource.manager.find(IncidentPhoto, {
      where: { incidentId },
      order: { addedAt: 'ASC', photoId: 'ASC' },
    });
    const photos = links.length ? await dataSource.manager.findBy(Photo, { id: In(links.map((l) => l.photoId)) }) : [];
    const byId = new Map(photos.map((p) => [p.id, p]));
    return links.flatMap((l) => {
      const photo = byId.get(l.photoId);
      return photo ? [{ photo, caption: l.caption, addedAt: l.addedAt }] : [];
    });
  },

  async stepLinks(incidentId: number): Promise<IncidentStepLinkDto[]> {
    const rows: Record<string, unknown>[] = await dataSource.manager
      .createQueryBuilder()
      .select([
        'l.id AS id',
        'l.stepId AS stepId',
        'ps.position AS position',
        'ps.text AS stepText',
        'pv.title AS procedureTitle',
        'pv.version AS procedureVersion',
        'l.linkedByName AS linkedByName',
        'l.note AS note',
        'l.createdAt AS createdAt',
      ])
      .from('incident_step_links', 'l')
      .leftJoin('procedure_steps', 'ps', 'ps.id = l.stepId')
      .leftJoin('procedure_versions', 'pv', 'pv.id = ps.versionId')
      .where('l.incidentId = :incidentId', { incidentId })
      .orderBy('l.createdAt', 'ASC')
      .getRawMany();
    return rows.map((r) => ({
      id: Number(r.id),
      stepId: Number(r.stepId),
      position: numberOrNull(r.position),
      stepText: (r.stepText as string | null) ?? null,
      procedureTitle: (r.procedureTitle as string | null) ?? null,
      procedureVersion: numberOrNull(r.procedureVersion),
      linkedByName: String(r.linkedByName),
      note: (r.note as string | null) ?? null,
      createdAt: new Date(r.createdAt as string | Date).toISOString(),
    }));
  },
};
