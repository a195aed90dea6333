import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { z } from 'zod';

/** The project's root folder (one up from server/). */
export const projectRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');

const flag = z
  .enum(['true', 'false', '1', '0', 'yes', 'no'])
  .transform((v) => v === 'true' || v === '1' || v === 'yes');

const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  HOST: z.string().min(1).default('127.0.0.1'),
  PORT: z.coerce.number().int().min(0).max(65535).default(5317),
  PUBLIC_URL: z.url().optional(),
  DATABASE_URL: z.string().min(1).optional(),
  BLOCKWRIGHT_PG_PORT: z.coerce.number().int().min(1024).max(65535).default(54329),
  BLOCKWRIGHT_DATA_DIR: z.string().min(1).optional(),
  BLOCKWRIGHT_DEMO: flag.default(true),
  SESSION_SECRET: z.string().min(32, 'SESSION_SECRET must be at least 32 characters').optional(),
  COOKIE_SECURE: flag.default(false),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  SMTP_HOST: z.string().min(1).optional(),
  SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(587),
  SMTP_SECURE: flag.default(false),
  SMTP_USER: z.string().optional(),
  SMTP_PASS: z.string().optional(),
  MAIL_FROM: z.string().min(3).default('Blockwright <no-reply@blockwright.localhost>'),
  SIGN_IN_ATTEMPTS: z.coerce.number().int().min(1).default(10),
});

export type Environment = z.infer<typeof envSchema>['NODE_ENV'];

export interface Config {
  env: Environment;
  host: string;
  port: number;
  publicUrl: string;
  databaseUrl: string | undefined;
  pgPort: number;
  dataDir: string;
  seedDemo: boolean;
  sessionSecret: string | undefined;
  cookieSecure: boolean;
  logLevel: string;
  smtp: { host: string; port: number; secure: boolean; user?: string; pass?: string } | undefined;
  mailFrom: string;
  signInAttempts: number;
}

/** Read the configuration from environment variables; a bad value stops start-up with one line per variable. */
export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  // An empty variable counts as unset.
  const given = Object.fromEntries(Object.entries(env).filter(([, v]) => v !== undefined && v !== ''));
  const parsed = envSchema.safeParse(given);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Configuration is not valid:\n${lines.join('\n')}`);
  }
  const e = parsed.data;
  if (e.NODE_ENV === 'production' && !e.SESSION_SECRET)
    throw new Error('Configuration is not valid:\n  SESSION_SECRET: required when NODE_ENV=production');
  return {
    env: e.NODE_ENV,
    host: e.HOST,
    port: e.PORT,
    publicUrl: (e.PUBLIC_URL ?? `http://${e.HOST}:${e.PORT}`).replace(/\/$/, ''),
    databaseUrl: e.DATABASE_URL,
    pgPort: e.BLOCKWRIGHT_PG_PORT,
    dataDir: path.resolve(projectRoot, e.BLOCKWRIGHT_DATA_DIR ?? '.data'),
    seedDemo: e.BLOCKWRIGHT_DEMO,
    sessionSecret: e.SESSION_SECRET,
    cookieSecure: e.COOKIE_SECURE,
    logLevel: e.LOG_LEVEL,
    smtp: e.SMTP_HOST
      ? { host: e.SMTP_HOST, port: e.SMTP_PORT, secure: e.SMTP_SECURE, user: e.SMTP_USER, pass: e.SMTP_PASS }
      : undefined,
    mailFrom: e.MAIL_FROM,
    signInAttempts: e.SIGN_IN_ATTEMPTS,
  };
}
