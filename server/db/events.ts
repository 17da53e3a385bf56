import type { DataSource } from 'typeorm';

/** PostgreSQL channel on which any process (API or worker) announces events for browsers. */
export const eventChannel = 'frostgrade_events';

/**
 * An event for the browsers of one team (and, with `room`, only those that
 * watch that object, e.g. `run:<id>`). Rooms are always inside the team.
 */
export type TeamEvent = { teamId: string; room?: string; event: string; payload: Record<string, unknown> };

/** NOTIFY carries at most 8000 bytes; events are small by design (ids, numbers, short profiles). */
const maxPayloadBytes = 7900;

/** Publishes through PostgreSQL, so a worker on another machine reaches the API that holds the sockets. */
export async function publishEvent(ds: DataSource, e: TeamEvent): Promise<void> {
  const text = JSON.stringify(e);
  if (Buffer.byteLength(text) > maxPayloadBytes) throw new Error(`event ${e.event} is ${Buffer.byteLength(text)} bytes; NOTIFY carries at most ${maxPayloadBytes}`);
  await ds.query('SELECT pg_notify($1, $2)', [eventChannel, text]);
}
