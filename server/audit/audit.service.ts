import type { EntityManager } from 'typeorm';
import type { AuditEvent } from './audit-event.entity';
import { auditRepository } from './audit.repository';

/** A stored audit event, as the modules whose history it tells read it. */
export type AuditEventRecord = AuditEvent;

export interface Actor {
  id: number | null;
  displayName: string;
}

export interface AuditEntry {
  action: string;
  recordType: string;
  recordId: string | number;
  field?: string;
  oldValue?: unknown;
  newValue?: unknown;
  reason?: string | null;
}

function text(value: unknown): string | null {
  if (value === undefined || value === null) return null;
  if (value instanceof Date) return value.toISOString();
  return typeof value === 'string' ? value : JSON.stringify(value);
}

/** Takes the caller's transaction manager: an audit event commits or rolls back with its change. */
export async function recordAudit(manager: EntityManager, actor: Actor, entries: AuditEntry[]): Promise<void> {
  if (entries.length === 0) return;
  await auditRepository.insertMany(
    manager,
    entries.map((e) => ({
      userId: actor.id,
      userName: actor.displayName,
      action: e.action,
      recordType: e.recordType,
      recordId: String(e.recordId),
      field: e.field ?? null,
      oldValue: text(e.oldValue),
      newValue: text(e.newValue),
      reason: e.reason ?? null,
    })),
  );
}

/** One create event per new record (its id and what to remember of it), in the caller's transaction. */
export const recordCreated = (
  manager: EntityManager,
  actor: Actor,
  recordType: string,
  created: { id: number; newValue: unknown }[],
) =>
  recordAudit(
    manager,
    actor,
    created.map((c) => ({ action: 'create', recordType, recordId: c.id, newValue: c.newValue })),
  );

/** One audit entry per field whose value changed. */
export function diffEntries<T extends object>(
  base: Omit<AuditEntry, 'field' | 'oldValue' | 'newValue'>,
  before: T,
  after: Partial<T>,
): AuditEntry[] {
  return (Object.keys(after) as (keyof T & string)[])
    .filter((k) => after[k] !== undefined && text(before[k]) !== text(after[k]))
    .map((k) => ({ ...base, field: k, oldValue: before[k], newValue: after[k] }));
}

/** How the module that owns a record writes it, inside the transaction it is given. */
export type SaveRecord<T> = (manager: EntityManager, record: T) => Promise<unknown>;

/**
 * Applies a patch to a loaded record inside the caller's transaction, saved through the owning module's
 * repository, with one audit event per changed field (and any extra entries). Nothing is written when
 * nothing changed; returns the entries.
 */
export async function patchWithAudit<T extends object>(
  manager: EntityManager,
  actor: Actor,
  record: T,
  changes: Partial<T>,
  save: SaveRecord<T>,
  base: Omit<AuditEntry, 'field' | 'oldValue' | 'newValue'>,
  extra: AuditEntry[] = [],
): Promise<AuditEntry[]> {
  const entries = [...diffEntries(base, record, changes), ...extra];
  if (entries.length === 0) return entries;
  Object.assign(record, Object.fromEntries(Object.entries(changes).filter(([, v]) => v !== undefined)));
  await save(manager, record);
  await recordAudit(manager, actor, entries);
  return entries;
}
