import type { IncidentDetailDto } from '../../shared/schemas/incident-detail';
import type { ReviewIncidentInput, VoidIncidentInput } from '../../shared/schemas/incidents';
import { patchWithAudit, recordAudit } from '../audit/audit.service';
import type { SessionUser } from '../core/auth-guards';
import { unprocessable } from '../core/errors';
import { dataSource } from '../db/data-source';
import type { Incident } from './incident.entity';
import { checkTransition, loadForChange } from './incident-rules';
import { incidentsRepository } from './incidents.repository';
import { getIncident } from './incidents.service';
import { syncJarStatuses } from './jar-contamination';

function checkClosed(incident: Incident, input: ReviewIncidentInput): void {
  if (incident.status !== 'closed') return;
  const others = [input.verdict, input.causeCategory, input.rootCauseNotes].some((v) => v !== undefined);
  if (input.status !== 'in-review' || others) {
    throw unprocessable(`status: incident ${incident.id} is closed; reopen it (status in-review) before changing it.`, [
      { path: 'status', message: 'reopen a closed incident (in-review) before other changes' },
    ]);
  }
  if (!input.reason) {
    throw unprocessable('reason: say why the closed incident is reopened.', [
      { path: 'reason', message: 'give a reason for reopening' },
    ]);
  }
}

/** Supervisor review: status, verdict, six-M cause category and notes, each change audited with the reason. */
export async function reviewIncident(
  user: SessionUser,
  id: number,
  input: ReviewIncidentInput,
): Promise<IncidentDetailDto> {
  await dataSource.transaction(async (m) => {
    const incident = await loadForChange(m, id, input.version);
    checkClosed(incident, input);
    if (input.status) checkTransition(incident.status, input.status);
    const next = { status: input.status ?? incident.status, verdict: input.verdict ?? incident.verdict };
    if (next.status === 'closed' && next.verdict === 'pending') {
      throw unprocessable('verdict: confirm or rule out the incident before closing it.', [
        { path: 'verdict', message: 'must be confirmed or ruled-out to close' },
      ]);
    }
    const changes = {
      status: input.status,
      verdict: input.verdict,
      causeCategory: input.causeCategory,
      rootCauseNotes: input.rootCauseNotes === '' ? null : input.rootCauseNotes,
    };
    const wasRuledOut = incident.verdict === 'ruled-out';
    const entries = await patchWithAudit(m, user, incident, changes, incidentsRepository.save, {
      action: 'review',
      recordType: 'incident',
      recordId: id,
      reason: input.reason ?? null,
    });
    if (entries.length === 0) return;
    if (wasRuledOut !== (incident.verdict === 'ruled-out')) {
      await syncJarStatuses(
        m,
        user,
        await incidentsRepository.jarIdsOf(m, id),
        `incident ${id} verdict ${incident.verdict}`,
      );
    }
  });
  return getIncident(id);
}

/** Incidents are never deleted; a void keeps the record and its history, and frees its jars. */
export async function voidIncident(
  user: SessionUser,
  id: number,
  input: VoidIncidentInput,
): Promise<IncidentDetailDto> {
  await dataSource.transaction(async (m) => {
    const incident = await loadForChange(m, id, input.version);
    incident.voided = true;
    incident.voidReason = input.reason;
    await incidentsRepository.save(m, incident);
    await recordAudit(m, user, [
      {
        action: 'void',
        recordType: 'incident',
        recordId: id,
        field: 'voided',
        oldValue: false,
        newValue: true,
        reason: input.reason,
      },
    ]);
    await syncJarStatuses(m, user, await incidentsRepository.jarIdsOf(m, id), `incident ${id} voided`);
  });
  return getIncident(id);
}
