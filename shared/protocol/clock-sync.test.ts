import { describe, expect, it } from 'vitest';
import { ClockFilter, onWire } from './clock-sync';

describe('onWire', () => {
  // RFC 5905 §8 (NTPv4 on-wire protocol): θ = ((T2 − T1) + (T3 − T4)) / 2, δ = (T4 − T1) − (T3 − T2).
  // Worked by hand: the server clock is 1000 ms ahead; 10 ms out, 5 ms in the server, 30 ms back.
  //   T1 = 0 (client), T2 = 1010 (server), T3 = 1015 (server), T4 = 45 (client)
  //   θ = ((1010 − 0) + (1015 − 45)) / 2 = (1010 + 970) / 2 = 990
  //   δ = (45 − 0) − (1015 − 1010) = 40
  // The asymmetric path (10 out, 30 back) shows as a 10 ms offset error: (30 − 10) / 2.
  it('gives the RFC 5905 offset and delay for a worked exchange', () => {
    expect(onWire(0, 1010, 1015, 45)).toEqual({ offsetMs: 990, delayMs: 40 });
  });

  it('recovers an exact offset when the path is symmetric', () => {
    // Client clock 250 ms behind the server: 7 ms each way, 2 ms processing.
    const t1 = 5000;
    const t2 = t1 + 250 + 7;
    const t3 = t2 + 2;
    const t4 = t3 - 250 + 7;
    expect(onWire(t1, t2, t3, t4)).toEqual({ offsetMs: 250, delayMs: 14 });
  });
});

describe('ClockFilter', () => {
  it('trusts the sample with the least delay among the last few', () => {
    const filter = new ClockFilter(3);
    expect(filter.best()).toBeUndefined();
    filter.add({ offsetMs: 12, delayMs: 9 });
    filter.add({ offsetMs: 10, delayMs: 2 });
    filter.add({ offsetMs: 30, delayMs: 40 });
    expect(filter.best()).toEqual({ offsetMs: 10, delayMs: 2 });
    filter.add({ offsetMs: 11, delayMs: 5 });
    filter.add({ offsetMs: 13, delayMs: 6 });
    expect(filter.best()).toEqual({ offsetMs: 11, delayMs: 5 });
  });

  it('ignores impossible samples', () => {
    const filter = new ClockFilter();
    filter.add({ offsetMs: Number.NaN, delayMs: 1 });
    filter.add({ offsetMs: 1, delayMs: -3 });
    expect(filter.best()).toBeUndefined();
  });
});
