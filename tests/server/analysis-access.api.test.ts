import supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from '../setup/test-app';
import { signedIn } from '../setup/factories';
import { all, plantHistory } from './analysis.fixtures';
import { errorOf } from '../setup/bodies';

const app = createTestApp();
let reader: Awaited<ReturnType<typeof signedIn>>;
let imported: unknown;

beforeAll(async () => {
  ({ reader, imported } = await plantHistory(app));
});

describe('GET /api/analysis/* — access and input', () => {
  it('reads the planted history through the import route', () => {
    expect(imported).toEqual({ jars: all.length, incidents: all.filter((j) => j.contaminant).length });
  });

  it('answers 401 without a session', async () => {
    for (const path of [
      'rates?by=grain',
      'crosstab?rows=grain&cols=cookRun',
      'causes',
      'weekly',
      'colonisation',
      'lethality',
    ]) {
      expect((await supertest(app).get(`/api/analysis/${path}`)).status).toBe(401);
    }
  });

  it.each(['technician', 'supervisor', 'trainer', 'admin'] as const)('lets a %s read the rates', async (role) => {
    const client = await signedIn(app, role);
    expect((await client.agent.get('/api/analysis/rates?by=grain')).status).toBe(200);
  });

  it.each([
    ['/api/analysis/rates?by=colour', 'by'],
    ['/api/analysis/rates', 'by'],
    ['/api/analysis/rates?by=grain&from=2025-13-01', 'from'],
    ['/api/analysis/rates?by=grain&to=yesterday', 'to'],
    ['/api/analysis/rates?by=grain&from=2025-05-01&to=2025-04-01', 'to'],
    ['/api/analysis/crosstab?rows=grain&cols=shelf', 'cols'],
    ['/api/analysis/crosstab?rows=lot&cols=grain', 'rows'],
    ['/api/analysis/crosstab?rows=grain&cols=grain', 'cols'],
    ['/api/analysis/causes?minJars=0', 'minJars'],
    ['/api/analysis/weekly?from=03/03/2025', 'from'],
  ])('answers 400 naming the field for %s', async (url, field) => {
    const res = await reader.agent.get(url);
    expect(res.status).toBe(400);
    expect(errorOf(res).code).toBe('invalid-input');
    expect(errorOf(res).issues!.map((i: { path: string }) => i.path)).toContain(field);
  });
});
