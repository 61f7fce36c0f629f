import { expect } from 'vitest';
import { pageOf } from '../../shared/schemas/common';
import { procedureDetailSchema, procedureSchema, procedureVersionSchema } from '../../shared/schemas/procedures';
import { bodyOf } from '../setup/bodies';
import { uniqueName, type signedIn } from '../setup/factories';

export type Client = Awaited<ReturnType<typeof signedIn>>;

/** Three steps of sterile technique, the first with its caution. */
export const steps = [
  { text: 'Wipe the workspace with 70 % isopropyl alcohol and let it dry.', caution: 'Alcohol is flammable.' },
  { text: 'Flame the needle until it glows, then let it cool.' },
  { text: 'Inoculate through the port.' },
];
export const procedurePageSchema = pageOf(procedureSchema);

export const newProcedure = () => ({ code: uniqueName('P'), title: 'Sterile technique', steps });

export async function create(client: Client, body: object = newProcedure()) {
  const res = await client.agent.post('/api/procedures').set('X-CSRF-Token', client.token()).send(body);
  expect(res.status).toBe(201);
  const procedure = bodyOf(res, procedureDetailSchema);
  // A new procedure is published as its version 1 at once, so it always has a current version.
  return { ...procedure, currentVersionId: procedure.currentVersionId! };
}

export async function stepsOf(client: Client, versionId: number) {
  const res = await client.agent.get(`/api/procedure-versions/${versionId}`).expect(200);
  return bodyOf(res, procedureVersionSchema).steps;
}
