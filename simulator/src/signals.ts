// Pure: no I/O, clocks or randomness; imports only shared/ and sibling kernel files. The simulator's telemetry signals.
import type { Signal } from '../../shared/protocol/messages';
import { BRANCH_LETTERS } from '../../shared/domain/channels';
import { REEF_LEVELS } from '../../shared/domain/season/season-profile';
import { MATCH_MODES } from './match-clock';

/** The robot's state machine, in the order of the `state/machine` enum. */
export const MODEL_STATES = [
  'disabled',
  'idle',
  'to_station',
  'intaking',
  'to_reef',
  'aligning',
  'placing',
  'removing_algae',
  'to_processor',
  'to_net',
  'scoring_algae',
  'to_cage',
  'climbing',
  'parked',
] as const;
export type ModelState = (typeof MODEL_STATES)[number];

export const GAME_PIECES = ['none', 'coral', 'algae'] as const;
export type GamePiece = (typeof GAME_PIECES)[number];

/** Swerve modules: front-left, front-right, back-left, back-right. */
export const MODULE_NAMES = ['fl', 'fr', 'bl', 'br'] as const;
export type ModuleName = (typeof MODULE_NAMES)[number];

type Decl = Omit<Signal, 'index'>;
const num = (name: string, unit: string): Decl => ({ name, type: 'number', unit });
const flag = (name: string): Decl => ({ name, type: 'boolean', unit: '' });
const choice = (name: string, labels: readonly string[]): Decl => ({ name, type: 'enum', unit: '', labels: [...labels] });

const moduleSignals = (m: ModuleName): Decl[] => [
  num(`drive/module/${m}/speed`, 'm/s'),
  num(`drive/module/${m}/speed-setpoint`, 'm/s'),
  num(`drive/module/${m}/angle`, 'deg'),
  num(`drive/module/${m}/angle-setpoint`, 'deg'),
  num(`drive/module/${m}/drive-current`, 'A'),
  num(`drive/module/${m}/steer-current`, 'A'),
  num(`drive/module/${m}/drive-temp`, '°C'),
  num(`drive/module/${m}/steer-temp`, '°C'),
];

const DECLARATIONS: Decl[] = [
  num('drive/pose/x', 'm'),
  num('drive/pose/y', 'm'),
  num('drive/pose/heading', 'deg'),
  num('drive/velocity/vx', 'm/s'),
  num('drive/velocity/vy', 'm/s'),
  num('drive/velocity/omega', 'deg/s'),
  num('drive/speed', 'm/s'),
  num('drive/goal/x', 'm'),
  num('drive/goal/y', 'm'),
  num('drive/goal/heading', 'deg'),
  num('drive/goal/distance', 'm'),
  flag('drive/at-goal'),
  ...MODULE_NAMES.flatMap(moduleSignals),
  num('elevator/height', 'm'),
  num('elevator/velocity', 'm/s'),
  num('elevator/setpoint', 'm'),
  num('elevator/lead-current', 'A'),
  num('elevator/follow-current', 'A'),
  num('elevator/lead-temp', '°C'),
  num('elevator/follow-temp', '°C'),
  flag('elevator/at-setpoint'),
  flag('elevator/at-bottom'),
  num('wrist/angle', 'deg'),
  num('wrist/setpoint', 'deg'),
  num('wrist/current', 'A'),
  num('intake/roller-speed', 'rpm'),
  num('intake/current', 'A'),
  num('intake/temp', '°C'),
  flag('intake/coral-sensor'),
  num('algae/roller-speed', 'rpm'),
  num('algae/current', 'A'),
  flag('algae/sensor'),
  num('climber/angle', 'deg'),
  num('climber/current', 'A'),
  flag('climber/latched'),
  num('battery/voltage', 'V'),
  num('battery/current', 'A'),
  num('battery/used', 'Ah'),
  flag('battery/brownout'),
  num('gyro/yaw', 'deg'),
  num('gyro/pitch', 'deg'),
  num('gyro/roll', 'deg'),
  num('gyro/yaw-rate', 'deg/s'),
  num('vision/tags', ''),
  flag('vision/has-estimate'),
  num('vision/pose/x', 'm'),
  num('vision/pose/y', 'm'),
  num('vision/pose/heading', 'deg'),
  num('vision/latency', 'ms'),
  num('vision/error', 'm'),
  choice('state/machine', MODEL_STATES),
  num('state/time-in-state', 's'),
  num('state/cycles', ''),
  choice('game/piece', GAME_PIECES),
  num('game/coral-scored', ''),
  num('game/coral-missed', ''),
  num('game/algae-scored', ''),
  num('game/points', ''),
  choice('target/branch', BRANCH_LETTERS),
  choice('target/level', REEF_LEVELS),
  choice('target/station', ['left', 'right']),
  choice('target/algae', ['none', 'processor', 'net']),
  choice('target/cage', ['none', 'park', 'shallow', 'deep']),
  flag('target/adopted'),
  num('target/reaction', 's'),
  num('match/time', 's'),
  num('match/remaining', 's'),
  choice('match/mode', MATCH_MODES),
  flag('match/enabled'),
  flag('match/endgame'),
  num('system/can-utilisation', '%'),
  num('system/can-errors', ''),
  num('system/loop-time', 'ms'),
  num('system/cpu', '%'),
  num('system/uptime', 's'),
  num('system/brownouts', ''),
];

/** Every signal the simulator sends, index = position; telemetry rows come in this order. */
export const SIM_SIGNALS: Signal[] = DECLARATIONS.map((d, index) => ({ index, ...d }));

const INDEX_BY_NAME = new Map(SIM_SIGNALS.map((s) => [s.name, s.index]));

/** Index of a simulator signal; throws for a name that is not declared (a bug in the caller). */
export function simSignalIndex(name: string): number {
  const index = INDEX_BY_NAME.get(name);
  if (index === undefined) throw new RangeError(`no simulator signal named ${name}`);
  return index;
}

/** Index of `label` in an enum signal's labels; throws when the signal has no such label. */
export function simEnumValue(name: string, label: string): number {
  const signal = SIM_SIGNALS[simSignalIndex(name)]!;
  const value = signal.labels?.indexOf(label) ?? -1;
  if (value < 0) throw new RangeError(`signal ${name} has no label ${label}`);
  return value;
}
