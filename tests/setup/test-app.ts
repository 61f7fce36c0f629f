import type { Express } from 'express';
import supertest from 'supertest';
import { afterAll } from 'vitest';
import { createApp, type AppDeps } from '../../server/app';
import { createSessionStore } from '../../server/auth/session';
import { csrfSchema } from '../../shared/schemas/auth';
import { bodyOf } from './bodies';

/** The real app over the worker's MariaDB; the session store is closed when the file ends. */
export function createTestApp(deps: Omit<AppDeps, 'sessionStore'> = {}): Express {
  const store = createSessionStore();
  afterAll(() => store.close());
  return createApp({ sessionStore: store, ...deps });
}

export type Agent = ReturnType<typeof supertest.agent>;

/** A cookie-keeping client that carries a fresh CSRF token on every state-changing call. */
export async function csrfAgent(
  app: Express,
): Promise<{ agent: Agent; token: () => string; refresh: () => Promise<void> }> {
  const agent = supertest.agent(app);
  let token = '';
  const refresh = async () => {
    const res = await agent.get('/api/auth/csrf').expect(200);
    token = bodyOf(res, csrfSchema).token;
  };
  await refresh();
  return { agent, token: () => token, refresh };
}
