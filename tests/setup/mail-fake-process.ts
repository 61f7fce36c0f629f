import { startMailFake } from '../../scripts/mail-fake';

// The test run's SMTP fake in a process of its own: the Vitest main process also serves the browser
// tests' app, and a fake sharing its event loop answered slowly enough to time mail tests out.
const sinkDir = process.argv[2];
if (!sinkDir) throw new Error('usage: mail-fake-process.ts <sink directory>');
const fake = await startMailFake({ port: 0, sinkDir });
process.stdout.write(`${JSON.stringify({ port: fake.port })}\n`);
const stop = () => void fake.stop().then(() => process.exit(0));
process.once('SIGTERM', stop);
process.once('SIGINT', stop);
// The run ends with its parent: never outlive a killed Vitest.
process.stdin.on('end', stop).resume();
