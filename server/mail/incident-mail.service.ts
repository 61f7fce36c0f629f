import { mailAudience } from '../../shared/schemas/mail';
import { config } from '../core/config';
import { logger } from '../core/logger';
import { getLabSettings } from '../settings/settings.service';
import { incidentMailRepository, type IncidentJarRow } from './incident-mail.repository';
import { addDays } from '../core/calendar';
import { mailRepository } from './mail.repository';
import { clusterAlertMail, newIncidentMail } from './mail-templates';
import { deliver, type DeliveryResult } from './mailer';
import { withNamedLock } from './named-lock';
import { isLiveIncident } from '../incidents/live-incidents';
import { clusterFactors, type ClusterFactor } from '../../shared/enums';

const audienceRoles = (kind: 'new-incident' | 'cluster-alert') => {
  const a = mailAudience[kind];
  return a === 'addressee' ? [] : a;
};

const levelOf: Record<ClusterFactor, (j: IncidentJarRow) => { id: number | null; code: string | null }> = {
  cookRun: (j) => ({ id: j.cookRunId, code: j.cookRun }),
  culture: (j) => ({ id: j.cultureId, code: j.culture }),
  session: (j) => ({ id: j.sessionId, code: j.session }),
};

const listParam: Record<ClusterFactor, string> = {
  cookRun: 'cookRunId',
  culture: 'cultureId',
  session: 'sessionId',
};

export interface IncidentMailOutcome {
  newIncident: DeliveryResult;
  clusters: { dimension: ClusterFactor; code: string; delivery: DeliveryResult }[];
}

/**
 * After an incident has committed: tell the supervisors, then alert any cluster it completes.
 * Imported history and voided incidents send nothing.
 */
export async function notifyIncidentCreated(incidentId: number): Promise<IncidentMailOutcome> {
  const outcome: IncidentMailOutcome = { newIncident: { sent: 0, failed: 0 }, clusters: [] };
  const incident = await incidentMailRepository.findIncident(incidentId);
  if (!incident || incident.imported || !isLiveIncident(incident)) return outcome;
  const jars = await incidentMailRepository.jarsOf(incidentId);
  const base = config().publicUrl;

  const content = newIncidentMail({
    id: incident.id,
    foundOn: incident.foundOn,
    foundByName: incident.foundByName,
    stage: incident.stage,
    contaminant: incident.contaminant,
    severity: incident.severity,
    sealed: incident.sealed,
    sterilisedBeforeDisposal: incident.sterilisedBeforeDisposal,
    jars,
    url: `${base}/incidents/${incident.id}`,
  });
  outcome.newIncident = await deliver(
    'new-incident',
    await mailRepository.recipients('new-incident', audienceRoles('new-incident')),
    content,
  );

  const settings = await getLabSettings();
  const windowStart = addDays(incident.foundOn, -(settings.clusterDays - 1));
  for (const dimension of clusterFactors) {
    const levels = new Map<number, string>();
    for (const j of jars) {
      const { id, code } = levelOf[dimension](j);
      if (id !== null) levels.set(id, code ?? String(id));
    }
    for (const [levelId, code] of levels) {
      const alert = await withNamedLock(`asepta-cluster-${dimension}-${levelId}`, 10, async (m) => {
        const found = await incidentMailRepository.clusterIncidents(
          m,
          dimension,
          levelId,
          windowStart,
          incident.foundOn,
        );
        if (found.length < settings.clusterIncidents) return undefined;
        const firstFoundOn = found[0]?.foundOn ?? incident.foundOn;
        const existing = await incidentMailRepository.openAlert(m, dimension, levelId, windowStart);
        if (existing) {
          // The same cluster growing: keep its span current, mail once only.
          existing.lastFoundOn = existing.lastFoundOn > incident.foundOn ? existing.lastFoundOn : incident.foundOn;
          existing.incidentCount = Math.max(existing.incidentCount, found.length);
          await incidentMailRepository.saveAlert(m, existing);
          return undefined;
        }
        await incidentMailRepository.insertAlert(m, {
          dimension,
          levelId,
          levelCode: code.slice(0, 40),
          firstFoundOn,
          lastFoundOn: incident.foundOn,
          incidentCount: found.length,
          triggeredByIncidentId: incident.id,
        });
        return { found, firstFoundOn };
      });
      if (!alert) continue;
      const mail = clusterAlertMail({
        dimension,
        code,
        incidents: alert.found,
        threshold: settings.clusterIncidents,
        days: settings.clusterDays,
        firstFoundOn: alert.firstFoundOn,
        lastFoundOn: incident.foundOn,
        url: `${base}/incidents?${listParam[dimension]}=${levelId}`,
      });
      const delivery = await deliver(
        'cluster-alert',
        await mailRepository.recipients('cluster-alert', audienceRoles('cluster-alert')),
        mail,
      );
      outcome.clusters.push({ dimension, code, delivery });
    }
  }
  return outcome;
}

/** The hook's entry: never lets a mail problem reach the request that filed the incident. */
export function onIncidentFiled(incidentId: number): Promise<void> {
  return notifyIncidentCreated(incidentId).then(
    () => undefined,
    (err: unknown) => logger.error({ err, incidentId }, 'incident mails failed'),
  );
}
