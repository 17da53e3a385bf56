import type { Env } from '../config/env';
import { createDataSource } from '../db/data-source';
import { seedDemo } from '../db/seed/seed';
import { startBoss } from '../queue/boss';
import { log } from './log';
import { ensureCluster, ensureDatabase, type Cluster } from './postgres';

/** PostgreSQL up, database present (fresh for tests), migrations run, demo data in. */
export async function prepareDatabase(env: Env, opts: { fresh: boolean }): Promise<Cluster> {
  const cluster = ensureCluster(env.pgDataRoot, env.profile, env.pgPort);
  const dbName = new URL(env.databaseUrl).pathname.slice(1);
  await ensureDatabase(env.pgPort, dbName, opts.fresh);
  const ds = await createDataSource(env.databaseUrl, 'frostgrade-setup').initialize();
  try {
    const ran = await ds.runMigrations({ transaction: 'each' });
    log('db', ran.length ? `migrations applied: ${ran.map((m) => m.name).join(', ')}` : 'schema up to date');
    const added = await seedDemo(ds);
    log('db', `demo data added: ${added.teams} teams, ${added.users} users, ${added.families} families, ${added.modules} modules`);
  } finally {
    await ds.destroy();
  }
  // Install pg-boss's schema and our queues once, before several processes race to.
  const boss = await startBoss(env.databaseUrl, 'frostgrade-setup', [env.runQueue]);
  await boss.stop({ graceful: false, wait: true });
  return cluster;
}
