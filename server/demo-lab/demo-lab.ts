import type { Actor } from '../audit/audit.service';
import { config } from '../core/config';
import { localDate } from '../core/local-time';
import { rebuildTallies } from '../tallies/tallies.service';
import { dataSource } from '../db/data-source';
import { importHistory } from '../imports/imports.service';
import { anyJarStored } from '../jars/jar-details.service';
import { createUser, findUserByUsername } from '../users/users.service';
import { addPlanDetails } from './demo-details';
import { addDemoGrain, planDemoGrain } from './demo-grain';
import { planDemoHistory } from './demo-history';
import { planToCsv } from './demo-history-csv';
import { loadOpenIncidents } from './demo-incidents';
import { demoAccounts, demoPassword } from './demo-people';
import { loadDemoProcedures } from './demo-procedures';

const seeder: Actor = { id: null, displayName: 'demo loader' };

/**
 * Loads the invented demo lab through the services; safe to run on every start. `today` (lab-local)
 * fixes the day the history ends on, so a test gets the same lab on any date.
 */
export async function loadDemoLab(log: (line: string) => void = console.log, today?: string): Promise<void> {
  let created = 0;
  for (const account of demoAccounts) {
    if (await findUserByUsername(account.username)) continue;
    await createUser(seeder, { ...account, password: demoPassword });
    created += 1;
  }
  log(created ? `Demo lab: created ${created} accounts` : 'Demo lab: accounts present');
  await loadDemoProcedures(log);
  await loadDemoProduction(log, today ?? localDate(new Date(), config().LAB_TIME_ZONE));
}

/** Sixteen weeks of production ending today, imported as a lab would import its history; skipped once jars exist. */
async function loadDemoProduction(log: (line: string) => void, today: string): Promise<void> {
  if (await anyJarStored()) {
    log('Demo lab: production already loaded');
    return;
  }
  const timeZone = config().LAB_TIME_ZONE;
  const plan = planDemoHistory(today);
  const grain = planDemoGrain(plan);
  const supervisor = await findUserByUsername('supervisor');
  const actor: Actor = supervisor ? { id: supervisor.id, displayName: supervisor.displayName } : seeder;
  const imported = await dataSource.transaction(async (m) => {
    const outcome = await importHistory(actor, Buffer.from(planToCsv(plan)), m, today);
    if (!outcome.ok) {
      const first = outcome.errors.slice(0, 5).map((e) => `line ${e.line} ${e.column}: ${e.message}`);
      throw new Error(`The demo history did not import:\n${first.join('\n')}`);
    }
    await addPlanDetails(m, plan, timeZone, today);
    await addDemoGrain(m, actor, grain);
    // Parent jars set above change their descendants' root culture too: count the lab afresh.
    await rebuildTallies(m);
    return outcome.result.imported;
  });
  log(
    `Demo lab: imported ${imported.jars} jars and ${imported.incidents} closed incidents; ` +
      `${grain.lots.length} grain lots, ${grain.batches.length} prep batches`,
  );
  await loadOpenIncidents(plan, today, timeZone, log);
}
