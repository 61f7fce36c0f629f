import type { EntityManager } from 'typeorm';
import type { JarEventInput } from '../../shared/schemas/jar-events';
import type { ShelfWalkInput, ShelfWalkResultDto } from '../../shared/schemas/jar-shelf';
import { recordAudit, type AuditEntry } from '../audit/audit.service';
import { unprocessable } from '../core/errors';
import { dataSource } from '../db/data-source';
import { attachRecord, claimKey, type IdempotencyClaim } from '../idempotency/idempotency.service';
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

/**
 * One transaction for the whole walk: a single refused mark writes nothing. A walk sends its marks
 * one at a time, each under its own key; the key of a single mark names its event for an undo.
 */
export async function recordShelfWalk(
  actor: EventActor,
  input: ShelfWalkInput,
  claim?: IdempotencyClaim,
): Promise<ShelfWalkResultDto> {
  return dataSource.transaction(async (m) => {
    await claimKey(m, claim);
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
    const [only] = input.marks;
    if (only && input.marks.length === 1) {
      const eventId = await jarsRepository.lastEventId(m, only.jarId);
      if (eventId) await attachRecord(m, claim, eventId);
    }
    return { marked: input.marks.length, jars: (await jarsRepository.rowsByIds(ids, m)).map(toJarRow) };
  });
}
