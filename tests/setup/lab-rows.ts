import type { Contaminant, Verdict } from '../../shared/enums';
import { CookRun } from '../../server/cook-runs/cook-run.entity';
import { Culture } from '../../server/cultures/culture.entity';
import { dataSource } from '../../server/db/data-source';
import { Grain } from '../../server/grain/grain.entity';
import { IncidentJar } from '../../server/incidents/incident-jar.entity';
import { Incident } from '../../server/incidents/incident.entity';
import { Jar } from '../../server/jars/jar.entity';
import { InoculationSession } from '../../server/sessions/inoculation-session.entity';
import { SessionStepCheck } from '../../server/sessions/session-step-check.entity';
import { uniqueName } from './factories';

// Production rows written straight through the entities, so the procedures, training and mail
// tests do not depend on how the other modules' write routes evolve.
const m = () => dataSource.manager;

export async function grainId(name = 'rye'): Promise<number> {
  const g = await m().findOneByOrFail(Grain, { name });
  return g.id;
}

export const makeCookRun = (minutes = 90) =>
  m().save(m().create(CookRun, { code: uniqueName('CR'), minutesAtPressure: minutes, altitudeM: 0 }));

export const makeCulture = () => m().save(m().create(Culture, { code: uniqueName('LC'), state: 'released' }));

export async function makeSession(options: {
  heldOn: string;
  operatorId?: number | null;
  versionId?: number | null;
  checks?: Record<number, boolean>;
}) {
  const session = await m().save(
    m().create(InoculationSession, {
      code: uniqueName('S'),
      heldOn: options.heldOn,
      operatorId: options.operatorId ?? null,
      operatorName: options.operatorId ? 'Test operator' : null,
      procedureVersionId: options.versionId ?? null,
      workspace: 'flow-hood',
    }),
  );
  const checks = Object.entries(options.checks ?? {});
  if (checks.length) {
    await m().insert(
      SessionStepCheck,
      checks.map(([stepId, done]) => ({ sessionId: session.id, stepId: Number(stepId), done })),
    );
  }
  return session;
}

export async function makeJars(
  count: number,
  at: { inoculatedOn: string; sessionId?: number; cookRunId?: number; cultureId?: number; grain?: string },
) {
  const gid = await grainId(at.grain);
  const jars: Jar[] = [];
  for (let i = 0; i < count; i += 1) {
    jars.push(
      await m().save(
        m().create(Jar, {
          label: uniqueName('J'),
          grainId: gid,
          sessionId: at.sessionId ?? null,
          cookRunId: at.cookRunId ?? null,
          cultureId: at.cultureId ?? null,
          inoculatedAt: new Date(`${at.inoculatedOn}T10:00:00Z`),
          inoculatedOn: at.inoculatedOn,
        }),
      ),
    );
  }
  return jars;
}

export async function makeIncident(
  jars: Jar[],
  options: { foundOn: string; contaminant?: Contaminant; verdict?: Verdict; voided?: boolean; imported?: boolean },
) {
  const incident = await m().save(
    m().create(Incident, {
      foundAt: new Date(`${options.foundOn}T09:00:00Z`),
      foundOn: options.foundOn,
      foundByName: 'Test finder',
      contaminant: options.contaminant ?? 'trichoderma',
      verdict: options.verdict ?? 'pending',
      voided: options.voided ?? false,
      imported: options.imported ?? false,
    }),
  );
  await m().insert(
    IncidentJar,
    jars.map((j) => ({ incidentId: incident.id, jarId: j.id })),
  );
  return incident;
}
