import { config } from '../server/core/config';
import { isPortFree } from './free-port';
import { startMariaDb, type MariaDbHandle } from './mariadb';

/** The lab's own MariaDB for npm start and dev: data kept in DB_DATA_DIR between runs. */
export async function startLocalDb(): Promise<MariaDbHandle> {
  const c = config();
  if (!(await isPortFree(c.DB_PORT))) {
    throw new Error(
      `Port ${c.DB_PORT} on 127.0.0.1 is taken by another program. Set DB_PORT to a free port; ` +
        'Asepta runs its own MariaDB and never uses one that happens to be running.',
    );
  }
  return startMariaDb({
    dataDir: c.DB_DATA_DIR,
    port: c.DB_PORT,
    database: c.DB_NAME,
    user: c.DB_USER,
    password: c.DB_PASSWORD,
    log: (l) => console.log(l),
  });
}
