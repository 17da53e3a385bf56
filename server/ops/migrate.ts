import 'reflect-metadata';
import { readEnv } from '../config/env';
import { createDataSource } from '../db/data-source';
import { log } from './log';
import { ensureCluster, ensureDatabase } from './postgres';

/** `npm run migration:run` / `npm run migration:revert` against the dev database. */
async function main(): Promise<void> {
  const env = readEnv();
  ensureCluster(env.pgDataRoot, env.profile, env.pgPort);
  await ensureDatabase(env.pgPort, new URL(env.databaseUrl).pathname.slice(1));
  const ds = await createDataSource(env.databaseUrl, 'frostgrade-migrate').initialize();
  try {
    if (process.argv.includes('--revert')) {
      await ds.undoLastMigration({ transaction: 'all' });
      log('db', 'last migration reverted');
    } else {
      const ran = await ds.runMigrations({ transaction: 'each' });
      log('db', ran.length ? `applied: ${ran.map((m) => m.name).join(', ')}` : 'schema up to date');
    }
  } finally {
    await ds.destroy();
  }
}

main().catch((err: Error) => {
  console.error(`[db] ${err.message}`);
  process.exit(1);
});
