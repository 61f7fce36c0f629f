import type { EntityManager } from 'typeorm';
import type { Role } from '../../shared/enums';
import type { JarEventInput } from '../../shared/schemas/jar-events';
import type { JarRowDto } from '../../shared/schemas/jars';
import { recordAudit, type Actor, type AuditEntry } from '../audit/audit.service';
import { badRequest, forbidden, notFound, unprocessable } from '../core/errors';
import { localDate } from '../core/local-time';
import { dataSource } from '../db/data-source';
import { photoExists } from '../photos/photos.service';
import type { JarEvent } from './jar-event.entity';
import type { Jar } from './jar.entity';
import { statusAfter } from './jar-life';
import { jarsRepository } from './jars.repository';
import { toJarRow } from './jars.mapper';
import { recountJars } from '../tallies/tallies.service';

export interface EventActor extends Actor {
  role: Role;
}

/** A phone clock a little ahead of the server's is fine; a date next week is a typo. */
const futureSlackMs = 5 * 60_000;

function eventTime(jar: Jar, at: Date | undefined, path: string): Date {
  const when = at ?? new Date();
  if (when.getTime() > Date.now() + futureSlackMs)
    throw badRequest(`${path}: cannot be in the future`, [{ path, message: 'cannot be in the future' }]);
  if (when.getTime() < jar.inoculatedAt.getTime()) {
    throw badRequest(`${path}: is before the jar was inoculated`, [
      { path, message: 'is before the jar was inoculated' },
    ]);
  }
  return when;
}

/**
 * Writes one event on a locked jar, inside the caller's transaction, and returns its audit entries.
 * `path` names the input field in errors (e.g. marks.2.mark in a shelf walk).
 */
export async function applyEvent(
  m: EntityManager,
  actor: EventActor,
  jar: Jar,
  input: JarEventInput,
  path: string,
): Promise<AuditEntry[]> {
  if (input.type === 'resume' && actor.role !== 'supervisor' && actor.role !== 'admin') {
    throw forbidden('Only a supervisor or an admin can take a jar off hold.');
  }
  const newStatus = statusAfter(jar, input.type, path);
  const at = eventTime(jar, input.at, path.replace(/(mark|type)$/, 'at'));
  const onDate = localDate(at);
  const base = { recordType: 'jar', recordId: jar.id, action: `jar-${input.type}` };
  const event: Partial<JarEvent> = {
    jarId: jar.id,
    type: input.type === 'colonised' ? 'status' : input.type === 'resume' ? 'hold' : input.type,
    at,
    onDate,
    byUserId: actor.id,
    byName: actor.displayName,
    note: input.note || null,
    newStatus: newStatus === jar.status ? null : newStatus,
  };
  const changes: Parameters<typeof jarsRepository.updateJar>[2] = {};
  const entries: AuditEntry[] = [];
  let reason: string | null = null;

  switch (input.type) {
    case 'check':
      if (input.photoId && !(await photoExists(m, input.photoId))) {
        throw unprocessable('photoId: no such photo', [{ path: 'photoId', message: 'no such photo' }]);
      }
      event.percentColonised = input.percentColonised;
      event.photoId = input.photoId ?? null;
      entries.push({ ...base, field: 'percentColonised', newValue: input.percentColonised });
      break;
    case 'shaken':
      entries.push({ ...base, field: 'shakenAt', newValue: at });
      break;
    case 'moved': {
      if (input.room === jar.room && input.shelf === jar.shelf) {
        throw badRequest('shelf: the jar is already on that shelf', [
          { path: 'shelf', message: 'the jar is already on that shelf' },
        ]);
      }
      await jarsRepository.lockSequences(m);
      Object.assign(changes, {
        room: input.room,
        shelf: input.shelf,
        shelfPosition: await jarsRepository.nextShelfPosition(m, input.room, input.shelf),
      });
      Object.assign(event, { room: input.room, shelf: input.shelf, fromRoom: jar.room });
      for (const field of ['room', 'shelf', 'shelfPosition'] as const)
        entries.push({ ...base, field, oldValue: jar[field], newValue: changes[field] });
      break;
    }
    case 'released':
      Object.assign(event, { releasedTo: input.releasedTo, releasedToWho: input.releasedToWho || null });
      changes.endedOn = onDate;
      entries.push({
        ...base,
        field: 'releasedTo',
        newValue: { releasedTo: input.releasedTo, releasedToWho: input.releasedToWho || null },
      });
      break;
    case 'discarded':
      changes.endedOn = onDate;
      reason = input.reason;
      break;
    case 'hold':
    case 'resume':
      reason = input.reason;
      break;
    case 'colonised':
      changes.colonisedOn = onDate;
      break;
  }
  if (reason) event.note = input.note ? `${reason} — ${input.note}` : reason;
  if (newStatus !== jar.status) {
    changes.status = newStatus;
    entries.push({ ...base, field: 'status', oldValue: jar.status, newValue: newStatus, reason });
  }
  if (changes.endedOn) entries.push({ ...base, field: 'endedOn', newValue: changes.endedOn });
  if (changes.colonisedOn) entries.push({ ...base, field: 'colonisedOn', newValue: changes.colonisedOn });

  await jarsRepository.insertEvents(m, [event]);
  if (Object.keys(changes).length > 0) await jarsRepository.updateJar(m, jar.id, changes);
  // The counts key a jar on the room it stood in at finding or at the end of its window, and its colonisation
  // time on its status and its colonised and ended days.
  if (event.type === 'moved' || Object.keys(changes).length > 0) await recountJars(m, [jar.id]);
  Object.assign(jar, changes);
  return entries;
}

export async function recordJarEvent(actor: EventActor, jarId: number, input: JarEventInput): Promise<JarRowDto> {
  // READ COMMITTED so a move sees shelf places taken by a move that held the lock before it.
  return dataSource.transaction('READ COMMITTED', async (m) => {
    const [jar] = await jarsRepository.lockJars([jarId], m);
    if (!jar) throw notFound('Jar');
    await recordAudit(m, actor, await applyEvent(m, actor, jar, input, 'type'));
    const [row] = await jarsRepository.rowsByIds([jarId], m);
    return toJarRow(row!);
  });
}

/**
 * Puts already-locked jars on hold inside the caller's transaction (a lineage hold), with a hold
 * event and an audit event for each; returns the labels held.
 */
export async function holdLockedJars(
  m: EntityManager,
  actor: Actor,
  jars: { id: number; label: string; status: JarRowDto['status'] }[],
  reason: string,
): Promise<string[]> {
  if (jars.length === 0) return [];
  const at = new Date();
  const onDate = localDate(at);
  await jarsRepository.setStatus(
    m,
    jars.map((j) => j.id),
    'on-hold',
  );
  await jarsRepository.insertEvents(
    m,
    jars.map((j) => ({
      jarId: j.id,
      type: 'hold' as const,
      at,
      onDate,
      byUserId: actor.id,
      byName: actor.displayName,
      newStatus: 'on-hold',
      note: reason,
    })),
  );
  await recordAudit(
    m,
    actor,
    jars.map((j) => ({
      action: 'lineage-hold',
      recordType: 'jar',
      recordId: j.id,
      field: 'status',
      oldValue: j.status,
      newValue: 'on-hold',
      reason,
    })),
  );
  // A jar's status decides whether its colonisation time is counted (a colonised jar without a day is not).
  await recountJars(
    m,
    jars.map((j) => j.id),
  );
  return jars.map((j) => j.label);
}
