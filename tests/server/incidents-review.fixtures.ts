import { expect } from 'vitest';
import { AuditEvent } from '../../server/audit/audit-event.entity';
import { dataSource } from '../../server/db/data-source';
import { jarIsContaminatedSql } from '../../server/incidents/live-incidents';
import { Jar } from '../../server/jars/jar.entity';
import type { signedIn } from '../setup/factories';
import { incidentOf, makeJar, makeProduction } from './incidents-fixtures';

export type Client = Awaited<ReturnType<typeof signedIn>>;

/** Reports one high-severity bacterial incident on a fresh jar through the API. */
export async function newIncident(tech: Client, status: Jar['status'] = 'incubating') {
  const jar = await makeJar(await makeProduction(), { status });
  const res = await tech.agent
    .post('/api/incidents')
    .set('X-CSRF-Token', tech.token())
    .send({
      jarLabels: [jar.label],
      contaminant: 'bacterial',
      severity: 'high',
      stage: 'incubation',
      sealed: true,
      sterilisedBeforeDisposal: false,
    });
  expect(res.status).toBe(201);
  const { id, version } = incidentOf(res);
  return { id, version, jar };
}

export const send = (c: Client, method: 'post' | 'patch', url: string, body: object) =>
  c.agent[method](url).set('X-CSRF-Token', c.token()).send(body);
export const jarStatus = async (id: number) => (await dataSource.manager.findOneByOrFail(Jar, { id })).status;
export const isContaminated = async (id: number) =>
  Number(
    (
      await dataSource.query<{ c: number | string }[]>(
        `SELECT ${jarIsContaminatedSql('j.id')} AS c FROM jars j WHERE j.id = ?`,
        [id],
      )
    )[0]!.c,
  ) === 1;
export const eventsFor = (recordType: string, recordId: number) =>
  dataSource.manager.find(AuditEvent, { where: { recordType, recordId: String(recordId) }, order: { id: 'ASC' } });
