import type { EntityManager } from 'typeorm';
import type { JarEventInput, ShelfWalkInput, ShelfWalkResultDto } from '../../shared/schemas/jars';
import { recordAudit, type AuditEntry } from '../audit/audit.service';
import { unprocessable } from '../core/errors';
import { dataSource } from '../db/data-source';
import { applyEvent, type EventActor } from './jar-events.service';
import { jarsRepository } from './jars.repository';
import { toJarRow } from './jars.mapper';

/** A clean mark without a percent keeps the last check's figure rather than claiming 0 %. */
async function markToEvent(
  m: EntityManager,
  jarId: number,
  mark: ShelfWalkInput['marks'][number],
): Promise<JarEventInput> {
  if (mark.mark === 'clean') {
    const percentColonised = mark.percentColonised ?? (await jarsRepository.lastPercentColonised(m, jarId)) ?? 0;
    return { type: 'check', percentColonised, note: mark.note ?? 'clean on shelf walk' };
  }
  return { type: mark.mark, note: mark.note };
}

/** One transaction for the whole walk: a single refused mark writes nothing. */
export async function recordShelfWalk(actor: EventActor, input: ShelfWalkInput): Promise<ShelfWalkResultDto> {
  return dataSource.transaction(async (m) => {
    const ids = input.marks.map((mk) => mk.jarId);
    const jars = new Map((await jarsRepository.lockJars(ids, m)).map((j) => [j.id, j]));
    const entries: AuditEntry[] = [];
    for (const [i, mk] of input.marks.entries()) {
      const jar = jars.get(mk.jarId);
      if (!jar)
        throw unprocessable(`marks.${i}.jarId: no such jar`, [{ path: `marks.${i}.jarId`, message: 'no such jar' }]);
      entries.push(...(await applyEvent(m, actor, jar, await markToEvent(m, jar.id, mk), `marks.${i}.mark`)));
    }
    await recordAudit(m, actor, entries);
    return { marked: input.marks.length, jars: (await jarsRepository.rowsByIds(ids, m)).map(toJarRow) };
  });
}
