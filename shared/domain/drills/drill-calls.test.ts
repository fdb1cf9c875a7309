import { describe, expect, it } from 'vitest';
import { callSpeech, callText, drillCallSchema, drillTargetSetSchema, possibleCalls, randomCalls, seededRandom } from './drill-calls';

describe('seededRandom', () => {
  it('gives the same numbers for the same seed and stays in [0, 1)', () => {
    const a = seededRandom(19850);
    const b = seededRandom(19850);
    const first = Array.from({ length: 1000 }, () => a());
    expect(Array.from({ length: 1000 }, () => b())).toEqual(first);
    expect(first.every((v) => v >= 0 && v < 1)).toBe(true);
    expect(seededRandom(7)()).not.toBe(first[0]);
  });

  it('spreads values evenly over ten bins (each within 20 % of its share over 10,000 draws)', () => {
    const random = seededRandom(3);
    const bins = new Array<number>(10).fill(0);
    for (let i = 0; i < 10_000; i++) bins[Math.floor(random() * 10)]! += 1;
    for (const n of bins) expect(Math.abs(n - 1000)).toBeLessThan(200);
  });
});

describe('possibleCalls', () => {
  it('crosses branches with levels and adds stations', () => {
    expect(possibleCalls({ branches: ['D', 'C'], levels: ['L4', 'L2'], stations: ['right'] })).toEqual([
      { branch: 'C', level: 'L2' },
      { branch: 'C', level: 'L4' },
      { branch: 'D', level: 'L2' },
      { branch: 'D', level: 'L4' },
      { station: 'right' },
    ]);
  });

  it('asks for a branch alone or a level alone when only one of them is chosen', () => {
    expect(possibleCalls({ branches: ['A'], levels: [], stations: [] })).toEqual([{ branch: 'A' }]);
    expect(possibleCalls({ branches: [], levels: ['L3'], stations: [] })).toEqual([{ level: 'L3' }]);
  });
});

describe('randomCalls', () => {
  const targets = { branches: ['A', 'B', 'G', 'H'], levels: ['L2', 'L3', 'L4'], stations: ['left', 'right'] } as const;

  it('draws count calls from the set, the same for the same seed', () => {
    const calls = randomCalls({ ...targets, branches: [...targets.branches], levels: [...targets.levels], stations: [...targets.stations] }, 40, seededRandom(11));
    expect(calls).toHaveLength(40);
    const allowed = possibleCalls({ branches: [...targets.branches], levels: [...targets.levels], stations: [...targets.stations] }).map((c) => JSON.stringify(c));
    for (const c of calls) expect(allowed).toContain(JSON.stringify(c));
    expect(randomCalls({ branches: [...targets.branches], levels: [...targets.levels], stations: [...targets.stations] }, 40, seededRandom(11))).toEqual(calls);
  });

  it('never repeats the previous call when another is possible', () => {
    const calls = randomCalls({ branches: ['A', 'B'], levels: [], stations: [] }, 30, seededRandom(5));
    for (let i = 1; i < calls.length; i++) expect(calls[i]).not.toEqual(calls[i - 1]);
  });

  it('repeats the only call of a one-call set, and gives nothing for count 0', () => {
    expect(randomCalls({ branches: [], levels: ['L1'], stations: [] }, 3, seededRandom(1))).toEqual([{ level: 'L1' }, { level: 'L1' }, { level: 'L1' }]);
    expect(randomCalls({ branches: ['A'], levels: [], stations: [] }, 0, seededRandom(1))).toEqual([]);
  });

  it('mixes reef and station calls about evenly when both are chosen', () => {
    const calls = randomCalls({ branches: ['A', 'B'], levels: ['L4'], stations: ['left', 'right'] }, 2000, seededRandom(2));
    const stationShare = calls.filter((c) => c.station).length / calls.length;
    expect(stationShare).toBeGreaterThan(0.4);
    expect(stationShare).toBeLessThan(0.6);
  });
});

describe('drillCallSchema', () => {
  it.each([[{}], [{ branch: 'C', station: 'left' }], [{ branch: 'M' }], [{ level: 'L5' }], [{ branch: 'A', extra: 1 }]])('refuses %j', (call) => {
    expect(drillCallSchema.safeParse(call).success).toBe(false);
  });

  it('takes a reef target or a station', () => {
    expect(drillCallSchema.parse({ branch: 'C', level: 'L4' })).toEqual({ branch: 'C', level: 'L4' });
    expect(drillCallSchema.parse({ station: 'left' })).toEqual({ station: 'left' });
  });

  it('needs at least one target in a target set', () => {
    expect(drillTargetSetSchema.safeParse({ branches: [], levels: [], stations: [] }).success).toBe(false);
  });
});

describe('callText and callSpeech', () => {
  it.each([
    [{ branch: 'C', level: 'L4' }, 'L4 · C', 'Level 4, branch C'],
    [{ level: 'L2' }, 'L2', 'Level 2'],
    [{ branch: 'K' }, 'K', 'branch K'],
    [{ station: 'right' }, 'Right station', 'Right station'],
  ] as const)('%j reads "%s" and says "%s"', (call, text, speech) => {
    expect(callText(call)).toBe(text);
    expect(callSpeech(call)).toBe(speech);
  });
});
