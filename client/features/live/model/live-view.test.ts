import { describe, expect, it } from 'vitest';
import type { Sender, Signal } from '../../../../shared/protocol/messages';
import { initialRelayState, type ChannelEntry, type PublishTrack, type RelayState } from '../../../lib/relay-client';
import { channelAgeMs, channelRows, formatAge, formatMs, readouts, robotTarget, sendPermission, sendStatus } from './live-view';

const OPERATOR: Sender = { sessionId: 's1', kind: 'panel', name: 'Driver station tablet', role: 'operator' };
const ROBOT: Sender = { sessionId: 's2', kind: 'robot', name: 'Gullwing', role: 'robot' };

const entry = (channel: string, value: ChannelEntry['value'], extra: Partial<ChannelEntry> = {}): ChannelEntry => ({
  channel,
  value,
  rev: 2,
  tMs: 10_000,
  from: channel.startsWith('op/') ? OPERATOR : ROBOT,
  receivedAtMs: 5_000,
  ...extra,
});
const withChannels = (...entries: ChannelEntry[]): RelayState => ({
  ...initialRelayState(),
  channels: Object.fromEntries(entries.map((e) => [e.channel, e])),
});

describe('channelAgeMs', () => {
  it('uses relay time when the clock offset is known, and our receive time before', () => {
    const e = entry('op/reef/branch', 'C');
    expect(channelAgeMs(e, withChannels(e), 6_000)).toBe(1_000);
    expect(channelAgeMs(e, { ...withChannels(e), clock: { offsetMs: 4_500, delayMs: 2 } }, 6_000)).toBe(500);
  });
});

describe('formatAge', () => {
  it.each([
    [400, '0.4 s'],
    [12_300, '12 s'],
    [250_000, '4 min'],
    [7_300_000, '2 h'],
    [-40, '0.0 s'],
  ])('%i ms reads %s', (ms, text) => expect(formatAge(ms)).toBe(text));
});

describe('formatMs', () => {
  it.each([
    [3.25, '3.3 ms'],
    [23.4, '23 ms'],
    [1420, '1\u2009420 ms'],
    [undefined, '—'],
  ])('%s reads %s', (ms, text) => expect(formatMs(ms)).toBe(text));
});

describe('robotTarget', () => {
  it('reads branch, level and pose', () => {
    const s = withChannels(entry('robot/target', { branch: 'C', level: 'L4', xM: 3.9, yM: 5.1, headingDeg: -60 }));
    expect(robotTarget(s)).toEqual({ label: 'C · L4', pose: { xM: 3.9, yM: 5.1, headingDeg: -60 } });
  });

  it('keeps a label without a pose when coordinates are missing, and is undefined with no target', () => {
    expect(robotTarget(withChannels(entry('robot/target', { level: 'L2' })))).toEqual({ label: 'L2' });
    expect(robotTarget(withChannels(entry('robot/target', null)))).toBeUndefined();
    expect(robotTarget(initialRelayState())).toBeUndefined();
  });
});

describe('readouts', () => {
  const signals: Signal[] = [
    { index: 0, name: 'battery/voltage', type: 'number', unit: 'V' },
    { index: 1, name: 'state/machine', type: 'enum', unit: '', labels: ['disabled', 'to_reef'] },
  ];

  it('formats declared signals and marks the ones the robot does not send', () => {
    const rows = readouts({ robot: 'Gullwing', signals, trail: [], latest: { tMs: 0, values: { 'battery/voltage': 9.62, 'state/machine': 1 } } });
    expect(rows.map((r) => [r.label, r.text, r.unit, r.tone])).toEqual([
      ['Battery', '9.62', 'V', 'caution'],
      ['Elevator', '—', '', 'missing'],
      ['State', 'To reef', '', 'normal'],
      ['Game piece', '—', '', 'missing'],
    ]);
  });
});

describe('channelRows', () => {
  it('lists op/ channels first with ack state, then robot/ ones, and leaves sys/ out', () => {
    const s = withChannels(
      entry('robot/mode', 'teleop'),
      entry('sys/clients', []),
      entry('op/reef/level', 'L3', { ackedRev: 1 }),
      entry('op/reef/branch', 'C', { ackedRev: 2 }),
    );
    expect(channelRows(s, 6_000).map((r) => [r.channel, r.ack, r.setBy])).toEqual([
      ['op/reef/branch', 'acked', 'Driver station tablet (operator)'],
      ['op/reef/level', 'waiting', 'Driver station tablet (operator)'],
      ['robot/mode', 'none', 'Gullwing (robot)'],
    ]);
  });
});

describe('sendPermission', () => {
  it.each([
    ['lead', true],
    ['programmer', true],
    ['operator', true],
    ['coach', false],
    ['viewer', false],
  ] as const)('a %s may send targets: %s', (role, canSend) => {
    expect(sendPermission(role).canSend).toBe(canSend);
  });
});

describe('sendStatus', () => {
  const track = (extra: Partial<PublishTrack>): PublishTrack => ({ id: 1, channel: 'op/reef/branch', value: 'C', sentAtMs: 0, state: 'pending', ...extra });
  it.each([
    [track({}), 'pending', 'Sending C…'],
    [track({ state: 'acked', roundTripMs: 23.4 }), 'go', 'C: robot has it · 23 ms'],
    [track({ state: 'acked', roundTripMs: 1420, isLate: true }), 'caution', 'C: robot has it · 1\u2009420 ms (late)'],
    [track({ state: 'stale' }), 'caution', 'C: no answer from the robot yet — stale'],
    [track({ state: 'refused', refusal: { code: 'forbidden', message: 'a coach may not publish' } }), 'stop', 'C: refused — a coach may not publish'],
  ])('%#: says %s', (t, tone, text) => {
    expect(sendStatus(t)).toEqual({ tone, text });
  });
});
