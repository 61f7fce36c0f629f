import type { Role } from '../../shared/enums';
import type { OperatorsDto, OperatorsQuery } from '../../shared/schemas/training';
import { notFound } from '../core/errors';
import { currentVersionOf, getProcedure } from '../procedures/procedures.service';
import { operatorsRepository, type OperatorTraining } from './operators.repository';

/** Each operator with their sessions, jars and incidents, and whether they hold the current version. */
export async function listOperators(q: OperatorsQuery): Promise<OperatorsDto> {
  const procedureId = q.procedureId ?? (await operatorsRepository.firstProcedureId());
  let procedure: OperatorsDto['procedure'] = null;
  if (procedureId !== undefined) {
    const p = await getProcedure(procedureId).catch(() => {
      throw notFound('Procedure');
    });
    const current = await currentVersionOf(procedureId);
    procedure = {
      id: p.id,
      code: p.code,
      title: p.title,
      currentVersionId: current?.id ?? null,
      currentVersion: current?.version ?? null,
    };
  }
  const [people, counts, training, requests] = await Promise.all([
    operatorsRepository.people(),
    operatorsRepository.counts(),
    procedure
      ? operatorsRepository.training(procedure.id, procedure.currentVersionId)
      : new Map<string, OperatorTraining>(),
    procedure ? operatorsRepository.openRequests(procedure.id) : new Map<string, number>(),
  ]);
  return {
    procedure,
    operators: people.map((p) => {
      const c = counts.get(p.key);
      const t = training.get(p.key);
      return {
        userId: p.userId,
        staffId: p.staffId,
        displayName: p.displayName,
        role: p.role as Role | null,
        sessions: c?.sessions ?? 0,
        jars: c?.jars ?? 0,
        contaminatedJars: c?.contaminatedJars ?? 0,
        incidents: c?.incidents ?? 0,
        trainedVersion: t?.trainedVersion ?? null,
        lastTrainedOn: t?.lastTrainedOn ?? null,
        trainedOnCurrent: t?.trainedOnCurrent ?? false,
        openRetrainRequests: requests.get(p.key) ?? 0,
      };
    }),
  };
}
