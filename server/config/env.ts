import { z } from 'zod';

const boolish = z.enum(['1', '0', 'true', 'false', 'yes', 'no', '']).transform((v) => v === '1' || v === 'true' || v === 'yes');

const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  PORT: z.coerce.number().int().min(0).max(65535).default(3000),
  HOST: z.string().default('0.0.0.0'),
  APP_URL: z.string().url().optional(),
  DATABASE_URL: z.string().url(),
  /** Read replicas, comma-separated: the read-only work goes there (db/read-only.ts), the rest to DATABASE_URL. */
  DATABASE_REPLICA_URLS: z
    .string()
    .optional()
    .transform((v) =>
      (v ?? '')
        .split(',')
        .map((u) => u.trim())
        .filter(Boolean),
    )
    .pipe(z.array(z.string().url())),
  SESSION_SECRET: z.string().min(16).default('arcwise-development-secret-change-me'),
  COOKIE_SECURE: boolish.default(false),
  TRUST_PROXY: boolish.default(false),
  SMTP_URL: z.string().url().optional(),
  MAIL_FROM: z.string().default('Arcwise <arcwise@harborlane.test>'),
  /** Set when the local mail catcher is in use: its HTTP view of the messages it holds. */
  MAIL_CATCHER_URL: z.string().url().optional(),
  MEILI_HOST: z.string().url().optional(),
  MEILI_API_KEY: z.string().optional(),
  MEILI_INDEX: z.string().default('parts'),
  /** Failed sign-ins allowed per (e-mail, client address), then per client address, in one window. */
  LOGIN_MAX_PER_ACCOUNT_AND_CLIENT: z.coerce.number().int().positive().default(5),
  LOGIN_MAX_PER_CLIENT: z.coerce.number().int().positive().default(30),
  LOGIN_WINDOW_MINUTES: z.coerce.number().positive().default(15),
  /** Calls allowed per API key per minute. */
  API_KEY_MAX_PER_MINUTE: z.coerce.number().int().positive().default(600),
  STATIC_DIR: z.string().optional(),
  /** 0: this process only enqueues follow-up jobs; another process works them. */
  JOB_WORKERS: boolish.default(true),
  /** Retries after the first attempt; the delay doubles each time (with jitter) from JOB_RETRY_DELAY_SECONDS. */
  JOB_RETRY_LIMIT: z.coerce.number().int().min(0).default(6),
  JOB_RETRY_DELAY_SECONDS: z.coerce.number().int().min(1).default(10),
  /** How often an idle worker looks for due jobs (retries); new jobs wake it at once. pg-boss's floor is 0.5. */
  JOB_POLL_SECONDS: z.coerce.number().min(0.5).default(2),
  /** pino's level; unset: info, or warn under NODE_ENV=test so test output stays clean. */
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).optional(),
  /** On SIGTERM, /readyz answers 503 this long before the listener closes, so a load balancer stops sending first. */
  SHUTDOWN_DELAY_SECONDS: z.coerce.number().min(0).default(0),
  /** Requests under way get this long to finish after the listener closes; the rest are cut. */
  SHUTDOWN_TIMEOUT_SECONDS: z.coerce.number().min(0).default(20),
  /** `npm run worker`: the port of its /healthz, /readyz and /metrics. */
  WORKER_PORT: z.coerce.number().int().min(0).max(65535).default(3100),
});

export type Env = z.infer<typeof envSchema>;

/** Parses the environment once and fails fast, naming every bad key. */
export function loadEnv(source: NodeJS.ProcessEnv = process.env): Env {
  const cleaned = Object.fromEntries(Object.entries(source).filter(([, v]) => v !== undefined && v !== ''));
  const result = envSchema.safeParse(cleaned);
  if (!result.success) {
    const keys = result.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('; ');
    throw new Error(`Invalid environment: ${keys}`);
  }
  return result.data;
}

export function appUrl(env: Env): string {
  return env.APP_URL ?? `http://localhost:${env.PORT}`;
}
