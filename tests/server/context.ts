import 'reflect-metadata';
import type { Express } from 'express';
import type PgBoss from 'pg-boss';
import type { DataSource } from 'typeorm';
import { readEnv, type Env } from '../../server/config/env';
import { createDataSource } from '../../server/db/data-source';
import { createApp } from '../../server/http/app';
import { createMailer, type Mailer } from '../../server/mail/mailer';
import { startBoss } from '../../server/queue/boss';

export type TestContext = { env: Env; ds: DataSource; boss: PgBoss; mailer: Mailer; app: Express; close: () => Promise<void> };

/**
 * The app wired to the real test database, queue and mail catcher that
 * `npm test` has started (tests/run-all.ts). No port is opened: supertest
 * drives the Express app directly.
 */
export async function openContext(overrides: Partial<Env> = {}): Promise<TestContext> {
  const env = { ...readEnv({ ...process.env, FROSTGRADE_PROFILE: 'test', NODE_ENV: 'test' }), ...overrides };
  const ds = await createDataSource(env.databaseUrl, 'frostgrade-jest').initialize();
  const boss = await startBoss(env.databaseUrl, 'frostgrade-jest');
  const mailer = createMailer(env);
  const app = createApp({ env, ds, boss, mailer, version: 'test' });
  return {
    env, ds, boss, mailer, app,
    close: async () => {
      mailer.close();
      await boss.stop({ graceful: false, wait: true });
      await ds.destroy();
    },
  };
}

export async function eventually<T>(probe: () => Promise<T | undefined>, seconds = 10): Promise<T> {
  const deadline = Date.now() + seconds * 1000;
  for (;;) {
    const v = await probe();
    if (v !== undefined) return v;
    if (Date.now() > deadline) throw new Error(`condition not met within ${seconds} s`);
    await new Promise((r) => setTimeout(r, 200));
  }
}
