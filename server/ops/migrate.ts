import 'reflect-metadata';
import { readEnv } from '../config/env';
import { createDataSource } from '../db/data-source';
import { provideDatabase } from './database';
import { log } from './log';

/** `npm run migration:run` / `npm run migration:revert` against the development database (or DATABASE_URL). */
async function main(): Promise<void> {
  const env = readEnv();
  const db = await provideDatabase(env);
  const ds = await createDataSource(db.url, 'frostgrade-migrate').initialize();
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
