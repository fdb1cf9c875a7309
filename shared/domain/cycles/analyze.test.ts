import { describe, expect, it } from 'vitest';
import type { ChannelValue } from '../../protocol/messages';
import type { Cycle } from '../../schemas/cycle';
import { season2025 } from '../season/season-2025';
import { analyzeCycles, faceOfBranch, splitBySpeed, type CycleEvent } from './analyze';
import { matchSummary } from './summary';

const ev = (tS: number, kind: string, data: Record<string, ChannelValue> | null = null): CycleEvent => ({ tS, kind, data });
const sel = (tS: number, channel: string, value: string) => ev(tS, 'selection', { channel, value, by: { name: 'Tomas Reyes', role: 'operator' } });
const mode = (tS: number, from: string, to: string) => ev(tS, 'mode_changed', { from, to });
const noTarget = { branch: null, level: null, algae: null };
const noSegments = { travelS: null, alignS: null, placeS: null };

/** A whole hand-built match: preload in auto, a cycle across the auto/teleop boundary, a miss, an algae cycle,
 * two pickups without a place, a dropped piece and a piece still held at the end. */
const MATCH: CycleEvent[] = [
  sel(0, 'op/reef/branch', 'C'),
  sel(0, 'op/reef/level', 'L4'),
  mode(0, 'disabled', 'auto'),
  ev(0.5, 'leave', {}),
  ev(3, 'placed', { branch: 'C', level: 'L4', phase: 'auto' }),
  ev(6, 'acquired', { piece: 'coral', station: 'left' }),
  sel(7, 'op/reef/branch', 'F'),
  sel(7, 'op/reef/level', 'L2'),
  mode(15, 'auto', 'teleop'),
  ev(17, 'placed', { branch: 'F', level: 'L2', phase: 'teleop' }),
  ev(18, 'acquired', { piece: 'coral', station: 'right' }),
  sel(20, 'op/reef/branch', 'A'),
  sel(20, 'op/reef/level', 'L1'),
  sel(21, 'op/algae', 'processor'),
  ev(22, 'missed', { branch: 'A', level: 'L1', phase: 'teleop' }),
  ev(23, 'acquired', { piece: 'algae', station: 'reef' }),
  ev(26, 'algae_scored', { where: 'processor', phase: 'teleop' }),
  ev(27, 'acquired', { piece: 'coral', station: 'left' }),
  ev(29, 'acquired', { piece: 'coral', station: 'left' }),
  sel(31, 'op/reef/branch', 'B'),
  sel(31, 'op/reef/level', 'L3'),
  ev(33, 'dropped', { piece: 'coral' }),
  ev(35, 'acquired', { piece: 'coral', station: 'right' }),
  ev(140, 'cage', { kind: 'deep', failed: null }),
  mode(150, 'teleop', 'disabled'),
];

const EXPECTED: Cycle[] = [
  {
    index: 0, piece: 'coral', phase: 'auto', crossesPhase: false, isPreload: true,
    startS: 0, acquiredS: 0, alignStartS: null, placeStartS: null, endS: 3, durationS: 3,
    segments: { acquireS: 0, ...noSegments },
    called: { branch: 'C', level: 'L4', algae: null }, calledAtS: 0,
    reached: { branch: 'C', level: 'L4', algae: null }, isOnTarget: true,
    level: 'L4', face: 'C/D', station: null, outcome: 'scored', endedBy: 'placed', points: 7, callToPlaceS: 3,
  },
  {
    index: 1, piece: 'coral', phase: 'teleop', crossesPhase: true, isPreload: false,
    startS: 3, acquiredS: 6, alignStartS: null, placeStartS: null, endS: 17, durationS: 14,
    segments: { acquireS: 3, ...noSegments },
    called: { branch: 'F', level: 'L2', algae: null }, calledAtS: 7,
    reached: { branch: 'F', level: 'L2', algae: null }, isOnTarget: true,
    level: 'L2', face: 'E/F', station: 'left', outcome: 'scored', endedBy: 'placed', points: 3, callToPlaceS: 10,
  },
  {
    index: 2, piece: 'coral', phase: 'teleop', crossesPhase: false, isPreload: false,
    startS: 17, acquiredS: 18, alignStartS: null, placeStartS: null, endS: 22, durationS: 5,
    segments: { acquireS: 1, ...noSegments },
    called: { branch: 'A', level: 'L1', algae: null }, calledAtS: 20,
    reached: { branch: 'A', level: 'L1', algae: null }, isOnTarget: true,
    level: 'L1', face: 'A/B', station: 'right', outcome: 'missed', endedBy: 'missed', points: 0, callToPlaceS: 2,
  },
  {
    index: 3, piece: 'algae', phase: 'teleop', crossesPhase: false, isPreload: false,
    startS: 22, acquiredS: 23, alignStartS: null, placeStartS: null, endS: 26, durationS: 4,
    segments: { acquireS: 1, ...noSegments },
    called: { ...noTarget, algae: 'processor' }, calledAtS: 21,
    reached: { ...noTarget, algae: 'processor' }, isOnTarget: true,
    level: null, face: null, station: 'reef', outcome: 'scored', endedBy: 'algae_scored', points: 6, callToPlaceS: 5,
  },
  {
    index: 4, piece: 'coral', phase: 'teleop', crossesPhase: false, isPreload: false,
    startS: 26, acquiredS: 27, alignStartS: null, placeStartS: null, endS: 29, durationS: 3,
    segments: { acquireS: 1, ...noSegments },
    called: { branch: 'A', level: 'L1', algae: null }, calledAtS: 20,
    reached: noTarget, isOnTarget: null,
    level: 'L1', face: null, station: 'left', outcome: 'dropped', endedBy: 'reacquired', points: 0, callToPlaceS: null,
  },
  {
    index: 5, piece: 'coral', phase: 'teleop', crossesPhase: false, isPreload: false,
    startS: 29, acquiredS: 29, alignStartS: null, placeStartS: null, endS: 33, durationS: 4,
    segments: { acquireS: 0, ...noSegments },
    called: { branch: 'B', level: 'L3', algae: null }, calledAtS: 31,
    reached: noTarget, isOnTarget: null,
    level: 'L3', face: null, station: 'left', outcome: 'dropped', endedBy: 'dropped', points: 0, callToPlaceS: null,
  },
  {
    index: 6, piece: 'coral', phase: 'teleop', crossesPhase: false, isPreload: false,
    startS: 33, acquiredS: 35, alignStartS: null, placeStartS: null, endS: 150, durationS: 117,
    segments: { acquireS: 2, ...noSegments },
    called: { branch: 'B', level: 'L3', algae: null }, calledAtS: 31,
    reached: noTarget, isOnTarget: null,
    level: 'L3', face: null, station: 'right', outcome: 'unfinished', endedBy: 'disabled', points: 0, callToPlaceS: null,
  },
];

describe('analyzeCycles', () => {
  it('splits a hand-built match into its cycles, written out in full', () => {
    expect(analyzeCycles(season2025, { events: MATCH, durationS: 152 })).toEqual(EXPECTED);
  });

  it('finds no cycles in a match without pickups or places', () => {
    const events = [mode(0, 'disabled', 'auto'), ev(0.4, 'leave', {}), mode(15, 'auto', 'teleop'), ev(140, 'cage', { kind: 'park', failed: null }), mode(150, 'teleop', 'disabled')];
    expect(analyzeCycles(season2025, { events, durationS: 151 })).toEqual([]);
  });

  it('keeps a cycle open through a pause between auto and teleop, and ends a held piece at the recording end', () => {
    const events = [
      mode(0, 'disabled', 'auto'),
      ev(2, 'acquired', { piece: 'coral', station: 'right' }),
      mode(15, 'auto', 'disabled'),
      mode(16, 'disabled', 'teleop'),
      ev(19, 'placed', { branch: 'L', level: 'L3', phase: 'teleop' }),
      ev(22, 'acquired', { piece: 'coral', station: 'right' }),
    ];
    const cycles = analyzeCycles(season2025, { events, durationS: 40 });
    expect(cycles.map((c) => [c.startS, c.acquiredS, c.endS, c.phase, c.crossesPhase, c.outcome, c.endedBy, c.points, c.face])).toEqual([
      [0, 2, 19, 'teleop', true, 'scored', 'placed', 4, 'K/L'],
      [19, 22, 40, 'teleop', false, 'unfinished', 'recording_end', 0, null],
    ]);
  });

  it('ends a piece held after auto alone when the robot stays disabled', () => {
    const events = [mode(0, 'disabled', 'auto'), ev(5, 'acquired', { piece: 'coral', station: 'left' }), mode(15, 'auto', 'disabled')];
    const [only] = analyzeCycles(season2025, { events, durationS: 20 });
    expect(only).toMatchObject({ startS: 0, acquiredS: 5, endS: 15, phase: 'auto', outcome: 'unfinished', endedBy: 'disabled' });
  });

  it('marks a place on another target than the one called as off target', () => {
    const events = [
      mode(0, 'disabled', 'teleop'),
      sel(1, 'op/reef/branch', 'D'),
      sel(1, 'op/reef/level', 'L4'),
      ev(2, 'acquired', { piece: 'coral', station: 'left' }),
      ev(6, 'placed', { branch: 'E', level: 'L4', phase: 'teleop' }),
    ];
    const [only] = analyzeCycles(season2025, { events, durationS: 10 });
    expect(only).toMatchObject({ called: { branch: 'D', level: 'L4' }, reached: { branch: 'E', level: 'L4' }, isOnTarget: false, face: 'E/F', points: 5, callToPlaceS: 5 });
  });

  it('splits travel, align and place by the drive speed', () => {
    // Half-second samples: drives off at 1 s, fast until 2.5 s, lines up slowly, stands still from 4 s to the place at 5 s.
    const speed = { tS: [0, 0.5, 1, 1.5, 2, 2.5, 3, 3.5, 4, 4.5, 5], values: [0, 0, 0.5, 3, 4, 3, 1.2, 0.8, 0.05, 0, 0] };
    const events = [mode(0, 'disabled', 'teleop'), ev(1, 'acquired', { piece: 'coral', station: 'left' }), ev(5, 'placed', { branch: 'A', level: 'L2' })];
    const [only] = analyzeCycles(season2025, { events, durationS: 6, speed });
    expect(only).toMatchObject({ acquiredS: 1, alignStartS: 3, placeStartS: 4, endS: 5, segments: { acquireS: 1, travelS: 2, alignS: 1, placeS: 1 } });
  });
});

describe('splitBySpeed', () => {
  const options = { alignSpeedMps: 1.5, settleSpeedMps: 0.1 };
  it('gives everything to travel when no sample falls inside the cycle', () => {
    expect(splitBySpeed({ tS: [0, 1], values: [0, 0] }, 3, 5, options)).toEqual({ alignStartS: 5, placeStartS: 5 });
  });
  it('gives everything to place when the robot never moved', () => {
    expect(splitBySpeed({ tS: [0, 1, 2, 3], values: [0, 0, 0, 0] }, 1, 3, options)).toEqual({ alignStartS: 1, placeStartS: 1 });
  });
  it('has no place stretch when the robot still moves at the end', () => {
    expect(splitBySpeed({ tS: [0, 1, 2, 3], values: [4, 4, 1, 0.5] }, 0, 3, options)).toEqual({ alignStartS: 2, placeStartS: 3 });
  });
});

describe('faceOfBranch', () => {
  it.each([
    ['A', 'A/B'],
    ['D', 'C/D'],
    ['L', 'K/L'],
    [null, null],
    ['Z', null],
  ])('names the face of branch %s as %s', (branch, face) => {
    expect(faceOfBranch(season2025, branch)).toBe(face);
  });
});

describe('matchSummary', () => {
  const cycles = analyzeCycles(season2025, { events: MATCH, durationS: 152 });
  const summary = matchSummary(season2025, MATCH, cycles);

  it('adds up points by category and phase from the season table', () => {
    // Hand arithmetic with the season table (from memory, [GM] table 6-2): leave 3; auto L4 7; teleop L2 3; the
    // miss 0; processor 6; deep cage 12.
    expect(summary.points).toEqual({
      total: 31,
      byPhase: { auto: 10, teleop: 21 },
      byCategory: { leave: 3, coral: 10, algae: 6, barge: 12 },
      byCategoryAndPhase: { auto: { leave: 3, coral: 7, algae: 0, barge: 0 }, teleop: { leave: 0, coral: 3, algae: 6, barge: 12 } },
      coralByLevel: { L1: 0, L2: 3, L3: 0, L4: 7 },
      coralCountByLevel: { L1: 0, L2: 1, L3: 0, L4: 1 },
    });
  });

  it('counts cycles and outcomes, with cycle time over place attempts only', () => {
    expect(summary.cycleCount).toBe(7);
    expect(summary.outcomes).toEqual({ scored: 3, missed: 1, dropped: 2, unfinished: 1 });
    // Attempts last 3, 14, 5 and 4 s: median (4 + 5) / 2 = 4.5; p90 at rank 0.9·3 = 2.7 → 5 + 0.7·(14 − 5) = 11.3.
    expect(summary.cycleTime.count).toBe(4);
    expect(summary.cycleTime.medianS).toBeCloseTo(4.5, 10);
    expect(summary.cycleTime.p90S).toBeCloseTo(11.3, 10);
    expect(summary.cycleTime.meanS).toBeCloseTo(6.5, 10);
    expect(summary.callToPlace.medianS).toBeCloseTo(4, 10);
  });

  it('shows ranking-point progress from this robot alone, with the rules marked from memory where they are', () => {
    const rp = summary.rankingPoints;
    expect(rp.barge).toMatchObject({ points: 12, pointsNeeded: 14, isEarned: false, fromMemory: true });
    expect(rp.auto).toMatchObject({ leaves: 1, leavesNeeded: 3, autoCoral: 1, isEarned: false, fromMemory: true });
    expect(rp.coral).toMatchObject({ levelsMet: [], levelsNeeded: 4, neededPerLevel: 5, isEarned: false, fromMemory: false });
    expect(rp.bonusRankingPoints).toBe(0);
  });

  it('gives a match with no cycles zero counts and no cycle time', () => {
    const events = [mode(0, 'disabled', 'auto'), mode(150, 'teleop', 'disabled')];
    const empty = matchSummary(season2025, events, []);
    expect(empty.cycleCount).toBe(0);
    expect(empty.cycleTime).toEqual({ count: 0, medianS: null, p90S: null, meanS: null });
    expect(empty.points.total).toBe(0);
  });

  it('counts only the last barge state of the match', () => {
    const events = [mode(0, 'disabled', 'teleop'), ev(130, 'cage', { kind: 'park', failed: null }), ev(140, 'cage', { kind: 'shallow', failed: null })];
    expect(matchSummary(season2025, events, []).points.byCategory.barge).toBe(6);
  });
});
