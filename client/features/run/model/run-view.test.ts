import { describe, expect, it } from 'vitest';
import { DEMO_MATCH_PANEL } from '../../../../shared/domain/panels/demo-panel';
import { PROTOCOL_VERSION, type Sender, type ServerMessage, type Signal } from '../../../../shared/protocol/messages';
import { encodeTelemetry } from '../../../../shared/protocol/telemetry-codec';
import { initialRelayState, reduceRelay, type RelayAction, type RelayState } from '../../../lib/relay-client';
import { panelLive, relayLinkView, robotLinkView, robotTargetText, robotValueLive, ROBOT_QUIET_AFTER_MS, selectionLive } from './run-view';

const ROBOT: Sender = { sessionId: 's-robot', kind: 'robot', name: 'Gullwing', role: 'robot' };
const WELCOME: ServerMessage = {
  type: 'welcome',
  v: PROTOCOL_VERSION,
  sessionId: 's-tablet',
  role: 'operator',
  teamNumber: 19850,
  serverTimeMs: 0,
  heartbeatMs: 100,
  staleMs: 400,
  maxFrameBytes: 262144,
};
const SIGNALS: Signal[] = [
  { index: 0, name: 'battery/voltage', type: 'number', unit: 'V' },
  { index: 1, name: 'intake/coral-sensor', type: 'boolean', unit: '' },
  { index: 2, name: 'match/mode', type: 'enum', unit: '', labels: ['disabled', 'auto', 'teleop'] },
  { index: 3, name: 'match/remaining', type: 'number', unit: 's' },
];
const SYS_CLIENTS = [{ sessionId: 's-robot', kind: 'robot', name: 'Gullwing', role: 'robot', principal: 'robot-key-1', connectedAtMs: 0, rttMs: 3 }];

const run = (actions: RelayAction[], from: RelayState = initialRelayState()) => actions.reduce(reduceRelay, from);
const msg = (message: ServerMessage, atMs = 0): RelayAction => ({ type: 'message', message, atMs });
const open = (): RelayAction[] => [{ type: 'status', status: 'open', detail: 'welcomed', atMs: 0 }, msg(WELCOME)];
const value = (channel: string, v: unknown, rev = 1, from: Sender = ROBOT): RelayAction =>
  msg({ type: 'value', channel, value: v as never, rev, tMs: 0, from, retained: false });
const withRobot = (atMs = 1000): RelayAction[] => [
  ...open(),
  value('sys/clients', SYS_CLIENTS),
  msg({ type: 'signals', robot: 'robot-key-1', signals: SIGNALS }),
  msg({ type: 'telemetry_batch', robot: 'robot-key-1', t0Ms: 0, dtMs: 20, offsetMs: 0, data: encodeTelemetry([[12.3, 1, 2, 97.5]], 4) } as ServerMessage, atMs),
];

describe('relayLinkView', () => {
  it.each([
    ['open', 'up', 'Relay connected'],
    ['connecting', 'connecting', 'Connecting to relay…'],
    ['reconnecting', 'down', 'Relay link lost · reconnecting'],
    ['stale', 'down', 'Relay link lost · reconnecting'],
    ['refused', 'refused', 'Relay refused this tablet'],
  ] as const)('words %s as %s', (status, state, words) => {
    expect(relayLinkView({ status, detail: '' })).toMatchObject({ state, words });
  });
});

describe('selectionLive', () => {
  it('goes pending → robot has it with the round trip measured on our clock', () => {
    let s = run([...open(), { type: 'sent', id: 1, channel: 'op/reef/branch', value: 'G', atMs: 100 }]);
    expect(selectionLive(s, 'op/reef/branch')).toEqual({ value: 'G', phase: 'pending' });
    s = run([msg({ type: 'published', id: 1, channel: 'op/reef/branch', rev: 4 }), msg({ type: 'acked', channel: 'op/reef/branch', rev: 4, relayRttMs: 5, robot: 'Gullwing' }, 137)], s);
    expect(selectionLive(s, 'op/reef/branch')).toEqual({ value: 'G', phase: 'acked', roundTripMs: 37 });
  });

  it('calls an unanswered selection stale, and lost while the link is down (it will be resent)', () => {
    let s = run([...open(), { type: 'sent', id: 1, channel: 'op/reef/level', value: 'L4', atMs: 0 }, { type: 'publish_timeout', id: 1 }]);
    expect(selectionLive(s, 'op/reef/level').phase).toBe('stale');
    s = run([{ type: 'status', status: 'reconnecting', detail: 'closed', atMs: 10 }], s);
    expect(selectionLive(s, 'op/reef/level')).toEqual({ value: 'L4', phase: 'lost' });
  });

  it('shows a tap made with no link as lost, not refused', () => {
    const s = run([{ type: 'status', status: 'reconnecting', detail: '', atMs: 0 }, { type: 'unsent', id: 2, channel: 'op/station', value: 'left', atMs: 0 }]);
    expect(selectionLive(s, 'op/station')).toEqual({ value: 'left', phase: 'lost' });
  });

  it('keeps a relay refusal as refused', () => {
    const s = run([...open(), { type: 'sent', id: 3, channel: 'op/cage', value: 'deep', atMs: 0 }, msg({ type: 'error', id: 3, code: 'forbidden', message: 'no' })]);
    expect(selectionLive(s, 'op/cage').phase).toBe('refused');
  });

  it('falls back to the retained value, acked when the robot acknowledged its revision', () => {
    const s = run([...open(), msg({ type: 'value', channel: 'op/reef/branch', value: 'C', rev: 2, ackedRev: 2, tMs: 0, from: { ...ROBOT, kind: 'panel', role: 'operator' }, retained: true })]);
    expect(selectionLive(s, 'op/reef/branch')).toEqual({ value: 'C', phase: 'acked' });
    expect(selectionLive(s, 'op/algae')).toEqual({});
  });
});

describe('robotLinkView', () => {
  it('is live with fresh telemetry, quiet after a second without, none with no robot', () => {
    const s = run(withRobot(1000));
    expect(robotLinkView(s, 1000 + ROBOT_QUIET_AFTER_MS)).toMatchObject({ state: 'live', name: 'Gullwing', isRealRobot: true, isSimulated: false });
    expect(robotLinkView(s, 1001 + ROBOT_QUIET_AFTER_MS).state).toBe('quiet');
    expect(robotLinkView(run(open()), 0)).toMatchObject({ state: 'none', words: 'No robot connected', isRealRobot: false });
  });

  it('marks a robot that publishes robot/simulated = true as the simulator, not a real robot', () => {
    const s = run([...withRobot(), value('robot/simulated', true)]);
    expect(robotLinkView(s, 1000)).toMatchObject({ isSimulated: true, isRealRobot: false });
  });
});

describe('robotValueLive', () => {
  it('reads robot/<signal> from telemetry: numbers, booleans and enum labels', () => {
    const s = run(withRobot(1000));
    expect(robotValueLive(s, 'robot/battery/voltage', 1100).value).toBeCloseTo(12.3, 5);
    expect(robotValueLive(s, 'robot/intake/coral-sensor', 1100)).toEqual({ value: true, isFresh: true });
    expect(robotValueLive(s, 'robot/match/mode', 1100).value).toBe('teleop');
    expect(robotValueLive(s, 'robot/match/remaining', 5000)).toEqual({ value: 97.5, isFresh: false });
    expect(robotValueLive(s, 'robot/nothing/here', 1100)).toEqual({});
  });

  it('prefers a retained value on the exact channel', () => {
    const s = run([...withRobot(), value('robot/match/remaining', 42)]);
    expect(robotValueLive(s, 'robot/match/remaining', 1000)).toEqual({ value: 42, isFresh: true });
  });
});

describe('panelLive', () => {
  it('resolves every channel of the demo match panel, writing allowed unless the relay refused the tablet', () => {
    const tiles = DEMO_MATCH_PANEL.pages[0]!.tiles;
    const s = run([...withRobot(), { type: 'sent', id: 1, channel: 'op/reef/branch', value: 'J', atMs: 0 }]);
    const live = panelLive(tiles, s, 1000);
    expect(live.canWrite).toBe(true);
    expect(live.channels['op/reef/branch']).toEqual({ value: 'J', phase: 'pending' });
    expect(live.channels['robot/battery/voltage']?.isFresh).toBe(true);
    expect(Object.keys(live.channels)).toEqual(expect.arrayContaining(['op/reef/level', 'op/station', 'robot/match/remaining']));
    expect(panelLive(tiles, run([{ type: 'status', status: 'refused', detail: '', atMs: 0 }]), 0).canWrite).toBe(false);
  });
});

describe('robotTargetText', () => {
  it('joins the branch and level of robot/target', () => {
    expect(robotTargetText(run([...open(), value('robot/target', { branch: 'G', level: 'L3', xM: 1 })]))).toBe('G · L3');
    expect(robotTargetText(run(open()))).toBeUndefined();
  });
});
