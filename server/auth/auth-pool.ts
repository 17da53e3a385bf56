import { Pool } from 'pg';
import type { Env } from '../config/env';
import { quietPoolErrors } from '../db/pool-errors';
import { createLucia, type Auth } from './lucia';

/** lucia reads sessions through its own small pool, apart from TypeORM's. */
export function createAuth(env: Env): { auth: Auth; pool: Pool } {
  const pool = new Pool({ connectionString: env.databaseUrl, max: 4, application_name: 'frostgrade-auth', connectionTimeoutMillis: 5000 });
  pool.on('error', quietPoolErrors('auth'));
  return { auth: createLucia(pool, env.appOrigin.startsWith('https:')), pool };
}
