// Pure: no I/O, clocks or Math.random; imports nothing. Seeded pseudo-random numbers for the simulator.

export interface Rng {
  /** Uniform in [0, 1). */
  next(): number;
  /** Uniform in [a, b). */
  range(a: number, b: number): number;
  /** Normally distributed with the given mean and standard deviation (Box–Muller). */
  normal(mean: number, sd: number): number;
  /** True with probability p (p ≤ 0 never, p ≥ 1 always). */
  chance(p: number): boolean;
  /** One of `items`, uniformly; throws on an empty list (a bug, not an input error). */
  pick<T>(items: readonly T[]): T;
}

/**
 * Mulberry32 (a 32-bit state generator, public domain): fast and good enough for simulated noise and choices,
 * not for anything secret. The same seed always gives the same sequence.
 */
export function createRng(seed: number): Rng {
  let state = seed >>> 0;
  let spareNormal: number | undefined;
  const next = (): number => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  return {
    next,
    range: (a, b) => a + (b - a) * next(),
    normal(mean, sd) {
      if (spareNormal !== undefined) {
        const z = spareNormal;
        spareNormal = undefined;
        return mean + sd * z;
      }
      const u = 1 - next();
      const v = next();
      const r = Math.sqrt(-2 * Math.log(u));
      spareNormal = r * Math.sin(2 * Math.PI * v);
      return mean + sd * r * Math.cos(2 * Math.PI * v);
    },
    chance: (p) => next() < p,
    pick(items) {
      if (items.length === 0) throw new RangeError('pick from an empty list');
      return items[Math.floor(next() * items.length)]!;
    },
  };
}

/** A second, independent stream from the same seed, so that e.g. sensor noise does not shift the robot's choices. */
export function forkRng(seed: number, stream: number): Rng {
  return createRng((seed ^ Math.imul(stream + 1, 0x9e3779b1)) >>> 0);
}
