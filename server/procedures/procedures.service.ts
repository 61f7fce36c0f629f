import type { EntityManager } from 'typeorm';
import type { Page, PageQuery } from '../../shared/schemas/common';
import type {
  CreateProcedureInput,
  ProcedureDetailDto,
  ProcedureDto,
  ProcedureStepInput,
  ProcedureVersionDto,
  PublishVersionInput,
} from '../../shared/schemas/procedures';
import { recordAudit, type Actor, type AuditEntry } from '../audit/audit.service';
import { conflict, notFound } from '../core/errors';
import { pageResult } from '../core/paging';
import { dataSource } from '../db/data-source';
import type { ProcedureStep } from './procedure-step.entity';
import type { ProcedureVersion } from './procedure-version.entity';
import { proceduresRepository } from './procedures.repository';
import { toProcedureDto, toStepDto, toVersionSummaryDto } from './procedures.mapper';

/** A step of a procedure version, as the sessions module reads it for a checklist. */
export type ProcedureStepRecord = ProcedureStep;

export async function listProcedures(q: PageQuery): Promise<Page<ProcedureDto>> {
  const [rows, total] = await proceduresRepository.list(q);
  const current = await proceduresRepository.currentVersions(rows.map((p) => p.id));
  return pageResult(
    rows.map((p) => toProcedureDto(p, current.get(p.id))),
    total,
    q,
  );
}

export async function getProcedure(id: number): Promise<ProcedureDetailDto> {
  const procedure = await proceduresRepository.findById(id);
  if (!procedure) throw notFound('Procedure');
  const versions = await proceduresRepository.versionsOf(id);
  const current = (await proceduresRepository.currentVersions([id])).get(id);
  return { ...toProcedureDto(procedure, current), versions: versions.map(toVersionSummaryDto) };
}

export async function getProcedureVersion(id: number): Promise<ProcedureVersionDto> {
  const version = await proceduresRepository.findVersion(id);
  if (!version) throw notFound('Procedure version');
  const procedure = await proceduresRepository.findById(version.procedureId);
  if (!procedure) throw notFound('Procedure');
  const [steps, current, publishedByName] = await Promise.all([
    proceduresRepository.stepsOf(id),
    proceduresRepository.currentVersions([procedure.id]),
    proceduresRepository.publisherName(version.publishedById),
  ]);
  return {
    ...toVersionSummaryDto({ ...version, publishedByName, stepCount: steps.length }),
    procedureId: procedure.id,
    procedureCode: procedure.code,
    isCurrent: current.get(procedure.id)?.id === version.id,
    steps: steps.map(toStepDto),
  };
}

/** Steps are always inserted as new rows of the new version: an old version's rows are never touched. */
async function insertVersion(
  m: EntityManager,
  actor: Actor,
  procedureId: number,
  version: number,
  title: string,
  changeNote: string | null,
  steps: ProcedureStepInput[],
): Promise<ProcedureVersion> {
  const saved = await proceduresRepository.insertVersion(m, {
    procedureId,
    version,
    title,
    changeNote,
    publishedById: actor.id,
  });
  await proceduresRepository.insertSteps(
    m,
    steps.map((s, i) => ({ versionId: saved.id, position: i + 1, text: s.text, caution: s.caution })),
  );
  return saved;
}

export async function createProcedure(actor: Actor, input: CreateProcedureInput): Promise<ProcedureDetailDto> {
  if (await proceduresRepository.findByCode(input.code)) {
    throw conflict('A procedure with that code exists.', [
      { path: 'code', message: 'is already used by another procedure' },
    ]);
  }
  const id = await dataSource.transaction(async (m) => {
    const procedure = await proceduresRepository.insert(m, { code: input.code, title: input.title });
    const version = await insertVersion(m, actor, procedure.id, 1, input.title, input.changeNote, input.steps);
    await recordAudit(m, actor, [
      {
        action: 'create',
        recordType: 'procedure',
        recordId: procedure.id,
        newValue: {
          code: procedure.code,
          title: procedure.title,
          versionId: version.id,
          version: 1,
          steps: input.steps.length,
        },
      },
    ]);
    return procedure.id;
  });
  return getProcedure(id);
}

export async function publishVersion(
  actor: Actor,
  procedureId: number,
  input: PublishVersionInput,
): Promise<ProcedureVersionDto> {
  const versionId = await dataSource.transaction(async (m) => {
    // The row lock serialises two trainers publishing at once, so version numbers never collide.
    const procedure = await proceduresRepository.lockById(procedureId, m);
    if (!procedure) throw notFound('Procedure');
    const previous = (await proceduresRepository.currentVersions([procedureId], m)).get(procedureId);
    const number = (previous?.version ?? 0) + 1;
    const title = input.title ?? procedure.title;
    const version = await insertVersion(m, actor, procedureId, number, title, input.changeNote, input.steps);
    const entries: AuditEntry[] = [
      {
        action: 'publish-version',
        recordType: 'procedure',
        recordId: procedureId,
        field: 'version',
        oldValue: previous?.version ?? null,
        newValue: { versionId: version.id, version: number, steps: input.steps.length },
        reason: input.changeNote,
      },
    ];
    if (title !== procedure.title) {
      entries.push({
        action: 'update',
        recordType: 'procedure',
        recordId: procedureId,
        field: 'title',
        oldValue: procedure.title,
        newValue: title,
        reason: input.changeNote,
      });
      await proceduresRepository.setTitle(m, procedureId, title);
    }
    await recordAudit(m, actor, entries);
    return version.id;
  });
  return getProcedureVersion(versionId);
}

/** For other modules (training, seed): the version a person should be trained on now. */
export const findProcedureByCode = (code: string) => proceduresRepository.findByCode(code);

export async function currentVersionOf(procedureId: number): Promise<ProcedureVersion | undefined> {
  return (await proceduresRepository.currentVersions([procedureId])).get(procedureId);
}

export async function findVersion(id: number): Promise<ProcedureVersion | null> {
  return proceduresRepository.findVersion(id);
}
