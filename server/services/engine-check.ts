import { join } from 'node:path';
import { inApiThread } from './api-threads';
import { buildsTable, judge, type EngineCheck, type EngineVerdict } from './engine-judge';

const entry = join(__dirname, 'engine-check-thread.ts');

/**
 * The engine's verdict on `check`: in an API thread when it builds a measured
 * table (work that grows with the table), here when it does not (a thread's
 * start would cost more than the check). `field` names what the request sent,
 * for a refusal at the thread's limits.
 */
export async function engineVerdict(check: EngineCheck, field: string): Promise<EngineVerdict> {
  return buildsTable(check) ? inApiThread<EngineVerdict>(entry, check, field) : judge(check);
}
