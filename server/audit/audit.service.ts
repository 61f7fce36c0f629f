import type { EntityManager } from 'typeorm';
import { AuditEvent } from './audit-event.entity';

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
  const rows = entries.map((e) =>
    manager.create(AuditEvent, {
      userId: actor.id,
      userName: actor.displayName,
      action: e.action,
      recordType: e.recordType,
      recordId: String(e.recordId),
      field: e.field ?? null,
      oldValue: text(e.oldValue),
      newValue: text(e.newValue),
      reason: e.reason ?? null,
    }),
  );
  await manager.insert(AuditEvent, rows);
}

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
