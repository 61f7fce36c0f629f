import type { CookRunDetailDto, CookRunReadingsDto } from '../../shared/schemas/cook-runs';
import { f0FromLog, lethalRate, type TemperatureSample } from '../../shared/stats/lethality';
import type { EntityManager } from 'typeorm';
import { diffEntries, recordAudit, type Actor } from '../audit/audit.service';
import { notFound } from '../core/errors';
import { dataSource } from '../db/data-source';
import { estimatedF0 } from './cook-run-lethality';
import type { CookRun } from './cook-run.entity';
import { cookRunsRepository } from './cook-runs.repository';
import { getCookRun } from './cook-runs.service';
import type { LogPlacement } from '../../shared/enums';

export async function getCookRunReadings(id: number): Promise<CookRunReadingsDto> {
  const run = await cookRunsRepository.findById(id);
  if (!run) throw notFound('Cook run');
  const rows = await cookRunsRepository.readings(id);
  return {
    cookRunId: id,
    f0: run.f0,
    f0Source: run.f0Source,
    logPlacement: run.logPlacement,
    readings: rows.map((r) => ({ minute: r.minute, celsius: r.celsius, lethalRate: lethalRate(r.celsius) })),
  };
}

export async function assertCookRunExists(id: number): Promise<void> {
  if (!(await cookRunsRepository.findById(id))) throw notFound('Cook run');
}

/**
 * Writes the log (empty to remove it) and the F0 it gives, inside the caller's transaction. The F0 is
 * audited with every change of the log; its source and the probe's placement only when they change.
 */
async function storeLog(
  m: EntityManager,
  actor: Actor,
  run: CookRun,
  samples: TemperatureSample[],
  next: Pick<CookRun, 'f0' | 'f0Source' | 'logPlacement'>,
  reason: string,
): Promise<void> {
  await cookRunsRepository.replaceReadings(m, run.id, samples);
  const base = { action: 'readings', recordType: 'cook-run', recordId: run.id };
  await recordAudit(m, actor, [
    { ...base, field: 'f0', oldValue: run.f0, newValue: next.f0, reason },
    ...diffEntries(base, run, { logPlacement: next.logPlacement ?? undefined, f0Source: next.f0Source }),
  ]);
  await cookRunsRepository.setF0(m, run.id, next);
}

/** Replaces the whole log and its F0 in one transaction; a half-loaded log would give a wrong F0. */
export async function replaceCookRunReadings(
  actor: Actor,
  id: number,
  samples: TemperatureSample[],
  placement: LogPlacement,
): Promise<CookRunDetailDto> {
  await dataSource.transaction(async (m) => {
    const run = await cookRunsRepository.findById(id, m);
    if (!run) throw notFound('Cook run');
    const next = { f0: f0FromLog(samples), f0Source: 'log' as const, logPlacement: placement };
    await storeLog(m, actor, run, samples, next, `temperature log of ${samples.length} readings`);
  });
  return getCookRun(id);
}

export async function removeCookRunReadings(actor: Actor, id: number): Promise<CookRunDetailDto> {
  await dataSource.transaction(async (m) => {
    const run = await cookRunsRepository.findById(id, m);
    if (!run) throw notFound('Cook run');
    if (run.f0Source !== 'log') throw notFound('Temperature log of this cook run');
    const next = { f0: estimatedF0(run), f0Source: 'estimate' as const, logPlacement: null };
    await storeLog(m, actor, run, [], next, 'temperature log removed');
  });
  return getCookRun(id);
}
