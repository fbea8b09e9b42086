/** The server's settings, read from the environment once and checked by zod. */
import { resolve } from 'node:path';
import { z } from 'zod';

const EnvSchema = z.object({
  PORT: z.coerce.number().int().min(0).max(65535).default(3000),
  HOST: z.string().default('0.0.0.0'),
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  TIDEWRIGHT_DATA: z.string().min(1).default('./data'),
  DATABASE_URL: z.string().url().optional(),
  TIDEWRIGHT_DEMO: z.enum(['0', '1']).optional(),
  SESSION_SECRET: z.string().min(16).optional(),
  SMTP_URL: z.string().optional(),
  SMTP_PORT: z.coerce.number().int().min(0).max(65535).default(2525),
  PUBLIC_URL: z.string().url().optional(),
  TRUST_PROXY: z.string().optional(),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  STATIC_DIR: z.string().optional(),
});

/** Parsed settings. */
export interface Config {
  port: number;
  host: string;
  env: 'development' | 'production' | 'test';
  dataDir: string;
  databaseUrl: string | undefined;
  seedDemo: boolean;
  sessionSecret: string | undefined;
  smtpUrl: string | undefined;
  smtpPort: number;
  publicUrl: string | undefined;
  trustProxy: string | undefined;
  logLevel: string;
  staticDir: string;
}

/** Reads the settings from an environment (process.env by default); throws naming the bad variable. */
export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const parsed = EnvSchema.safeParse(env);
  if (!parsed.success) {
    const first = parsed.error.issues[0];
    throw new Error(
      `Environment variable ${String(first?.path.join('.'))} is invalid: ${first?.message}`,
    );
  }
  const e = parsed.data;
  return {
    port: e.PORT,
    host: e.HOST,
    env: e.NODE_ENV,
    dataDir: resolve(e.TIDEWRIGHT_DATA),
    databaseUrl: e.DATABASE_URL,
    seedDemo: e.NODE_ENV !== 'production' || e.TIDEWRIGHT_DEMO === '1',
    sessionSecret: e.SESSION_SECRET,
    smtpUrl: e.SMTP_URL,
    smtpPort: e.SMTP_PORT,
    publicUrl: e.PUBLIC_URL,
    trustProxy: e.TRUST_PROXY,
    logLevel: e.LOG_LEVEL,
    staticDir: resolve(e.STATIC_DIR ?? 'dist/tidewright/browser'),
  };
}
