import 'reflect-metadata';
import { Client } from 'pg';
import { readEnv } from '../../server/config/env';
import { createDataSource } from '../../server/db/data-source';

const env = readEnv({ ...process.env, FROSTGRADE_PROFILE: 'test' });
const scratch = 'frostgrade_migrations_check';

async function admin(sql: string): Promise<void> {
  const c = new Client({ host: '127.0.0.1', port: env.pgPort, user: 'postgres', database: 'postgres' });
  await c.connect();
  try { await c.query(sql); } finally { await c.end(); }
}

it('every migration applies, reverts and applies again on an empty database', async () => {
  await admin(`DROP DATABASE IF EXISTS ${scratch} WITH (FORCE)`);
  await admin(`CREATE DATABASE ${scratch}`);
  const url = new URL(env.databaseUrl);
  url.pathname = `/${scratch}`;
  const ds = await createDataSource(url.toString(), 'frostgrade-migration-check').initialize();
  try {
    const applied = await ds.runMigrations({ transaction: 'each' });
    expect(applied.length).toBeGreaterThan(0);
    for (let i = 0; i < applied.length; i += 1) await ds.undoLastMigration({ transaction: 'all' });
    const tables = await ds.query(`SELECT table_name FROM information_schema.tables WHERE table_schema = 'public' AND table_name <> 'schema_migration'`);
    expect(tables).toEqual([]);
    expect((await ds.runMigrations({ transaction: 'each' })).length).toBe(applied.length);
  } finally {
    await ds.destroy();
    await admin(`DROP DATABASE IF EXISTS ${scratch} WITH (FORCE)`);
  }
});
