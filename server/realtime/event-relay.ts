import { Client } from 'pg';
import { eventChannel, type TeamEvent } from '../db/events';

export type RelayStatus = { listening: boolean; detail: string };
export type EventRelay = { status: () => RelayStatus; close: () => Promise<void> };

/** Backoff between reconnection attempts: 0.25 s doubling to 5 s, so a restart is noticed within seconds. */
const firstDelayMs = 250;
const maxDelayMs = 5000;

/**
 * The API's one LISTEN connection, relaying every event any process
 * publishes (server/db/events.ts) to `deliver`. A LISTEN lives on one
 * connection: when PostgreSQL restarts, that connection dies and must be
 * replaced and LISTEN issued again, with backoff, for as long as the API
 * runs. Events published while it is away are lost; browsers refetch what
 * they show when they reconnect or when the next event arrives.
 */
export function startEventRelay(databaseUrl: string, deliver: (e: TeamEvent) => void): Promise<EventRelay> {
  let client: Client | null = null;
  let closed = false;
  let listening = false;
  let detail = 'connecting';
  let downSince: number | null = null;
  let timer: ReturnType<typeof setTimeout> | null = null;
  let delay = firstDelayMs;
  let firstResolve: ((r: EventRelay) => void) | null = null;

  const relay: EventRelay = {
    status: () => ({ listening, detail }),
    close: async () => {
      closed = true;
      if (timer) clearTimeout(timer);
      await client?.end().catch(() => undefined);
    },
  };

  const lost = (why: string): void => {
    if (closed) return;
    if (listening || downSince === null) {
      downSince = Date.now();
      console.error(`[api] event relay lost its database connection (${why}); reconnecting`);
    }
    listening = false;
    detail = `reconnecting: ${why}`;
    const dead = client;
    client = null;
    dead?.removeAllListeners('notification');
    void dead?.end().catch(() => undefined);
    if (!timer) timer = setTimeout(connect, delay);
    delay = Math.min(maxDelayMs, delay * 2);
  };

  const connect = async (): Promise<void> => {
    timer = null;
    if (closed) return;
    const c = new Client({ connectionString: databaseUrl, application_name: 'frostgrade-events', connectionTimeoutMillis: 5000 });
    client = c;
    // Without these the first dropped connection would be an unhandled 'error' event.
    c.on('error', (err) => { if (client === c) lost(err.message); });
    c.on('end', () => { if (client === c) lost('connection ended'); });
    c.on('notification', (n) => {
      if (n.channel !== eventChannel || !n.payload) return;
      try {
        deliver(JSON.parse(n.payload) as TeamEvent);
      } catch (err) {
        console.error(`[api] event relay: unreadable event dropped: ${err instanceof Error ? err.message : String(err)}`);
      }
    });
    try {
      await c.connect();
      await c.query(`LISTEN ${eventChannel}`);
    } catch (err) {
      if (client === c) lost(err instanceof Error ? err.message : String(err));
      return;
    }
    if (client !== c) return;
    if (downSince !== null) {
      console.log(`[api] event relay listening again after ${((Date.now() - downSince) / 1000).toFixed(1)} s`);
    }
    listening = true;
    detail = `listening on ${eventChannel}`;
    downSince = null;
    delay = firstDelayMs;
    firstResolve?.(relay);
    firstResolve = null;
  };

  return new Promise<EventRelay>((resolve) => {
    // Start without events rather than not at all if the database is away at boot.
    const giveUp = setTimeout(() => { firstResolve?.(relay); firstResolve = null; }, 10_000);
    firstResolve = (r) => { clearTimeout(giveUp); resolve(r); };
    void connect();
  });
}
