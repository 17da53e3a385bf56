import type { Env } from '../config/env';
import { createDataSource } from '../db/data-source';
import { seedDemo } from '../db/seed/seed';
import { startBoss } from '../queue/boss';
import { log } from './log';
import { clusterUrl, ensureCluster, ensureDatabase, type Cluster, type ClusterPolicy } from './postgres';

/** Where the database is: a private cluster this machine runs (null when DATABASE_URL names someone else's) and how to reach it. */
export type Database = { cluster: Cluster | null; url: string };

/** fsync off only for the throw-away test cluster; a password only in production. */
export const clusterPolicy = (env: Env): ClusterPolicy => ({ fsync: env.profile !== 'test', password: env.production });

/** The database, present and reachable: the external one as given, or the private cluster started (or reused) with its database. */
export async function provideDatabase(env: Env, fresh = false): Promise<Database> {
  if (env.externalDatabase) return { cluster: null, url: env.databaseUrl };
  const cluster = ensureCluster(env.pgDataRoot, env.profile, env.pgPort, clusterPolicy(env));
  const name = new URL(env.databaseUrl).pathname.slice(1);
  await ensureDatabase(cluster, name, fresh);
  return { cluster, url: clusterUrl(cluster, name) };
}

/**
 * PostgreSQL up, database present (fresh for tests), migrations run, the
 * demo lab added unless `seed` is false (production never has it).
 */
export async function prepareDatabase(env: Env, opts: { fresh: boolean; seed?: boolean }): Promise<Database> {
  const db = await provideDatabase(env, opts.fresh);
  const ds = await createDataSource(db.url, 'frostgrade-setup').initialize();
  try {
    const ran = await ds.runMigrations({ transaction: 'each' });
    log('db', ran.length ? `migrations applied: ${ran.map((m) => m.name).join(', ')}` : 'schema up to date');
    if (opts.seed ?? !env.production) {
      const added = await seedDemo(ds);
      log('db', `demo data added: ${added.teams} teams, ${added.users} users, ${added.families} families, ${added.modules} modules, ${added.coolers} coolers`);
    }
  } finally {
    await ds.destroy();
  }
  // Install pg-boss's schema and our queues once, before several processes race to.
  const boss = await startBoss(db.url, 'frostgrade-setup', [env.runQueue]);
  await boss.stop({ graceful: false, wait: true });
  return db;
}
