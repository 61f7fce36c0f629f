import { randomBytes } from 'node:crypto';
import type { Express } from 'express';
import supertest from 'supertest';
import type { Role } from '../../shared/enums';
import { createUser } from '../../server/users/users.service';
import { csrfAgent } from './test-app';

export const testPassword = 'correct-horse-battery';

export const uniqueName = (prefix: string) => `${prefix}-${randomBytes(4).toString('hex')}`;

export async function makeUser(role: Role, overrides: { username?: string; password?: string } = {}) {
  const username = overrides.username ?? uniqueName(role.slice(0, 4));
  const user = await createUser(
    { id: null, displayName: 'test factory' },
    {
      username,
      displayName: `Test ${role}`,
      email: `${username}@example.invalid`,
      role,
      password: overrides.password ?? testPassword,
    },
  );
  return user;
}

/** A signed-in client for a new user of the given role. */
export async function signedIn(app: Express, role: Role) {
  const user = await makeUser(role);
  const client = await csrfAgent(app);
  await client.agent
    .post('/api/auth/login')
    .set('X-CSRF-Token', client.token())
    .send({ username: user.username, password: testPassword })
    .expect(200);
  await client.refresh();
  return { ...client, user };
}

export type Client = Awaited<ReturnType<typeof signedIn>>;

type Write = 'post' | 'patch' | 'put' | 'delete';

/** A write as the client, carrying its CSRF token. */
export const sendAs = (client: Client, method: Write, url: string, body?: string | object) =>
  client.agent[method](url).set('X-CSRF-Token', client.token()).send(body);

/** A CSV body posted as text/csv, as the import and log upload routes take it. */
export const postCsvAs = (client: Client, url: string, csv: string) =>
  client.agent.post(url).set('X-CSRF-Token', client.token()).set('Content-Type', 'text/csv').send(csv);

/** The status of each GET without a session; every read route answers 401. */
export const anonymousStatuses = (app: Express, urls: string[]) =>
  Promise.all(urls.map(async (url) => (await supertest(app).get(url)).status));
