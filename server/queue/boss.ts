import PgBoss from 'pg-boss';
import { queues } from './queues';

/**
 * pg-boss on the application database (schema `pgboss`). Every process that
 * starts it also supervises, so expired jobs are retried even when only one
 * kind of process is up.
 */
export async function startBoss(databaseUrl: string, applicationName: string): Promise<PgBoss> {
  const boss = new PgBoss({ connectionString: databaseUrl, schema: 'pgboss', application_name: applicationName, max: 4 });
  boss.on('error', (err: Error) => console.error(`[${applicationName}] pg-boss: ${err.message}`));
  await boss.start();
  for (const name of Object.values(queues)) {
    if (!(await boss.getQueue(name))) await boss.createQueue(name, { name, retryLimit: 0, expireInSeconds: 60 });
  }
  return boss;
}
