import { median, quantile } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import type { ReviewCycle } from '../../schemas/cycle';
import { csvField, cyclesCsv, reviewCycles, type ReviewRecording } from './review';

const R1 = '00000000-0000-4000-8000-000000000001';
const R2 = '00000000-0000-4000-8000-000000000002';
const recordings: ReviewRecording[] = [
  { recordingId: R2, startedAt: '2025-03-15T14:40:00.000Z', event: 'Lakeshore District Event', matchType: 'qualification', matchNumber: 7, operatorName: 'Tomas Reyes', totalPoints: 20 },
  { recordingId: R1, startedAt: '2025-03-14T14:40:00.000Z', event: 'Lakeshore District Event', matchType: 'qualification', matchNumber: 1, operatorName: 'Tomas Reyes', totalPoints: 31 },
];
const cycle = (recordingId: string, index: number, patch: Partial<ReviewCycle>): ReviewCycle => ({
  recordingId,
  recordingStartedAt: recordingId === R1 ? recordings[1]!.startedAt : recordings[0]!.startedAt,
  event: 'Lakeshore District Event',
  matchType: 'qualification',
  matchNumber: recordingId === R1 ? 1 : 7,
  operatorName: 'Tomas Reyes',
  index,
  piece: 'coral',
  phase: 'teleop',
  startS: index * 6,
  durationS: 6,
  level: 'L4',
  face: 'A/B',
  station: 'left',
  outcome: 'scored',
  points: 5,
  callToPlaceS: 2,
  ...patch,
});
const cycles: ReviewCycle[] = [
  cycle(R1, 0, { durationS: 3, phase: 'auto', points: 7 }),
  cycle(R1, 1, { durationS: 14, level: 'L2', face: 'E/F', points: 3 }),
  cycle(R1, 2, { durationS: 5, level: 'L1', outcome: 'missed', points: 0, station: 'right' }),
  cycle(R1, 3, { piece: 'algae', durationS: 4, level: null, face: null, station: 'reef', points: 6 }),
  cycle(R2, 0, { durationS: 8, operatorName: 'Tomas Reyes' }),
  cycle(R2, 1, { durationS: 2, outcome: 'dropped', points: 0, face: null }),
];

describe('reviewCycles', () => {
  const review = reviewCycles(recordings, cycles, { events: ['Lakeshore District Event'], operators: ['Tomas Reyes'] });

  it('lists matches oldest first with their own cycle time and points', () => {
    expect(review.matches.map((m) => [m.matchNumber, m.cycleCount, m.cycleTime.count, m.cycleTime.medianS, m.points])).toEqual([
      [1, 4, 4, 4.5, 31],
      [7, 2, 1, 8, 20],
    ]);
  });

  it('takes cycle times over place attempts only, checked against simple-statistics', () => {
    const attempts = [3, 14, 5, 4, 8];
    expect(review.cycleCount).toBe(6);
    expect(review.cycleTime.count).toBe(5);
    // simple-statistics 7.12: median and quantile (R type 7).
    expect(review.cycleTime.medianS).toBeCloseTo(median(attempts), 12);
    expect(review.cycleTime.p90S).toBeCloseTo(quantile(attempts, 0.9), 12);
  });

  it('breaks coral cycles down by level in level order and by face, unknown last', () => {
    expect(review.byLevel.map((g) => [g.key, g.cycleCount, g.scored, g.missed, g.points])).toEqual([
      ['L1', 1, 0, 1, 0],
      ['L2', 1, 1, 0, 3],
      ['L4', 3, 2, 0, 12],
    ]);
    expect(review.byFace.map((g) => [g.key, g.cycleCount])).toEqual([
      ['A/B', 3],
      ['E/F', 1],
      [null, 1],
    ]);
  });

  it('breaks every cycle down by station and operator', () => {
    expect(review.byStation.map((g) => [g.key, g.cycleCount])).toEqual([
      ['left', 4],
      ['reef', 1],
      ['right', 1],
    ]);
    expect(review.byOperator).toHaveLength(1);
    expect(review.byOperator[0]).toMatchObject({ key: 'Tomas Reyes', cycleCount: 6, scored: 4, missed: 1 });
  });

  it('lists the slowest place attempts, slowest first, without drops', () => {
    expect(review.slowest.map((c) => [c.matchNumber, c.index, c.durationS])).toEqual([
      [1, 1, 14],
      [7, 0, 8],
      [1, 2, 5],
      [1, 3, 4],
      [1, 0, 3],
    ]);
  });

  it('answers an empty review for no recordings', () => {
    const empty = reviewCycles([], [], { events: [], operators: [] });
    expect(empty).toMatchObject({ recordingCount: 0, cycleCount: 0, matches: [], byLevel: [], slowest: [] });
    expect(empty.cycleTime.medianS).toBeNull();
  });
});

describe('csvField', () => {
  // RFC 4180 §2: fields with commas, quotes or line breaks are quoted, and a quote inside is doubled.
  it.each([
    ['plain', 'plain'],
    ['a,b', '"a,b"'],
    ['say "L4"', '"say ""L4"""'],
    ['two\nlines', '"two\nlines"'],
    ['=SUM(A1)', "'=SUM(A1)"],
    [null, ''],
    [4.5, '4.5'],
  ])('writes %j as %j', (value, out) => {
    expect(csvField(value)).toBe(out);
  });
});

describe('cyclesCsv', () => {
  it('writes a header and one CRLF line per cycle', () => {
    const csv = cyclesCsv([cycle(R1, 0, { durationS: 3.14159, event: 'Lakeshore District Event, day 1' })]);
    const lines = csv.split('\r\n');
    expect(lines[0]).toBe(
      'recording_id,recording_started_at,event,match_type,match_number,operator,cycle,piece,phase,start_s,duration_s,level,face,station,outcome,points,call_to_place_s',
    );
    expect(lines[1]).toBe(`${R1},2025-03-14T14:40:00.000Z,"Lakeshore District Event, day 1",qualification,1,Tomas Reyes,1,coral,teleop,0,3.142,L4,A/B,left,scored,5,2`);
    expect(lines).toHaveLength(3);
    expect(lines[2]).toBe('');
  });
});
