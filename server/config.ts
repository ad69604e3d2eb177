import { IANAZone } from 'luxon';
import { z } from 'zod';
import { TrustProxy, trustProxySchema } from './trust-proxy';

const booleanFlag = z
  .enum(['true', 'false', '1', '0'])
  .default('false')
  .transform((value) => value === 'true' || value === '1');

const coopTimeZoneSchema = z
  .string()
  .default('Europe/Berlin')
  .refine((zone) => IANAZone.isValidZone(zone), 'an IANA time zone such as Europe/Berlin');

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
  TRUST_PROXY: trustProxySchema,
  CLIENT_DIST: z.string().default('dist/commonwort/browser'),
  COOP_TIME_ZONE: coopTimeZoneSchema,
  STRIPE_SECRET_KEY: z.string().regex(/^sk_(test|live)_\w+$/, 'a Stripe secret key (sk_test_… or sk_live_…)').default('sk_test_commonwort_local'),
  STRIPE_API_HOST: z.string().min(1).optional(),
  STRIPE_API_PORT: z.coerce.number().int().min(1).max(65535).optional(),
  STRIPE_API_PROTOCOL: z.enum(['http', 'https']).default('https'),
  SMTP_HOST: z.string().min(1).default('127.0.0.1'),
  SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(2525),
  SMTP_SECURE: booleanFlag,
  SMTP_USER: z.string().optional(),
  SMTP_PASSWORD: z.string().optional(),
  MAIL_FROM: z.string().min(3).default('Commonwort <no-reply@commonwort.invalid>'),
  MAIL_DISPATCH_SECONDS: z.coerce.number().int().min(1).max(3600).default(10),
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
  /** Proxies believed about the client's address: a hop count or their addresses (see trust-proxy.ts). */
  trustProxy: TrustProxy;
  clientDist: string;
  /** Wall-clock zone of the co-op: bookings, brew days and readings are entered and shown in it. */
  coopTimeZone: string;
  /** Card payments; `testMode` when the key is a test key (the pay dialog then offers the test cards). */
  stripe: { secretKey: string; host?: string; port?: number; protocol: 'http' | 'https'; testMode: boolean };
  /** Outgoing mail: the SMTP server the outbox delivers to. */
  smtp: { host: string; port: number; secure: boolean; user?: string; password?: string; from: string };
  /** How often the outbox is swept for messages to send. */
  mailDispatchSeconds: number;
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
    stripe: {
      secretKey: e.STRIPE_SECRET_KEY,
      host: e.STRIPE_API_HOST,
      port: e.STRIPE_API_PORT,
      protocol: e.STRIPE_API_PROTOCOL,
      testMode: e.STRIPE_SECRET_KEY.startsWith('sk_test_'),
    },
    smtp: { host: e.SMTP_HOST, port: e.SMTP_PORT, secure: e.SMTP_SECURE, user: e.SMTP_USER || undefined, password: e.SMTP_PASSWORD || undefined, from: e.MAIL_FROM },
    mailDispatchSeconds: e.MAIL_DISPATCH_SECONDS,
  };
}

/** The co-op's zone alone, as the server reads it: seeds run without the server's secrets. */
export function coopTimeZoneFrom(env: NodeJS.ProcessEnv = process.env): string {
  return coopTimeZoneSchema.parse(env.COOP_TIME_ZONE);
}
