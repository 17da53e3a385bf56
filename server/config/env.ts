import { z } from 'zod';

/**
 * Every setting the API, worker, mail catcher and ops scripts read, in one
 * place, with the defaults a fresh machine needs. `profile` separates the
 * development stack (`npm start`), the test stack (`npm test`) and a lab's
 * production stack (`NODE_ENV=production npm start`), so they never share a
 * database, a port or a data directory. Production data lives under
 * /var/lib, not /var/tmp.
 */
const profiles = {
  dev: { pgPort: 54329, apiPort: 8340, smtpPort: 2525, database: 'frostgrade', dataRoot: '/var/tmp/frostgrade' },
  test: { pgPort: 54339, apiPort: 8341, smtpPort: 2526, database: 'frostgrade_test', dataRoot: '/var/tmp/frostgrade' },
  prod: { pgPort: 54319, apiPort: 8340, smtpPort: 587, database: 'frostgrade', dataRoot: '/var/lib/frostgrade' },
} as const;

export type Profile = keyof typeof profiles;

const schema = z.object({
  FROSTGRADE_PROFILE: z.enum(['dev', 'test', 'prod']).default('dev'),
  NODE_ENV: z.enum(['development', 'test', 'production']).optional(),
  DATABASE_URL: z.string().url().optional(),
  PG_PORT: z.coerce.number().int().min(1024).max(65535).optional(),
  PG_DATA_ROOT: z.string().optional(),
  PORT: z.coerce.number().int().min(1).max(65535).optional(),
  HOST: z.string().default('127.0.0.1'),
  APP_ORIGIN: z.string().url().optional(),
  SMTP_HOST: z.string().default('127.0.0.1'),
  SMTP_PORT: z.coerce.number().int().min(1).max(65535).optional(),
  SMTP_USER: z.string().optional(),
  SMTP_PASS: z.string().optional(),
  MAIL_FROM: z.string().default('Frostgrade <frostgrade@localhost>'),
  MAIL_CATCHER: z.enum(['0', '1']).optional(),
  WEB_DIST: z.string().default('dist'),
  WORKER_HEARTBEAT_SECONDS: z.coerce.number().min(1).max(300).default(5),
  RUN_QUEUE: z.string().regex(/^[a-z0-9-]+$/).default('leg-run'),
  RUN_STALE_SECONDS: z.coerce.number().min(3).max(3600).default(15),
  WORKERS: z.coerce.number().int().min(0).max(32).default(1),
  TEAM_RUNNING_LIMIT: z.coerce.number().int().min(1).max(1000).default(4),
  RUN_SLICE_SECONDS: z.coerce.number().min(1).max(86400).default(60),
  TEAM_LAUNCHES_PER_MINUTE: z.coerce.number().int().min(1).max(100000).default(120),
  TEAM_UNFINISHED_LIMIT: z.coerce.number().int().min(1).max(1000000).default(1000),
  TRUST_PROXY: z.string().regex(/^(loopback|false|true|\d{1,2}|[0-9a-fA-F.:/, ]+)$/, { error: 'TRUST_PROXY must be loopback, false, true, a number of proxy hops, or a list of addresses/subnets' }).default('loopback'),
});

/**
 * What production needs and a developer's machine does not: the public
 * address (links in mail, the cookie's Secure flag, the allowed Origin) and a
 * real mail relay. Each missing one is named; `npm start` refuses to start
 * in production until all are set.
 */
export function productionProblems(source: Record<string, string | undefined>): string[] {
  const problems: string[] = [];
  if (!source.APP_ORIGIN) problems.push('APP_ORIGIN is not set: the address users open, e.g. https://frostgrade.lab.example (mail links and cookies depend on it)');
  if (!source.SMTP_HOST) problems.push('SMTP_HOST is not set: the mail relay that delivers invitations, resets and run mail (with SMTP_PORT, SMTP_USER, SMTP_PASS as your relay needs)');
  if (!source.MAIL_FROM) problems.push('MAIL_FROM is not set: the sender address, e.g. "Frostgrade <frostgrade@lab.example>"');
  return problems;
}

export type Env = {
  profile: Profile;
  production: boolean;
  databaseUrl: string;
  /** DATABASE_URL was given: the database is someone else's, no private cluster is started. */
  externalDatabase: boolean;
  pgPort: number;
  pgDataRoot: string;
  host: string;
  port: number;
  appOrigin: string;
  smtp: { host: string; port: number; user?: string; pass?: string };
  mailFrom: string;
  /** The local SMTP catcher runs and its outbox is readable (never in production). */
  mailCatcher: boolean;
  webDist: string;
  heartbeatSeconds: number;
  /** pg-boss queue the API sends runs to and workers take them from. */
  runQueue: string;
  /** A running run whose worker has not beaten for this long is handed to another worker. */
  runStaleSeconds: number;
  /** Worker processes `npm start` runs (0 on an API machine whose workers run elsewhere: `npm run workers`). */
  workers: number;
  /** Fair share between teams (server/runs): see README "Runs, workers and the growth hand-off". */
  fairShare: FairShare;
  /** Express's `trust proxy`: which hops' X-Forwarded-For to believe (README, "Running it for a lab"). */
  trustProxy: boolean | number | string;
};

function trustProxyValue(v: string): boolean | number | string {
  if (v === 'true') return true;
  if (v === 'false') return false;
  return /^\d+$/.test(v) ? Number(v) : v;
}

export type FairShare = {
  /** Runs of one team running at once on one queue; more wait. */
  teamRunningLimit: number;
  /** A run that has held its worker this long gives it up at its next checkpoint when another team is waiting. */
  sliceSeconds: number;
  /** Runs (sweep values count one each) a team may launch per minute. */
  launchesPerMinute: number;
  /** Queued and running runs a team may have at once. */
  unfinishedLimit: number;
};

export function readEnv(source: Record<string, string | undefined> = process.env): Env {
  const parsed = schema.safeParse(source);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    throw new Error(`Environment variable ${String(issue?.path[0])}: ${issue?.message}`);
  }
  const e = parsed.data;
  const d = profiles[e.FROSTGRADE_PROFILE];
  const production = e.NODE_ENV === 'production';
  const pgPort = e.PG_PORT ?? d.pgPort;
  const port = e.PORT ?? d.apiPort;
  return {
    profile: e.FROSTGRADE_PROFILE,
    production,
    databaseUrl: e.DATABASE_URL ?? `postgres://postgres@127.0.0.1:${pgPort}/${d.database}`,
    externalDatabase: e.DATABASE_URL !== undefined,
    pgPort,
    pgDataRoot: e.PG_DATA_ROOT ?? d.dataRoot,
    host: e.HOST,
    port,
    appOrigin: e.APP_ORIGIN ?? `http://127.0.0.1:${port}`,
    smtp: { host: e.SMTP_HOST, port: e.SMTP_PORT ?? d.smtpPort, user: e.SMTP_USER, pass: e.SMTP_PASS },
    mailFrom: e.MAIL_FROM,
    mailCatcher: production ? false : e.MAIL_CATCHER !== '0',
    webDist: e.WEB_DIST,
    heartbeatSeconds: e.WORKER_HEARTBEAT_SECONDS,
    runQueue: e.RUN_QUEUE,
    runStaleSeconds: e.RUN_STALE_SECONDS,
    workers: e.WORKERS,
    fairShare: { teamRunningLimit: e.TEAM_RUNNING_LIMIT, sliceSeconds: e.RUN_SLICE_SECONDS, launchesPerMinute: e.TEAM_LAUNCHES_PER_MINUTE, unfinishedLimit: e.TEAM_UNFINISHED_LIMIT },
    trustProxy: trustProxyValue(e.TRUST_PROXY),
  };
}
