import { IANAZone } from 'luxon';
import { z } from 'zod';

const booleanFlag = z
  .enum(['true', 'false', '1', '0'])
  .default('false')
  .transform((value) => value === 'true' || value === '1');

const configSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  HOST: z.string().min(1).default('127.0.0.1'),
  PORT: z.coerce.number().int().min(0).max(65535).default(4300),
  PUBLIC_URL: z.url().optional(),
  DB_HOST: z.string().min(1).default('127.0.0.1'),
  DB_PORT: z.coerce.number().int().min(1).max(65535).default(3407),
  DB_USER: z.string().min(1).default('commonwort'),
  DB_PASSWORD: z.string().min(1),
  DB_NAME: z.string().regex(/^[a-z0-9_]+$/, 'lower-case letters, digits and _ only').default('commonwort'),
  SESSION_SECRET: z.string().min(32, 'at least 32 characters'),
  BCRYPT_COST: z.coerce.number().int().min(4).max(15).default(12),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  TRUST_PROXY: booleanFlag,
  CLIENT_DIST: z.string().default('dist/commonwort/browser'),
  COOP_TIME_ZONE: z
    .string()
    .default('Europe/Berlin')
    .refine((zone) => IANAZone.isValidZone(zone), 'an IANA time zone such as Europe/Berlin'),
});

/** The server's settings, validated once at start-up. */
export interface Config {
  env: 'development' | 'production' | 'test';
  host: string;
  port: number;
  publicUrl: string;
  db: { host: string; port: number; user: string; password: string; database: string };
  sessionSecret: string;
  bcryptCost: number;
  logLevel: string;
  trustProxy: boolean;
  clientDist: string;
  /** Wall-clock zone of the co-op: bookings, brew days and readings are entered and shown in it. */
  coopTimeZone: string;
}

/** Reads the configuration from environment variables; throws naming every bad variable. */
export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const parsed = configSchema.safeParse(env);
  if (!parsed.success) {
    const problems = parsed.error.issues.map((issue) => `${issue.path.join('.')}: ${issue.message}`);
    throw new Error(`Invalid configuration:\n  ${problems.join('\n  ')}`);
  }
  const e = parsed.data;
  return {
    env: e.NODE_ENV,
    host: e.HOST,
    port: e.PORT,
    publicUrl: (e.PUBLIC_URL ?? `http://${e.HOST}:${e.PORT}`).replace(/\/$/, ''),
    db: { host: e.DB_HOST, port: e.DB_PORT, user: e.DB_USER, password: e.DB_PASSWORD, database: e.DB_NAME },
    sessionSecret: e.SESSION_SECRET,
    bcryptCost: e.BCRYPT_COST,
    logLevel: e.LOG_LEVEL,
    trustProxy: e.TRUST_PROXY,
    clientDist: e.CLIENT_DIST,
    coopTimeZone: e.COOP_TIME_ZONE,
  };
}
