// Writes to watchers a few sockets per event-loop turn, so a frame the robot or a publisher waits for (an
// op/ value, an ack) is read and forwarded between them instead of behind twenty viewers' copies.

export interface Flushable {
  flush(): void;
}

export class DeferredFlush {
  private readonly waiting = new Set<Flushable>();
  private scheduled = false;

  /**
   * `perTurn`: sockets written before the event loop polls again. `schedule` runs a callback after the loop's
   * next poll for I/O (setImmediate; tests pass their own).
   */
  constructor(
    private readonly perTurn = 4,
    private readonly schedule: (fn: () => void) => void = (fn) => setImmediate(fn),
  ) {}

  /** Flushes `target` on a later turn, once, however often it is added meanwhile. */
  add(target: Flushable): void {
    this.waiting.add(target);
    if (this.scheduled) return;
    this.scheduled = true;
    this.schedule(this.drain);
  }

  get size(): number {
    return this.waiting.size;
  }

  private readonly drain = (): void => {
    let written = 0;
    for (const target of this.waiting) {
      this.waiting.delete(target);
      target.flush();
      written += 1;
      if (written >= this.perTurn) break;
    }
    this.scheduled = this.waiting.size > 0;
    if (this.scheduled) this.schedule(this.drain);
  };
}
