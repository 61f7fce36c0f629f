import path from 'node:path';
import { z } from 'zod';
import { publishedSecrets, readOrCreateSecret } from './session-secret';

const boolish = z.enum(['0', '1', 'true', 'false']).transform((v) => v === '1' || v === 'true');

const configSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  HOST: z.string().min(1).default('127.0.0.1'),
  PORT: z.coerce.number().int().min(0).max(65535).default(5180),
  PUBLIC_URL: z.url().optional(),
  /** Serve over HTTPS with a self-signed certificate made on first use: phones give camera access only to secure pages. */
  HTTPS: boolish.default(false),
  TLS_DIR: z.string().default('.data/tls'),
  ASEPTA_DEMO: boolish.default(true),
  LAB_TIME_ZONE: z
    .string()
    .default('Europe/London')
    .refine((tz) => {
      try {
        new Intl.DateTimeFormat('en', { timeZone: tz });
        return true;
      } catch {
        return false;
      }
    }, 'must be an IANA time zone such as Europe/London'),
  DB_HOST: z.string().default('127.0.0.1'),
  DB_PORT: z.coerce.number().int().min(1).max(65535).default(3307),
  DB_NAME: z
    .string()
    .regex(/^[A-Za-z0-9_]+$/)
    .default('asepta'),
  DB_USER: z.string().default('asepta'),
  DB_PASSWORD: z.string().default('asepta-local'),
  DB_DATA_DIR: z.string().default('.data/mariadb'),
  SESSION_SECRET: z
    .string()
    .min(16)
    .refine(
      (v) => !publishedSecrets.includes(v),
      'is a published example value: unset it (a random one is made) or choose your own',
    )
    .optional(),
  SESSION_SECRET_FILE: z.string().default('.data/session-secret'),
  SESSION_MAX_AGE_HOURS: z.coerce.number().positive().default(12),
  PASSWORD_HASH_ROUNDS: z.coerce.number().int().min(4).max(15).default(11),
  LOGIN_FAILURE_LIMIT: z.coerce.number().int().min(1).default(10),
  LOGIN_ADDRESS_FAILURE_LIMIT: z.coerce.number().int().min(1).default(50),
  LOGIN_WINDOW_MINUTES: z.coerce.number().int().min(1).default(15),
  MAINTENANCE_INTERVAL_SECONDS: z.coerce.number().int().min(1).max(86_400).default(900),
  TRUST_PROXY: boolish.default(false),
  UPLOAD_DIR: z.string().default('.data/uploads'),
  PHOTO_MAX_MEGAPIXELS: z.coerce.number().positive().max(1000).default(40),
  MAIL_SINK_DIR: z.string().default('.data/mail'),
  SMTP_HOST: z.string().default('127.0.0.1'),
  SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(2525),
  SMTP_FROM: z.string().default('Asepta <asepta@lab.invalid>'),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'silent']).default('info'),
  STATIC_DIR: z.string().default('dist'),
});

export type Config = z.infer<typeof configSchema> & { publicUrl: string; SESSION_SECRET: string };

/** Fails fast with every bad key named, so a typo in the environment never starts a half-configured lab. */
export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const parsed = configSchema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Invalid configuration:\n${lines.join('\n')}`);
  }
  const c = parsed.data;
  const scheme = c.HTTPS ? 'https' : 'http';
  return {
    ...c,
    SESSION_SECRET: c.SESSION_SECRET ?? readOrCreateSecret(path.resolve(c.SESSION_SECRET_FILE)),
    publicUrl: (c.PUBLIC_URL ?? `${scheme}://${c.HOST}:${c.PORT}`).replace(/\/$/, ''),
  };
}

let current: Config | undefined;

export function config(): Config {
  current ??= loadConfig();
  return current;
}
