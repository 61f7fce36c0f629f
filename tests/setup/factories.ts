import { randomBytes } from 'node:crypto';
import type { Express } from 'express';
import type { Role } from '../../shared/enums';
import { createUser } from '../../server/users/users.service';
import { csrfAgent } from './test-app';

export const testPassword = 'correct-horse-battery';

export const uniqueName = (prefix: string) => `${prefix}-${randomBytes(4).toString('hex')}`;

export async function makeUser(role: Role, overrides: { username?: string; password?: string } = {}) {
  const username = overrides.username ?? uniqueName(role.slice(0, 4));
  const user = await createUser({ id: null, displayName: 'test factory' }, {
    username,
    displayName: `Test ${role}`,
    email: `${username}@example.invalid`,
    role,
    password: overrides.password ?? testPassword,
  });
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
