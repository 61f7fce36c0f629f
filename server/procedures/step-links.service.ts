import type { StepLinkDto, StepLinkInput } from '../../shared/schemas/procedures';
import { recordAudit, type Actor } from '../audit/audit.service';
import { conflict, notFound } from '../core/errors';
import { dataSource } from '../db/data-source';
import { findIncident } from '../incidents/incidents.service';
import { stepLinksRepository } from './step-links.repository';

async function requireIncident(id: number) {
  const incident = await findIncident(id);
  if (!incident) throw notFound('Incident');
  return incident;
}

export async function listStepLinks(incidentId: number): Promise<StepLinkDto[]> {
  await requireIncident(incidentId);
  return stepLinksRepository.listForIncident(incidentId);
}

/** The incidents linked to one step, oldest link first. */
export async function listLinksOfStep(stepId: number): Promise<StepLinkDto[]> {
  if (!(await stepLinksRepository.stepWithVersion(stepId))) throw notFound('Procedure step');
  return stepLinksRepository.listForStep(stepId);
}

export async function linkStep(actor: Actor, incidentId: number, input: StepLinkInput): Promise<StepLinkDto> {
  const incident = await requireIncident(incidentId);
  if (incident.voided) throw conflict('This incident is voided; it cannot be linked to a step.');
  const step = await stepLinksRepository.stepWithVersion(input.stepId);
  if (!step) throw notFound('Procedure step');
  if (await stepLinksRepository.exists(incidentId, input.stepId)) {
    throw conflict('This incident is already linked to that step.', [
      { path: 'stepId', message: 'is already linked to this incident' },
    ]);
  }
  const id = await dataSource.transaction(async (m) => {
    const link = await stepLinksRepository.insert(m, {
      incidentId,
      stepId: input.stepId,
      linkedById: actor.id,
      linkedByName: actor.displayName,
      note: input.note,
    });
    // Filed under the incident, so the incident's own history shows who blamed which step.
    await recordAudit(m, actor, [
      {
        action: 'link-step',
        recordType: 'incident',
        recordId: incidentId,
        field: 'procedureStep',
        newValue: {
          linkId: link.id,
          stepId: step.id,
          procedure: step.procedureTitle,
          version: step.version,
          position: step.position,
        },
        reason: input.note,
      },
    ]);
    return link.id;
  });
  const dto = await stepLinksRepository.findDto(id);
  if (!dto) throw notFound('Step link');
  return dto;
}

export async function unlinkStep(actor: Actor, linkId: number): Promise<void> {
  await dataSource.transaction(async (m) => {
    const link = await stepLinksRepository.findById(m, linkId);
    if (!link) throw notFound('Step link');
    const step = await stepLinksRepository.stepWithVersion(link.stepId, m);
    await stepLinksRepository.delete(m, linkId);
    await recordAudit(m, actor, [
      {
        action: 'unlink-step',
        recordType: 'incident',
        recordId: link.incidentId,
        field: 'procedureStep',
        oldValue: {
          linkId,
          stepId: link.stepId,
          procedure: step?.procedureTitle,
          version: step?.version,
          position: step?.position,
          note: link.note,
        },
      },
    ]);
  });
}
