import supertest from 'supertest';
import { describe, expect, it } from 'vitest';
import { createTestApp } from '../setup/test-app';
import { signedIn } from '../setup/factories';
import { newIncident, send, type Client } from './incidents-review.fixtures';
import { csrfSchema } from '../../shared/schemas/auth';
import { correctiveActionSchema } from '../../shared/schemas/corrective-actions';
import { bodyOf } from '../setup/bodies';

const app = createTestApp();

describe('roles on every incident route', () => {
  it('refuses each writing route to the roles that may not use it', async () => {
    const tech = await signedIn(app, 'technician');
    const trainer = await signedIn(app, 'trainer');
    const admin = await signedIn(app, 'admin');
    const { id, version } = await newIncident(tech);
    const sup = await signedIn(app, 'supervisor');
    const action = await send(sup, 'post', `/api/incidents/${id}/actions`, {
      what: 'Re-check the gauge',
      ownerName: 'Shift lead',
      dueOn: '2030-01-01',
    });
    const routes: [string, 'post' | 'patch', string, object][] = [
      [
        'create',
        'post',
        '/api/incidents',
        {
          jarLabels: ['X'],
          contaminant: 'yeast',
          severity: 'low',
          stage: 'incubation',
          sealed: true,
          sterilisedBeforeDisposal: true,
        },
      ],
      ['edit', 'patch', `/api/incidents/${id}`, { version, notes: 'x' }],
      ['review', 'post', `/api/incidents/${id}/review`, { verdict: 'confirmed' }],
      ['void', 'post', `/api/incidents/${id}/void`, { reason: 'entered twice' }],
      ['photos', 'post', `/api/incidents/${id}/photos`, { photoIds: [1] }],
      ['action', 'post', `/api/incidents/${id}/actions`, { what: 'Retrain', ownerName: 'A', dueOn: '2030-01-01' }],
      [
        'action edit',
        'patch',
        `/api/corrective-actions/${bodyOf(action, correctiveActionSchema).id}`,
        { what: 'Retrain twice' },
      ],
    ];
    const forbiddenFor: Record<string, Client[]> = {
      create: [trainer],
      edit: [trainer],
      review: [tech, trainer, admin],
      void: [tech, trainer, admin],
      photos: [trainer],
      action: [tech, trainer, admin],
      'action edit': [tech, trainer, admin],
    };
    const seen: string[] = [];
    const expected: string[] = [];
    for (const [name, method, url, body] of routes) {
      // CSRF is checked before the session, so a stranger's write is refused with 403 (DESIGN.md §5).
      seen.push(`${name} anonymous ${(await supertest(app)[method](url).send(body)).status}`);
      expected.push(`${name} anonymous 403`);
      for (const client of forbiddenFor[name] ?? []) {
        seen.push(`${name} ${client.user.role} ${(await send(client, method, url, body)).status}`);
        expected.push(`${name} ${client.user.role} 403`);
      }
    }
    for (const url of ['/api/incidents', `/api/incidents/${id}`, '/api/incidents/export.csv']) {
      seen.push(`GET ${url} ${(await supertest(app).get(url)).status}`);
      expected.push(`GET ${url} 401`);
    }
    expect(seen).toEqual(expected);
    expect((await trainer.agent.get(`/api/incidents/${id}`)).status).toBe(200);
  });

  it('answers 401 to a valid CSRF token without a session', async () => {
    const agent = supertest.agent(app);
    const { token } = bodyOf(await agent.get('/api/auth/csrf'), csrfSchema);
    expect(
      (await agent.post('/api/incidents/1/review').set('X-CSRF-Token', token).send({ verdict: 'confirmed' })).status,
    ).toBe(401);
  });

  it('lets a technician edit their own open incident only', async () => {
    const tech = await signedIn(app, 'technician');
    const other = await signedIn(app, 'technician');
    const sup = await signedIn(app, 'supervisor');
    const { id, version } = await newIncident(tech);
    const own = await send(tech, 'patch', `/api/incidents/${id}`, {
      version,
      signSmell: 'sour',
      reason: 'smelt it on second look',
    });
    expect(own.status).toBe(200);
    expect(own.body).toMatchObject({ signSmell: 'sour', version: version + 1 });
    expect(
      (await send(other, 'patch', `/api/incidents/${id}`, { version: version + 1, signSmell: 'sweet' })).status,
    ).toBe(403);
    await send(sup, 'post', `/api/incidents/${id}/review`, { status: 'in-review' }).expect(200);
    const late = await send(tech, 'patch', `/api/incidents/${id}`, { version: version + 2, signSmell: 'sweet' });
    expect(late.status).toBe(403);
    expect((await send(sup, 'patch', `/api/incidents/${id}`, { version: version + 2, severity: 'low' })).status).toBe(
      200,
    );
  });
});
