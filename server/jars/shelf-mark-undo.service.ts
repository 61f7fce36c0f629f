import type { JarRowDto } from '../../shared/schemas/jars';
import type { UndoShelfMarkInput } from '../../shared/schemas/jar-shelf';
import { recordAudit } from '../audit/audit.service';
import { AppError, conflict, notFound } from '../core/errors';
import { dataSource } from '../db/data-source';
import { lockClaimed, markUndone } from '../idempotency/idempotency.service';
import type { EventActor } from './jar-events.service';
import { jarsRepository } from './jars.repository';
import { recountJars } from '../tallies/tallies.service';
import { toJarRow } from './jars.mapper';

const noMark = () => notFound('A shelf mark of yours under that key');

/**
 * Takes back the technician's own last mark on a jar: its event goes, a colonised mark returns
 * the jar to incubating, and the audit trail keeps both the mark and its undoing.
 */
export async function undoShelfMark(actor: EventActor & { id: number }, input: UndoShelfMarkInput): Promise<JarRowDto> {
  return dataSource.transaction(async (m) => {
    const claimed = await lockClaimed(m, actor.id, input.key);
    if (!claimed || claimed.scope !== 'shelf-mark' || claimed.recordId === null) throw noMark();
    if (claimed.undoneAt) throw new AppError(410, 'already-undone', 'key: this mark was already undone.');
    const event = await jarsRepository.findEvent(m, claimed.recordId);
    if (!event) throw noMark();
    const [jar] = await jarsRepository.lockJars([event.jarId], m);
    if (!jar) throw noMark();
    if ((await jarsRepository.lastEventId(m, jar.id)) !== event.id) {
      throw conflict(`key: ${jar.label} has a later event than this mark; change it from the jar's page.`, [
        { path: 'key', message: 'a later event was recorded on the jar' },
      ]);
    }
    await jarsRepository.deleteEvent(m, event.id);
    if (event.newStatus === 'colonised') {
      await jarsRepository.updateJar(m, jar.id, { status: 'incubating', colonisedOn: null });
      await recountJars(m, [jar.id]);
    }
    await recordAudit(m, actor, [
      {
        action: 'jar-mark-undone',
        recordType: 'jar',
        recordId: jar.id,
        field: 'event',
        oldValue: { type: event.type, at: event.at, percentColonised: event.percentColonised, status: event.newStatus },
        newValue: null,
        reason: 'undone on the shelf walk',
      },
    ]);
    await markUndone(m, claimed.id);
    const [row] = await jarsRepository.rowsByIds([jar.id], m);
    return toJarRow(row!);
  });
}
