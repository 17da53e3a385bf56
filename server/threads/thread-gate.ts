/** Refused at the door: every slot is taken and the wait queue is full. */
export class ThreadBusyError extends Error {
  constructor(readonly retryAfterSeconds: number) {
    super('every computation thread is busy and the wait queue is full');
    this.name = 'ThreadBusyError';
  }
}

/**
 * A small semaphore for worker threads: at most `maxRunning` at once, at most
 * `maxWaiting` callers queued behind them (first come, first served), and
 * anyone beyond that refused at once. Threads are CPU-bound and each holds
 * its own heap, so an unbounded number of them would slow every request and
 * could exhaust memory; an unbounded queue would only move the pile-up.
 */
export class ThreadGate {
  private running = 0;
  private readonly waiting: Array<() => void> = [];

  constructor(
    readonly maxRunning: number,
    readonly maxWaiting: number,
    /** What a refused caller is told to wait before trying again. */
    readonly retryAfterSeconds = 5,
  ) {}

  /** Resolves with the function that gives the slot back (calling it twice is harmless). */
  enter(): Promise<() => void> {
    if (this.running < this.maxRunning) {
      this.running += 1;
      return Promise.resolve(this.leaver());
    }
    if (this.waiting.length >= this.maxWaiting) return Promise.reject(new ThreadBusyError(this.retryAfterSeconds));
    return new Promise((resolve) => this.waiting.push(() => resolve(this.leaver())));
  }

  get load(): { running: number; waiting: number } {
    return { running: this.running, waiting: this.waiting.length };
  }

  private leaver(): () => void {
    let left = false;
    return () => {
      if (left) return;
      left = true;
      // The slot passes straight to the next in line, or is freed.
      const next = this.waiting.shift();
      if (next) next();
      else this.running -= 1;
    };
  }
}
