// Pure: no imports. Clock offset and round-trip delay from one request/response exchange, RFC 5905 §8.

/**
 * With t1 the client's send time, t2 the server's receive time, t3 the server's send time and t4 the
 * client's receive time (each on its own clock, in ms): offset θ = ((t2 − t1) + (t3 − t4)) / 2 is what
 * to add to client time to get server time; delay δ = (t4 − t1) − (t3 − t2) is the network round trip.
 */
export function onWire(t1: number, t2: number, t3: number, t4: number): { offsetMs: number; delayMs: number } {
  return { offsetMs: (t2 - t1 + (t3 - t4)) / 2, delayMs: t4 - t1 - (t3 - t2) };
}

export interface ClockSample {
  offsetMs: number;
  delayMs: number;
}

/**
 * Keeps the last `size` samples and trusts the one with the least delay, as NTP's clock filter does:
 * the shortest round trip has the least room for asymmetric queueing.
 */
export class ClockFilter {
  private readonly samples: ClockSample[] = [];
  constructor(private readonly size = 8) {}

  add(sample: ClockSample): void {
    if (!Number.isFinite(sample.offsetMs) || !Number.isFinite(sample.delayMs) || sample.delayMs < 0) return;
    this.samples.push(sample);
    if (this.samples.length > this.size) this.samples.shift();
  }

  /** The best current estimate, or undefined before the first sample. */
  best(): ClockSample | undefined {
    let best: ClockSample | undefined;
    for (const s of this.samples) if (!best || s.delayMs < best.delayMs) best = s;
    return best;
  }
}
