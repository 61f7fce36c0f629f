import { spawn } from 'node:child_process';
import { startLocalDb } from './local-db';

// Runs one command (a TypeORM CLI call, say) with the lab's MariaDB up, then stops it.
const args = process.argv.slice(2).filter((a) => a !== '--');
const [cmd, ...rest] = args;
if (!cmd) {
  console.error('usage: tsx scripts/with-db.ts -- <command> [args…]');
  process.exit(2);
}
const db = await startLocalDb();
const child = spawn(cmd, rest, { stdio: 'inherit' });
const code: number = await new Promise((resolve) => child.on('exit', (c) => resolve(c ?? 1)));
await db.stop();
process.exit(code);
