import type { Actor } from '../audit/audit.service';
import { recordAudit } from '../audit/audit.service';
import { notFound } from '../core/errors';
import { dataSource } from '../db/data-source';
import { clusterAlertsRepository } from './cluster-alerts.repository';

/** Alerts nobody has marked looked at yet, newest first. */
export const unseenClusterAlerts = (limit: number) => clusterAlertsRepository.unseen(limit);

export async function markClusterAlertSeen(actor: Actor, id: number): Promise<void> {
  await dataSource.transaction(async (m) => {
    const alert = await clusterAlertsRepository.lockById(m, id);
    if (!alert) throw notFound('Cluster alert');
    if (alert.seenAt) return;
    await clusterAlertsRepository.markSeen(m, id, new Date(), actor.displayName);
    await recordAudit(m, actor, [
      { action: 'seen', recordType: 'cluster-alert', recordId: id, field: 'seenAt', oldValue: null, newValue: 'seen' },
    ]);
  });
}
