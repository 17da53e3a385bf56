import { Pool } from 'pg';
import type { Env } from '../config/env';
import { createLucia, type Auth } from './lucia';

/** lucia reads sessions through its own small pool, apart from TypeORM's. */
export function createAuth(env: Env): { auth: Auth; pool: Pool } {
  const pool = new Pool({ connectionString: env.databaseUrl, max: 4, application_name: 'frostgrade-auth' });
  return { auth: createLucia(pool, env.appOrigin.startsWith('https:')), pool };
}
