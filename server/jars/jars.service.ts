import type { EntityManager } from 'typeorm';
import type { Page } from '../../shared/schemas/common';
import type {
  CreateJarBatchInput,
  JarBatchResultDto,
  JarExportQuery,
  JarListQuery,
  JarRowDto,
} from '../../shared/schemas/jars';
import type { ShelfQuery } from '../../shared/schemas/jar-shelf';
import { recordAudit, type Actor } from '../audit/audit.service';
import { badRequest, conflict, unprocessable } from '../core/errors';
import { localDate } from '../core/local-time';
import { pageResult } from '../core/paging';
import { cultureUseWarning } from '../cultures/cultures.service';
import { dataSource } from '../db/data-source';
import type { Jar } from './jar.entity';
import { nextJarLabels } from './jar-labels.service';
import { jarsRepository } from './jars.repository';
import { dateOnly } from '../core/raw-values';
import { toJarRow } from './jars.mapper';
import { recountJars } from '../tallies/tallies.service';

const missing = (path: string, what: string) =>
  unprocessable(`${path}: no such ${what}`, [{ path, message: `no such ${what}` }]);

/** Parent jars in these states would carry their trouble into every jar made from them. */
const unusableParent = new Set(['contaminated', 'on-hold', 'discarded', 'released']);

interface Inoculum {
  cultureId: number | null;
  parentJarId: number | null;
  warnings: string[];
}

async function checkInoculum(m: EntityManager, input: CreateJarBatchInput): Promise<Inoculum> {
  const warnings: string[] = [];
  if (input.cultureId) {
    const culture = await jarsRepository.findCulture(input.cultureId, m);
    if (!culture) throw missing('cultureId', 'culture');
    const warning = await cultureUseWarning(culture.id, m);
    if (warning) warnings.push(`${warning} Test it on agar before trusting these jars.`);
    return { cultureId: culture.id, parentJarId: null, warnings };
  }
  const parent = await jarsRepository.findById(input.parentJarId!, m);
  if (!parent) throw missing('parentJarId', 'jar');
  if (unusableParent.has(parent.status)) {
    const message = `jar ${parent.label} is ${parent.status} and cannot be used as inoculum`;
    throw conflict(`parentJarId: ${message}`, [{ path: 'parentJarId', message }]);
  }
  if (parent.status === 'incubating') warnings.push(`Parent jar ${parent.label} is not marked fully colonised yet.`);
  return { cultureId: null, parentJarId: parent.id, warnings };
}

async function resolveGrain(m: EntityManager, input: CreateJarBatchInput): Promise<number> {
  let fromBatch: number | undefined;
  if (input.prepBatchId) {
    const batch = await jarsRepository.findPrepBatch(input.prepBatchId, m);
    if (!batch) throw missing('prepBatchId', 'prep batch');
    const lot = await jarsRepository.findGrainLot(batch.grainLotId, m);
    if (!lot) throw missing('prepBatchId', 'grain lot for this prep batch');
    fromBatch = lot.grainId;
  }
  if (input.grainId) {
    if (!(await jarsRepository.findGrain(input.grainId, m))) throw missing('grainId', 'grain');
    if (fromBatch !== undefined && fromBatch !== input.grainId) {
      throw badRequest('grainId: does not match the grain of the prep batch', [
        { path: 'grainId', message: 'does not match the grain of the prep batch' },
      ]);
    }
    return input.grainId;
  }
  return fromBatch!;
}

export async function createJarBatch(actor: Actor, input: CreateJarBatchInput): Promise<JarBatchResultDto> {
  const inoculatedAt = input.inoculatedAt ?? new Date();
  if (inoculatedAt.getTime() > Date.now() + 5 * 60_000) {
    throw badRequest('inoculatedAt: cannot be in the future', [
      { path: 'inoculatedAt', message: 'cannot be in the future' },
    ]);
  }
  // READ COMMITTED: after waiting for the lock, the label count must see the batch that held it.
  return dataSource.transaction('READ COMMITTED', async (m) => {
    await jarsRepository.lockSequences(m);
    const session = await jarsRepository.findSession(input.sessionId, m);
    if (!session) throw missing('sessionId', 'session');
    if (input.cookRunId && !(await jarsRepository.findCookRun(input.cookRunId, m)))
      throw missing('cookRunId', 'cook run');
    const grainId = await resolveGrain(m, input);
    const inoculum = await checkInoculum(m, input);
    const inoculatedOn = localDate(inoculatedAt);
    const warnings = [...inoculum.warnings];
    if (dateOnly(session.heldOn) !== inoculatedOn) {
      warnings.push(
        `Session ${session.code} was held on ${dateOnly(session.heldOn)}, but these jars are dated ${inoculatedOn}.`,
      );
    }

    const labels = await nextJarLabels(m, input.count);
    const firstPlace =
      input.room && input.shelf ? await jarsRepository.nextShelfPosition(m, input.room, input.shelf) : null;
    const rows: Partial<Jar>[] = Array.from({ length: input.count }, (_, i) => ({
      label: labels[i],
      grainId,
      prepBatchId: input.prepBatchId ?? null,
      cookRunId: input.cookRunId ?? null,
      sessionId: session.id,
      cultureId: inoculum.cultureId,
      parentJarId: inoculum.parentJarId,
      inoculumMl: input.inoculumMl ?? null,
      room: input.room ?? null,
      shelf: input.shelf ?? null,
      shelfPosition: firstPlace === null ? null : firstPlace + i,
      status: 'incubating',
      inoculatedAt,
      inoculatedOn,
    }));
    const jars = await jarsRepository.insertJars(m, rows);
    await recountJars(
      m,
      jars.map((j) => j.id),
    );
    await recordAudit(
      m,
      actor,
      jars.map((j) => ({
        action: 'create',
        recordType: 'jar',
        recordId: j.id,
        newValue: {
          label: j.label,
          sessionId: j.sessionId,
          cultureId: j.cultureId,
          parentJarId: j.parentJarId,
          grainId: j.grainId,
        },
      })),
    );
    const out = await jarsRepository.rowsByIds(
      jars.map((j) => j.id),
      m,
    );
    return { jars: out.map(toJarRow), warnings };
  });
}

export async function listJars(q: JarListQuery): Promise<Page<JarRowDto>> {
  const [rows, total] = await jarsRepository.list(q);
  return pageResult(rows.map(toJarRow), total, q);
}

export async function exportJars(q: JarExportQuery): Promise<JarRowDto[]> {
  return (await jarsRepository.exportRows(q)).map(toJarRow);
}

export async function shelfJars(q: ShelfQuery): Promise<JarRowDto[]> {
  return (await jarsRepository.shelf(q.room, q.shelf)).map(toJarRow);
}

export const shelfPlaces = () => jarsRepository.shelfPlaces();
