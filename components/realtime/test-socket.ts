/**
 * Stand-in for socket.io-client in component tests: records what the page
 * emits and lets the test play the server.
 *
 *   jest.mock('socket.io-client', () => jest.requireActual('@/components/realtime/test-socket'));
 *   const socket = lastSocket();
 *   act(() => socket.serverConnect());
 *   act(() => socket.serverEmit('run:progress', progress));
 */
type Listener = (...args: unknown[]) => void;

export class FakeSocket {
  connected = false;
  disconnected = false;
  /** Times the page asked to connect again itself (socket.io reconnects only after transport trouble). */
  connectCalls = 0;
  readonly emitted: Array<{ event: string; args: unknown[] }> = [];
  private readonly listeners = new Map<string, Listener[]>();

  on(event: string, listener: Listener): this {
    this.listeners.set(event, [...(this.listeners.get(event) ?? []), listener]);
    return this;
  }

  emit(event: string, ...args: unknown[]): this {
    this.emitted.push({ event, args });
    const ack = args[args.length - 1];
    if (event === 'watch' && typeof ack === 'function') ack({ ok: true });
    return this;
  }

  removeAllListeners(): this {
    this.listeners.clear();
    return this;
  }

  connect(): this {
    this.connectCalls += 1;
    return this;
  }

  disconnect(): this {
    this.disconnected = true;
    this.connected = false;
    return this;
  }

  listenerCount(): number {
    return [...this.listeners.values()].reduce((n, list) => n + list.length, 0);
  }

  /** Rooms the page asked to watch, in order. */
  watched(): unknown[] {
    return this.emitted.filter((e) => e.event === 'watch').map((e) => e.args[0]);
  }

  serverConnect(): void {
    this.connected = true;
    this.serverEmit('connect');
  }

  /** The server closes the socket: 'io server disconnect' as socket.io names it, or a lost transport. */
  serverDisconnect(reason: 'io server disconnect' | 'transport close'): void {
    this.connected = false;
    this.serverEmit('disconnect', reason);
  }

  serverEmit(event: string, payload?: unknown): void {
    for (const listener of this.listeners.get(event) ?? []) listener(payload);
  }
}

export const sockets: FakeSocket[] = [];

export function io(): FakeSocket {
  const socket = new FakeSocket();
  sockets.push(socket);
  return socket;
}

export function lastSocket(): FakeSocket {
  const socket = sockets[sockets.length - 1];
  if (!socket) throw new Error('the page opened no socket');
  return socket;
}
