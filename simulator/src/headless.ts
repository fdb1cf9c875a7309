// Pure: no I/O, clocks, timers or Math.random; imports only shared/ and sibling kernel files. A whole simulated match,
// as fast as the CPU allows, with the scripted operator: what a live robot would have sent, in sending order.
import type { OpChannel } from '../../shared/domain/channels';
import type { Signal } from '../../shared/protocol/messages';
import type { Alliance, DriverStation, SeasonProfile } from '../../shared/domain/season/season-profile';
import type { RobotProfile } from '../../shared/schemas/robot-profile';
import { matchEndsS, matchModeAt } from './match-clock';
import { createOperatorScript } from './operator-script';
import { createRobotModel, type EventValue, type ModelEventKind } from './robot-model';
import { SIM_SIGNALS } from './signals';

export interface HeadlessOptions {
  seed: number;
  season: SeasonProfile;
  robot: RobotProfile;
  alliance: Alliance;
  station?: DriverStation;
  /** Tick length, s; default 0.02 (the 50 Hz robot loop). */
  dtS?: number;
  /** Ticks per telemetry batch; default 5. */
  batchTicks?: number;
  /** Disabled time recorded after teleop, s; default 2. */
  trailingDisabledS?: number;
}

export interface HeadlessBatch {
  seq: number;
  t0Ms: number;
  dtMs: number;
  ticks: number;
  rows: Float32Array[];
}
export interface HeadlessEvent {
  seq: number;
  tMs: number;
  kind: ModelEventKind;
  data: Record<string, EventValue>;
}
export interface HeadlessSelection {
  tMs: number;
  channel: OpChannel;
  value: string;
}
export interface HeadlessMatch {
  signals: Signal[];
  batches: HeadlessBatch[];
  events: HeadlessEvent[];
  selections: HeadlessSelection[];
}

/**
 * Plays auto, teleop and a little disabled time. Robot time starts at 0 ms with auto; tick k is sampled at k·dt.
 * One `seq` counter numbers batches and events in the order a live robot sends them: an event as it happens, a
 * batch once its last tick is sampled (so a batch's seq is above those of the events inside it). Same seed, same output.
 */
export function runHeadlessMatch(options: HeadlessOptions): HeadlessMatch {
  const { seed, season, robot, alliance } = options;
  const dtS = options.dtS ?? 0.02;
  const batchTicks = options.batchTicks ?? 5;
  const dtMs = dtS * 1000;
  const model = createRobotModel({ season, robot, alliance, seed, station: options.station ?? 2 });
  const operator = createOperatorScript({ seed, season });
  const totalS = matchEndsS(season).teleopEndS + (options.trailingDisabledS ?? 2);
  const tickCount = Math.round(totalS / dtS) + 1;

  const batches: HeadlessBatch[] = [];
  const events: HeadlessEvent[] = [];
  const selections: HeadlessSelection[] = [];
  let seq = 0;
  let rows: Float32Array[] = [];
  let batchT0Ms = 0;

  for (let k = 0; k < tickCount; k += 1) {
    const tS = k * dtS;
    const tMs = Math.round(k * dtMs * 1000) / 1000;
    const writes = operator.decide({
      matchTimeS: tS,
      mode: model.mode,
      state: model.stateName,
      holding: model.holding,
      selection: model.selection,
    });
    for (const w of writes) {
      if (model.applyOp(w.channel, w.value)) selections.push({ tMs, channel: w.channel, value: w.value });
    }
    model.setMode(matchModeAt(season, tS));
    for (const e of model.step(k === 0 ? 0 : dtS)) events.push({ seq: seq++, tMs, kind: e.kind, data: e.data });
    if (rows.length === 0) batchT0Ms = tMs;
    rows.push(model.sample());
    if (rows.length === batchTicks || k === tickCount - 1) {
      batches.push({ seq: seq++, t0Ms: batchT0Ms, dtMs, ticks: rows.length, rows });
      rows = [];
    }
  }
  return { signals: SIM_SIGNALS, batches, events, selections };
}
