import type { ProcedureDto, ProcedureStepDto, VersionSummaryDto } from '../../shared/schemas/procedures';
import type { ProcedureVersion } from './procedure-version.entity';
import type { Procedure } from './procedure.entity';
import type { StepRow, VersionRow } from './procedures.repository';

export const toProcedureDto = (p: Procedure, current: ProcedureVersion | undefined): ProcedureDto => ({
  id: p.id,
  code: p.code,
  title: p.title,
  currentVersionId: current?.id ?? null,
  currentVersion: current?.version ?? null,
  createdAt: p.createdAt.toISOString(),
});

export const toVersionSummaryDto = (v: VersionRow): VersionSummaryDto => ({
  id: v.id,
  version: v.version,
  title: v.title,
  changeNote: v.changeNote,
  publishedById: v.publishedById,
  publishedByName: v.publishedByName,
  publishedAt: v.publishedAt.toISOString(),
  stepCount: v.stepCount,
});

export const toStepDto = (s: StepRow): ProcedureStepDto => ({
  id: s.id,
  position: s.position,
  text: s.text,
  caution: s.caution,
  incidentsLinked: s.incidentsLinked,
});
