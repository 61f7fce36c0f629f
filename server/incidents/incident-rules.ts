import type { EntityManager } from 'typeorm';
import type { IncidentStatus } from '../../shared/enums';
import type { SessionUser } from '../core/auth-guards';
import { AppError, conflict, notFound, unprocessable } from '../core/errors';
import type { JarRecord } from '../jars/jar-status.service';
import type { Incident } from './incident.entity';
import { incidentsRepository } from './incidents.repository';

/** Locks the row, so checks and the write see the same state; voided incidents are read-only. */
export async function loadForChange(m: EntityManager, id: number, version?: number): Promise<Incident> {
  const incident = await incidentsRepository.lockById(m, id);
  if (!incident) throw notFound('Incident');
  if (incident.voided) throw new AppError(409, 'voided', `Incident ${id} is voided and can no longer be changed.`);
  if (version !== undefined && version !== incident.version) {
    throw conflict(`Incident ${id} was changed by someone else since you opened it: reload it and try again.`, [
      { path: 'version', message: `is ${version}, the incident is now at version ${incident.version}` },
    ]);
  }
  return incident;
}

/** DESIGN.md §2: a technician edits their own open incidents; a supervisor edits any. */
export function canEditDescriptive(user: SessionUser, incident: Incident): boolean {
  if (user.role === 'supervisor') return true;
  if (user.role !== 'technician' && user.role !== 'admin') return false;
  const own = incident.foundById === user.id || incident.createdById === user.id;
  return own && incident.status === 'open';
}

const transitions: Record<IncidentStatus, IncidentStatus[]> = {
  open: ['in-review'],
  'in-review': ['open', 'closed'],
  closed: ['in-review'],
};

export function checkTransition(from: IncidentStatus, to: IncidentStatus): void {
  if (from === to || transitions[from].includes(to)) return;
  const allowed = transitions[from].join(' or ');
  throw unprocessable(`status: an incident that is ${from} can move to ${allowed}, not ${to}.`, [
    { path: 'status', message: `can move from ${from} to ${allowed} only` },
  ]);
}

const clockSkewMs = 5 * 60_000;

/** Found in the future, or before a jar was inoculated, is a typing slip worth stopping. */
export function checkFoundAt(foundAt: Date, foundOn: string, jars: Pick<JarRecord, 'label' | 'inoculatedOn'>[]): void {
  if (foundAt.getTime() > Date.now() + clockSkewMs) {
    throw unprocessable('foundAt: cannot be in the future.', [{ path: 'foundAt', message: 'cannot be in the future' }]);
  }
  const early = jars.find((j) => j.inoculatedOn > foundOn);
  if (early) {
    const message = `is before jar ${early.label} was inoculated (${early.inoculatedOn})`;
    throw unprocessable(`foundAt: ${message}.`, [{ path: 'foundAt', message }]);
  }
}
