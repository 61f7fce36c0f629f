import { workspaceLabels, type ChecklistRowDto, type SessionDto } from '../../shared/schemas/sessions';
import type { ProcedureStepRecord } from '../procedures/procedures.service';
import type { InoculationSession } from './inoculation-session.entity';
import type { SessionStepCheck } from './session-step-check.entity';

export const toSessionDto = (s: InoculationSession): SessionDto => ({
  id: s.id,
  code: s.code,
  heldOn: s.heldOn,
  startedAt: s.startedAt ? s.startedAt.toISOString() : null,
  operatorId: s.operatorId,
  operatorName: s.operatorName,
  workspace: s.workspace,
  procedureVersionId: s.procedureVersionId,
  notes: s.notes,
  createdAt: s.createdAt.toISOString(),
});

/** Every step of the version, ticked or not, in the version's order. */
export function toChecklist(steps: ProcedureStepRecord[], checks: SessionStepCheck[]): ChecklistRowDto[] {
  const done = new Map(checks.map((c) => [c.stepId, c.done]));
  return steps.map((s) => ({
    stepId: s.id,
    position: s.position,
    text: s.text,
    caution: s.caution,
    done: done.get(s.id) ?? null,
  }));
}

export const sessionCsv = {
  filename: 'inoculation-sessions.csv',
  header: ['code', 'held_on', 'started_at', 'operator', 'workspace', 'procedure_version_id', 'notes'],
  row: (s: SessionDto): unknown[] => [
    s.code,
    s.heldOn,
    s.startedAt,
    s.operatorName,
    s.workspace ? workspaceLabels[s.workspace] : null,
    s.procedureVersionId,
    s.notes,
  ],
};
