import type { EntityManager } from 'typeorm';
import { AuditEvent } from './audit-event.entity';

export const auditRepository = {
  insertMany: (m: EntityManager, rows: Partial<AuditEvent>[]) =>
    m.insert(
      AuditEvent,
      rows.map((r) => m.create(AuditEvent, r)),
    ),
};
