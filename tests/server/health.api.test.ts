import supertest from 'supertest';
import { describe, expect, it } from 'vitest';
import { dataSource } from '../../server/db/data-source';
import { createTestApp } from '../setup/test-app';

const app = createTestApp();

describe('GET /api/health', () => {
  it('answers ok with the database up', async () => {
    const res = await supertest(app).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ status: 'ok', db: 'up' });
  });

  it('sends secure headers', async () => {
    const res = await supertest(app).get('/api/health');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
  });
});

describe('schema', () => {
  it('matches the entities after the committed migrations (no drift)', async () => {
    const pending = await dataSource.driver.createSchemaBuilder().log();
    expect(pending.upQueries.map((q) => q.query)).toEqual([]);
  });

  it('round-trips a four-byte character (utf8mb4)', async () => {
    const [row] = await dataSource.query<{ v: string }[]>("SELECT '🍄 jar' AS v");
    expect(row!.v).toBe('🍄 jar');
  });
});
