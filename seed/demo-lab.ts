import type { Actor } from '../server/audit/audit.service';
import { dataSource } from '../server/db/data-source';
import { User } from '../server/users/user.entity';
import { createUser } from '../server/users/users.service';
import { demoAccounts, demoPassword } from './demo-people';

const seeder: Actor = { id: null, displayName: 'demo loader' };

/** Loads the invented demo lab through the services; safe to run on every start. */
export async function loadDemoLab(log: (line: string) => void = console.log): Promise<void> {
  let created = 0;
  for (const account of demoAccounts) {
    if (await dataSource.manager.existsBy(User, { username: account.username })) continue;
    await createUser(seeder, { ...account, password: demoPassword });
    created += 1;
  }
  log(created ? `Demo lab: created ${created} accounts` : 'Demo lab: already loaded');
}
