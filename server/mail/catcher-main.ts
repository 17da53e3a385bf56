import 'reflect-metadata';
import { readEnv } from '../config/env';
import { createDataSource } from '../db/data-source';
import { startCatcher } from './catcher';

async function main(): Promise<void> {
  const env = readEnv();
  const ds = await createDataSource(env.databaseUrl, 'frostgrade-mail-catcher').initialize();
  const server = await startCatcher(ds, env.smtp.host, env.smtp.port);
  console.log(`[mail] catching SMTP on ${env.smtp.host}:${env.smtp.port}`);
  const stop = (): void => {
    server.close(() => void ds.destroy().then(() => process.exit(0)));
  };
  process.on('SIGTERM', stop);
  process.on('SIGINT', stop);
}

main().catch((err: Error) => {
  console.error(`[mail] ${err.message}`);
  process.exit(1);
});
