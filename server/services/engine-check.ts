import { join } from 'node:path';
import type { EngineCheck, EngineVerdict } from './engine-check-thread';
import { inApiThread } from './api-threads';

const entry = join(__dirname, 'engine-check-thread.ts');

/** The engine's verdict on `check`, computed off the event loop; `field` names what the request sent, for a refusal at the thread's limits. */
export function engineVerdict(check: EngineCheck, field: string): Promise<EngineVerdict> {
  return inApiThread<EngineVerdict>(entry, check, field);
}
