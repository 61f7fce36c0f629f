import type { CookRunDetailDto, CookRunReadingsDto } from '../../shared/schemas/cook-runs';
import { f0FromLog, lethalRate, type TemperatureSample } from '../../shared/stats/lethality';
import { recordAudit, type Actor } from '../audit/audit.service';
import { notFound } from '../core/errors';
import { dataSource } from '../db/data-source';
import { estimatedF0 } from './cook-run-lethality';
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
    await cookRunsRepository.replaceReadings(m, id, samples);
    const f0 = f0FromLog(samples);
    await recordAudit(m, actor, [
      {
        action: 'readings',
        recordType: 'cook-run',
        recordId: id,
        field: 'f0',
        oldValue: run.f0,
        newValue: f0,
        reason: `temperature log of ${samples.length} readings`,
      },
      ...(run.logPlacement === placement
        ? []
        : [
            {
              action: 'readings',
              recordType: 'cook-run',
              recordId: id,
              field: 'logPlacement',
              oldValue: run.logPlacement,
              newValue: placement,
            },
          ]),
      ...(run.f0Source === 'log'
        ? []
        : [
            {
              action: 'readings',
              recordType: 'cook-run',
              recordId: id,
              field: 'f0Source',
              oldValue: run.f0Source,
              newValue: 'log',
            },
          ]),
    ]);
    await cookRunsRepository.setF0(m, id, { f0, f0Source: 'log', logPlacement: placement });
  });
  return getCookRun(id);
}

export async function removeCookRunReadings(actor: Actor, id: number): Promise<CookRunDetailDto> {
  await dataSource.transaction(async (m) => {
    const run = await cookRunsRepository.findById(id, m);
    if (!run) throw notFound('Cook run');
    if (run.f0Source !== 'log') throw notFound('Temperature log of this cook run');
    await cookRunsRepository.replaceReadings(m, id, []);
    const f0 = estimatedF0(run);
    await recordAudit(m, actor, [
      {
        action: 'readings',
        recordType: 'cook-run',
        recordId: id,
        field: 'f0',
        oldValue: run.f0,
        newValue: f0,
        reason: 'temperature log removed',
      },
      {
        action: 'readings',
        recordType: 'cook-run',
        recordId: id,
        field: 'f0Source',
        oldValue: 'log',
        newValue: 'estimate',
      },
    ]);
    await cookRunsRepository.setF0(m, id, { f0, f0Source: 'estimate', logPlacement: null });
  });
  return getCookRun(id);
}
