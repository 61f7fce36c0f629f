import type { Actor } from '../audit/audit.service';
import { createProcedure, findProcedureByCode, publishVersion } from '../procedures/procedures.service';
import { createTrainingRecord } from '../training/training.service';
import { findUserByUsername } from '../users/users.service';
import type { ProcedureStepInput } from '../../shared/schemas/procedures';

export const demoProcedureCode = 'STERILE-INOC';

const flameCaution =
  '70 % isopropyl alcohol is flammable: let every wipe-down dry before any flame, and keep the bottle closed and away from the burner.';

// Written for the demo lab; version 2 splits the between-jars flaming into its own step.
const version1: ProcedureStepInput[] = [
  {
    text: 'Clear the workspace of everything this session does not need, then wipe the surface with 70 % isopropyl alcohol.',
    caution: flameCaution,
  },
  {
    text: 'Start the flow hood at least 15 minutes before work, or close up the still-air box and keep movements slow inside it.',
    caution: null,
  },
  {
    text: 'Put on clean gloves and a mask; wipe gloves and forearms with 70 % isopropyl alcohol and let them dry.',
    caution: flameCaution,
  },
  {
    text: 'Wipe every jar lid and injection port with 70 % isopropyl alcohol and let it dry before going on.',
    caution: flameCaution,
  },
  { text: 'Check that the culture is released and that its code matches the session plan.', caution: null },
  {
    text: 'Flame the needle until it glows along its length, then let it cool for a few seconds before it touches a port.',
    caution: 'Keep the flame clear of wet alcohol, gloves and the bottle.',
  },
  { text: 'Inoculate through the port with the planned volume, without lifting the lid.', caution: null },
  { text: 'Relabel each jar with its label, culture code and date as it leaves the workspace.', caution: null },
  { text: 'Log the session: operator, workspace, culture, jars and anything unusual.', caution: null },
  {
    text: 'Wipe the workspace down again and put sharps and waste where local rules say.',
    caution: 'Contaminated material is sterilised sealed before disposal.',
  },
];

const version2: ProcedureStepInput[] = [
  ...version1.slice(0, 7),
  {
    text: 'Between jars, flame the needle again and let it cool; never carry a needle from one port to the next unflamed.',
    caution: 'Keep the flame clear of wet alcohol, gloves and the bottle.',
  },
  ...version1.slice(7),
];

/** The sterile-technique procedure with two versions and two training records; skipped when present. */
export async function loadDemoProcedures(log: (line: string) => void = console.log): Promise<void> {
  if (await findProcedureByCode(demoProcedureCode)) return;
  const [trainer, technician, supervisor] = await Promise.all(
    ['trainer', 'technician', 'supervisor'].map((u) => findUserByUsername(u)),
  );
  const actor: Actor = trainer
    ? { id: trainer.id, displayName: trainer.displayName }
    : { id: null, displayName: 'demo loader' };
  const created = await createProcedure(actor, {
    code: demoProcedureCode,
    title: 'Sterile technique for grain inoculation',
    changeNote: 'First issue.',
    steps: version1,
  });
  const v1 = created.versions[0];
  const v2 = await publishVersion(actor, created.id, {
    changeNote: 'Flaming between jars is now a step of its own, after port contaminations in one session.',
    steps: version2,
  });
  if (technician && v1)
    await createTrainingRecord(actor, {
      userId: technician.id,
      procedureVersionId: v1.id,
      trainedOn: '2026-01-12',
      notes: 'Demo record.',
    });
  if (supervisor)
    await createTrainingRecord(actor, {
      userId: supervisor.id,
      procedureVersionId: v2.id,
      trainedOn: '2026-02-02',
      notes: 'Demo record.',
    });
  log(`Demo lab: procedure ${demoProcedureCode} with versions 1 and 2`);
}
