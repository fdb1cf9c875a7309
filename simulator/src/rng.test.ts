import { describe, expect, it } from 'vitest';
import { createRng, forkRng } from './rng';

const draw = (seed: number, n: number) => {
  const rng = createRng(seed);
  return Array.from({ length: n }, () => rng.next());
};

describe('createRng', () => {
  it('gives the same sequence for the same seed and a different one for another seed', () => {
    expect(draw(42, 20)).toEqual(draw(42, 20));
    expect(draw(42, 20)).not.toEqual(draw(43, 20));
  });

  it('keeps next() in [0, 1) and range(a, b) in [a, b)', () => {
    const rng = createRng(7);
    for (let i = 0; i < 5000; i += 1) {
      const u = rng.next();
      expect(u >= 0 && u < 1).toBe(true);
      const r = rng.range(-2, 3);
      expect(r >= -2 && r < 3).toBe(true);
    }
  });

  it('draws normal values whose sample mean and standard deviation match the parameters', () => {
    const rng = createRng(11);
    const xs = Array.from({ length: 40000 }, () => rng.normal(5, 2));
    const mean = xs.reduce((a, b) => a + b, 0) / xs.length;
    const sd = Math.sqrt(xs.reduce((a, b) => a + (b - mean) ** 2, 0) / (xs.length - 1));
    // Standard error of the mean is 2 / √40000 = 0.01, so one decimal is a safe margin.
    expect(mean).toBeCloseTo(5, 1);
    expect(sd).toBeCloseTo(2, 1);
  });

  it('lands chance(0.3) true about 30 % of the time, never for 0 and always for 1', () => {
    const rng = createRng(3);
    let hits = 0;
    for (let i = 0; i < 20000; i += 1) if (rng.chance(0.3)) hits += 1;
    expect(hits / 20000).toBeCloseTo(0.3, 1);
    expect(Array.from({ length: 100 }, () => rng.chance(0)).some(Boolean)).toBe(false);
    expect(Array.from({ length: 100 }, () => rng.chance(1)).every(Boolean)).toBe(true);
  });

  it('picks every item of a list eventually and refuses an empty list', () => {
    const rng = createRng(5);
    const seen = new Set(Array.from({ length: 200 }, () => rng.pick(['a', 'b', 'c'])));
    expect([...seen].sort()).toEqual(['a', 'b', 'c']);
    expect(() => rng.pick([])).toThrow(RangeError);
  });
});

describe('forkRng', () => {
  it('gives a stream that differs from the seed’s main stream and from other forks', () => {
    const main = draw(9, 5);
    const a = forkRng(9, 1);
    const b = forkRng(9, 2);
    const fa = Array.from({ length: 5 }, () => a.next());
    const fb = Array.from({ length: 5 }, () => b.next());
    expect(fa).not.toEqual(main);
    expect(fa).not.toEqual(fb);
  });
});
