import { IsNull } from 'typeorm';
import type { Actor } from '../audit/audit.service';
import { recordAudit } from '../audit/audit.service';
import { notFound } from '../core/errors';
import { dataSource } from '../db/data-source';
import { ClusterAlert } from './cluster-alert.entity';

/** Alerts nobody has marked looked at yet, newest first. */
export const unseenClusterAlerts = (limit: number) =>
  dataSource.manager.findAndCount(ClusterAlert, {
    where: { seenAt: IsNull() },
    order: { alertedAt: 'DESC', id: 'DESC' },
    take: limit,
  });

export async function markClusterAlertSeen(actor: Actor, id: number): Promise<void> {
  await dataSource.transaction(async (m) => {
    const alert = await m.findOne(ClusterAlert, { where: { id }, lock: { mode: 'pessimistic_write' } });
    if (!alert) throw notFound('Cluster alert');
    if (alert.seenAt) return;
    await m.update(ClusterAlert, { id }, { seenAt: new Date(), seenByName: actor.displayName });
    await recordAudit(m, actor, [
      { action: 'seen', recordType: 'cluster-alert', recordId: id, field: 'seenAt', oldValue: null, newValue: 'seen' },
    ]);
  });
}
