import { describe, expect, it } from 'vitest';
import type { Signal } from '../../../../shared/protocol/messages';
import type { RecordingEvent } from '../../../../shared/schemas/recording';
import { calledTarget, eventMarks, formatCursor, formatSignalValue, markAtOrBefore, placesReached, signalTree } from './replay-view';

const ev = (seq: number, tS: number, kind: string, data: RecordingEvent['data'] = null): RecordingEvent => ({ seq, tS, kind, data });
const sig = (index: number, name: string, type: Signal['type'] = 'number', unit = ''): Signal => ({ index, name, type, unit });

describe('eventMarks', () => {
  it('labels each kind of event in words', () => {
    const marks = eventMarks([
      ev(1, 0.5, 'selection', { channel: 'op/target/branch', value: 'C' }),
      ev(2, 0.6, 'target_changed', { branch: 'C', level: 'L4', station: null, algae: 'none', cage: null }),
      ev(3, 1, 'mode_changed', { from: 'disabled', to: 'auto' }),
      ev(4, 2, 'acquired', { piece: 'coral', station: 'left' }),
      ev(5, 2.5, 'acquired', { piece: 'algae' }),
      ev(6, 3, 'placed', { branch: 'C', level: 'L4' }),
      ev(7, 4, 'algae_scored', { where: 'processor' }),
      ev(8, 5, 'missed', { branch: 'D', level: 'L2' }),
      ev(9, 6, 'brownout', { voltageV: 6.8 }),
      ev(10, 7, 'cage_climb_started'),
    ]);
    expect(marks.map((m) => [m.kind, m.label])).toEqual([
      ['call', 'Operator chose C on target/branch'],
      ['call', 'Target now C L4'],
      ['mode', 'Mode disabled → auto'],
      ['acquire', 'Acquired coral at left'],
      ['acquire', 'Acquired algae'],
      ['place', 'Placed on C L4'],
      ['place', 'Algae scored in the processor'],
      ['miss', 'Missed D L2'],
      ['fault', 'Brownout at 6.8 V'],
      ['other', 'cage climb started'],
    ]);
  });

  it('says "none" for a target with no parts and leaves acknowledgements out', () => {
    const marks = eventMarks([ev(1, 1, 'ack', { msgId: 3 }), ev(2, 2, 'target_changed', { branch: 'none', level: null })]);
    expect(marks).toEqual([{ seq: 2, tS: 2, kind: 'call', label: 'Target now none' }]);
  });

  it('orders by time, then by sequence number', () => {
    const marks = eventMarks([ev(5, 3, 'placed', { branch: 'A', level: 'L1' }), ev(9, 1, 'mode_changed', { from: 'auto', to: 'teleop' }), ev(2, 3, 'missed', { branch: 'B', level: 'L1' })]);
    expect(marks.map((m) => m.seq)).toEqual([9, 2, 5]);
  });
});

describe('markAtOrBefore', () => {
  const marks = eventMarks([ev(1, 1, 'placed', { branch: 'A', level: 'L1' }), ev(2, 4, 'placed', { branch: 'B', level: 'L2' })]);
  it('finds the latest mark at or before the cursor', () => {
    expect(markAtOrBefore(marks, 0.99)).toBeNull();
    expect(markAtOrBefore(marks, 1)?.seq).toBe(1);
    expect(markAtOrBefore(marks, 3.99)?.seq).toBe(1);
    expect(markAtOrBefore(marks, 4)?.seq).toBe(2);
    expect(markAtOrBefore(marks, 100)?.seq).toBe(2);
  });
});

describe('calledTarget and placesReached', () => {
  const events = [
    ev(1, 2, 'target_changed', { branch: 'C', level: 'L4' }),
    ev(2, 5, 'placed', { branch: 'C', level: 'L4' }),
    ev(3, 6, 'target_changed', { branch: 'F', level: null }),
    ev(4, 8, 'acquired', { piece: 'coral' }),
    ev(5, 9, 'target_changed', { level: 'L2' }),
    ev(6, 11, 'placed', { branch: 'F', level: 'L3' }),
  ];

  it('calls the branch and level of the last target change at or before the cursor', () => {
    expect(calledTarget(events, 1.9)).toBeNull();
    expect(calledTarget(events, 2)).toEqual({ branch: 'C', level: 'L4' });
    expect(calledTarget(events, 5.5)).toEqual({ branch: 'C', level: 'L4' });
    expect(calledTarget(events, 6)).toEqual({ branch: 'F', level: null });
    expect(calledTarget(events, 8.5)).toEqual({ branch: 'F', level: null });
  });

  it('calls nothing once the last change names no branch', () => {
    expect(calledTarget(events, 9)).toBeNull();
    expect(calledTarget(events, 20)).toBeNull();
  });

  it('lists the places reached so far, oldest first', () => {
    expect(placesReached(events, 4.9)).toEqual([]);
    expect(placesReached(events, 5)).toEqual([{ seq: 2, branch: 'C', level: 'L4' }]);
    expect(placesReached(events, 11)).toEqual([
      { seq: 2, branch: 'C', level: 'L4' },
      { seq: 6, branch: 'F', level: 'L3' },
    ]);
  });
});

describe('signalTree', () => {
  const signals = [
    sig(0, 'battery/voltage', 'number', 'V'),
    sig(1, 'drive/pose/x', 'number', 'm'),
    sig(2, 'drive/pose/y', 'number', 'm'),
    sig(3, 'drive/speed', 'number', 'm/s'),
    sig(4, 'uptime', 'number', 's'),
  ];
  const names = (ss: Signal[]) => ss.map((s) => s.name);

  it('groups by every level of the path, in first-seen order', () => {
    const root = signalTree(signals, '');
    expect(names(root.signals)).toEqual(['uptime']);
    expect(root.groups.map((g) => g.path)).toEqual(['battery', 'drive']);
    expect(names(root.groups[0]!.signals)).toEqual(['battery/voltage']);
    const drive = root.groups[1]!;
    expect(names(drive.signals)).toEqual(['drive/speed']);
    expect(drive.groups.map((g) => g.path)).toEqual(['drive/pose']);
    expect(names(drive.groups[0]!.signals)).toEqual(['drive/pose/x', 'drive/pose/y']);
    expect(drive.groups[0]!.groups).toEqual([]);
  });

  it('keeps only signals whose name holds every word of the search, in any case', () => {
    const root = signalTree(signals, '  POSE   x ');
    expect(root.signals).toEqual([]);
    expect(root.groups.map((g) => g.path)).toEqual(['drive']);
    expect(root.groups[0]!.signals).toEqual([]);
    expect(names(root.groups[0]!.groups[0]!.signals)).toEqual(['drive/pose/x']);
    expect(signalTree(signals, 'nothing')).toEqual({ path: '', signals: [], groups: [] });
  });
});

describe('formatSignalValue', () => {
  type Shown = Parameters<typeof formatSignalValue>[0];
  const mode: Shown = { type: 'enum', unit: '', labels: ['disabled', 'auto', 'teleop'] };
  const hasPiece: Shown = { type: 'boolean', unit: '' };

  it('shows a dash for no value', () => {
    expect(formatSignalValue(mode, null)).toBe('—');
    expect(formatSignalValue({ type: 'number', unit: 'V' }, null)).toBe('—');
  });

  it('names enum values by their label, rounding to the nearest, and shows the number past the labels', () => {
    expect(formatSignalValue(mode, 0)).toBe('disabled');
    expect(formatSignalValue(mode, 1)).toBe('auto');
    expect(formatSignalValue(mode, 1.6)).toBe('teleop');
    expect(formatSignalValue(mode, 7)).toBe('7');
    expect(formatSignalValue({ type: 'enum', unit: '' }, 2)).toBe('2');
  });

  it('reads booleans as yes or no', () => {
    expect(formatSignalValue(hasPiece, 0)).toBe('no');
    expect(formatSignalValue(hasPiece, 1)).toBe('yes');
  });

  it('gives numbers three, two or one decimals as they grow past 10 and 100, with the unit', () => {
    expect(formatSignalValue({ type: 'number', unit: 'm' }, 1.23456)).toBe('1.235 m');
    expect(formatSignalValue({ type: 'number', unit: 'V' }, 12.3456)).toBe('12.35 V');
    expect(formatSignalValue({ type: 'number', unit: 'V' }, -15)).toBe('-15.00 V');
    expect(formatSignalValue({ type: 'number', unit: 'rpm' }, 4321.06)).toBe('4321.1 rpm');
    expect(formatSignalValue({ type: 'number', unit: '' }, 0.5)).toBe('0.500');
  });
});

describe('formatCursor', () => {
  it('shows seconds and the match clock', () => {
    expect(formatCursor(0)).toEqual({ seconds: '0.00 s', clock: '0:00.0' });
    expect(formatCursor(5)).toEqual({ seconds: '5.00 s', clock: '0:05.0' });
    expect(formatCursor(93.2)).toEqual({ seconds: '93.20 s', clock: '1:33.2' });
    expect(formatCursor(150)).toEqual({ seconds: '150.00 s', clock: '2:30.0' });
  });
});
