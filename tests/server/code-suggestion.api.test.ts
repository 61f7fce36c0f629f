import { randomBytes } from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from '../setup/test-app';
import { anonymousStatuses, sendAs, signedIn, type Client } from '../setup/factories';
import { bodyOf, errorOf } from '../setup/bodies';
import { suggestedCodeSchema } from '../../shared/schemas/common';

const app = createTestApp();
// A prefix of its own, so the highest number under it is the one this file stores.
const prefix = () => `T${randomBytes(3).toString('hex')}-`;

const cookRun = (code: string) => ({
  code,
  cookedOn: '2026-03-02',
  minutesAtPressure: 90,
  altitudeM: 0,
  container: '1 L jar',
});
const session = (code: string) => ({ code, heldOn: '2026-03-02', operatorName: 'Test Staff', workspace: 'flow-hood' });

let tech: Client;
beforeAll(async () => {
  tech = await signedIn(app, 'technician');
});

describe.each([
  ['cook-runs', cookRun],
  ['sessions', session],
] as const)('GET /api/%s/next-code', (register, body) => {
  const url = `/api/${register}/next-code`;

  it('answers 401 without a session and 403 to a trainer, who makes no records', async () => {
    expect(await anonymousStatuses(app, [url])).toEqual([401]);
    const trainer = await signedIn(app, 'trainer');
    expect((await trainer.agent.get(url)).status).toBe(403);
  });

  it('counts on from the latest code, keeping its prefix and width', async () => {
    const p = prefix();
    expect((await sendAs(tech, 'post', `/api/${register}`, body(`${p}0041`))).status).toBe(201);
    const res = await tech.agent.get(url);
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ code: `${p}0042` });
  });

  it('steps past a higher number stored earlier under the same pattern', async () => {
    const p = prefix();
    for (const code of [`${p}0950`, `${p}0007`]) {
      expect((await sendAs(tech, 'post', `/api/${register}`, body(code))).status).toBe(201);
    }
    expect((await tech.agent.get(url)).body).toEqual({ code: `${p}0951` });
  });

  it('answers 409 naming code when the suggested code is taken before it is used', async () => {
    const p = prefix();
    await sendAs(tech, 'post', `/api/${register}`, body(`${p}10`));
    const { code } = bodyOf(await tech.agent.get(url), suggestedCodeSchema);
    expect(code).toBe(`${p}11`);
    expect((await sendAs(tech, 'post', `/api/${register}`, body(code))).status).toBe(201);
    const again = await sendAs(tech, 'post', `/api/${register}`, body(code.toLowerCase()));
    expect(again.status).toBe(409);
    expect(errorOf(again).issues).toEqual([{ path: 'code', message: expect.any(String) as string }]);
    expect((await tech.agent.get(url)).body).toEqual({ code: `${p}12` });
  });
});
