import { inject } from 'vitest';

// Runs before worker-db.ts, so config() reads the fake's port when it first parses the environment.
process.env.SMTP_HOST = '127.0.0.1';
process.env.SMTP_PORT = String(inject('mailPort'));
