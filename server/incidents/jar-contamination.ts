import type { EntityManager } from 'typeorm';
import { jarStatuses, type JarStatus } from '../../shared/enums';
import { recordAudit, type Actor, type AuditEntry } from '../audit/audit.service';
import { localDate } from '../core/local-time';
import { recountJars } from '../tallies/tallies.service';
import {
  contaminatedJarIds,
  type JarEventRecord,
  type JarRecord,
  insertJarEvent,
  jarEventsOf,
  lockJarsForStatus,
  setJarStatus,
} from '../jars/jar-status.service';

/** Jars that have left the shelf keep their status: an incident on them is recorded, not re-shelved. */
const flaggable: JarStatus[] = ['incubating', 'colonised', 'on-hold'];

const isJarStatus = (s: string | null): s is JarStatus => s !== null && (jarStatuses as readonly string[]).includes(s);

function impliedStatus(e: JarEventRecord, current: JarStatus): JarStatus {
  if (isJarStatus(e.newStatus)) return e.newStatus;
  if (e.type === 'hold') return 'on-hold';
  if (e.type === 'discarded') return 'discarded';
  if (e.type === 'released') return 'released';
  return current;
}

/** Replays the jar's events to find the status it had before it last became contaminated. */
export function statusBeforeContamination(jar: Pick<JarRecord, 'colonisedOn'>, events: JarEventRecord[]): JarStatus {
  const ordered = [...events].sort((a, b) => a.at.getTime() - b.at.getTime() || a.id - b.id);
  let status: JarStatus = 'incubating';
  let before: JarStatus | undefined;
  for (const e of ordered) {
    const next = impliedStatus(e, status);
    if (next === 'contaminated' && status !== 'contaminated') before = status;
    status = next;
  }
  // Imported or older jars may carry colonisedOn without a status event for it.
  if (before === undefined || before === 'incubating') return jar.colonisedOn ? 'colonised' : 'incubating';
  return before;
}

/**
 * Brings each jar's status in line with its live incidents, inside the caller's transaction:
 * a jar with a live incident becomes contaminated; one whose last live incident was voided or
 * ruled out gets back the status it had before. Each change is a jar event and an audit event.
 * The analysis counts follow in the same transaction.
 */
export async function syncJarStatuses(m: EntityManager, actor: Actor, jarIds: number[], why: string): Promise<void> {
  if (jarIds.length === 0) return;
  const jars = await lockJarsForStatus(m, jarIds);
  const live = await contaminatedJarIds(m, jarIds);
  const events = await jarEventsOf(m, jarIds);
  const now = new Date();
  const audit: AuditEntry[] = [];
  for (const jar of jars) {
    let next: JarStatus | undefined;
    if (live.has(jar.id) && flaggable.includes(jar.status)) next = 'contaminated';
    if (!live.has(jar.id) && jar.status === 'contaminated') {
      next = statusBeforeContamination(
        jar,
        events.filter((e) => e.jarId === jar.id),
      );
    }
    if (!next || next === jar.status) continue;
    await insertJarEvent(m, {
      jarId: jar.id,
      type: 'status',
      at: now,
      onDate: localDate(now),
      byUserId: actor.id,
      byName: actor.displayName,
      newStatus: next,
      note: why,
    });
    await setJarStatus(m, jar.id, next);
    audit.push({
      action: 'status',
      recordType: 'jar',
      recordId: jar.id,
      field: 'status',
      oldValue: jar.status,
      newValue: next,
      reason: why,
    });
  }
  await recordAudit(m, actor, audit);
  await recountJars(m, jarIds);
}
