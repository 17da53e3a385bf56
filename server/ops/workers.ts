import 'reflect-metadata';
import { productionProblems, readEnv } from '../config/env';
import { log } from './log';
import { stackServices, startServices } from './supervise';

/**
 * `npm run workers`: only workers, supervised, for a machine that adds
 * computing to an installation whose API (and database) run elsewhere.
 * DATABASE_URL names the shared PostgreSQL; the API's machine runs the
 * migrations, so this one only waits for the database to answer.
 */
async function main(): Promise<void> {
  const production = process.env.NODE_ENV === 'production';
  const problems = [
    ...(process.env.DATABASE_URL ? [] : ['DATABASE_URL is not set: the PostgreSQL the API uses, e.g. postgres://frostgrade:…@db.lab.example:5432/frostgrade']),
    ...(production ? productionProblems(process.env) : []),
  ];
  if (problems.length > 0) throw new Error(`not starting workers:\n  - ${problems.join('\n  - ')}\nSee README, "Running it for a lab".`);
  const env = readEnv({ ...process.env, FROSTGRADE_PROFILE: production ? 'prod' : 'dev' });
  const workers = stackServices(Math.max(1, env.workers)).filter((s) => s.entry === 'worker/main.ts');
  let stopping = false;
  const stop = async (code: number): Promise<void> => {
    if (stopping) return;
    stopping = true;
    log('frostgrade', 'stopping workers (each hands its run back to the queue)…');
    await stack.stop();
    process.exit(code);
  };
  const stack = startServices(workers, process.env, {
    onGiveUp: (name) => {
      log('frostgrade', `giving up: ${name} keeps crashing (see above)`);
      void stop(1);
    },
  });
  process.on('SIGINT', () => void stop(0));
  process.on('SIGTERM', () => void stop(0));
  log('frostgrade', `${workers.length} worker${workers.length === 1 ? '' : 's'} started against ${new URL(env.databaseUrl).host}; Ctrl-C stops them`);
}

main().catch((err: Error) => {
  console.error(`[frostgrade] ${err.message}`);
  process.exit(1);
});
