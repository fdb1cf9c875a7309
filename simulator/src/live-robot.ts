// The simulator as a live robot: the 50 Hz loop that drives the model on a match clock, acts on the
// operator's op/ values (acknowledging each one it applies) and streams telemetry and events to the relay.
import { OP_CHANNEL_NAMES, ROBOT_CHANNELS } from '../../shared/domain/channels';
import type { SeasonProfile, Alliance } from '../../shared/domain/season/season-profile';
import type { RobotProfile } from '../../shared/schemas/robot-profile';
import type { ChannelValue } from '../../shared/protocol/messages';
import { createOperatorScript } from './operator-script';
import { createRobotModel, type RobotModel } from './robot-model';
import { RobotClient } from './robot-client';
import { SIM_SIGNALS } from './signals';
import { simTargets } from './field-targets';

export const TICK_MS = 20;
const BATCH_TICKS = 5;

/** One match after another: a short wait disabled, auto, teleop, then a pause (seconds). */
export const MATCH_CYCLE = { preS: 5, autoS: 15, teleopS: 135, postS: 10 } as const;

export interface LiveRobotOptions {
  url: string;
  key: string;
  name: string;
  season: SeasonProfile;
  robot: RobotProfile;
  alliance: Alliance;
  seed: number;
  /** With no human tap for this long, the scripted operator takes over (teleop only); 0 disables it. */
  autopilotAfterS?: number;
  log?: (line: string) => void;
}

export interface LiveRobot {
  readonly client: RobotClient;
  readonly model: RobotModel;
  stop(): void;
}

type Phase = 'pre' | 'auto' | 'teleop' | 'post';

function phaseAt(tS: number): { phase: Phase; matchTimeS: number } {
  const { preS, autoS, teleopS, postS } = MATCH_CYCLE;
  const t = tS % (preS + autoS + teleopS + postS);
  if (t < preS) return { phase: 'pre', matchTimeS: 0 };
  if (t < preS + autoS) return { phase: 'auto', matchTimeS: t - preS };
  if (t < preS + autoS + teleopS) return { phase: 'teleop', matchTimeS: t - preS };
  return { phase: 'post', matchTimeS: autoS + teleopS };
}

export function startLiveRobot(options: LiveRobotOptions): LiveRobot {
  const log = options.log ?? (() => {});
  const autopilotAfterMs = (options.autopilotAfterS ?? 20) * 1000;
  let model = createRobotModel({ season: options.season, robot: options.robot, alliance: options.alliance, seed: options.seed });
  let script = createOperatorScript({ seed: options.seed, season: options.season });
  let lastHumanTapMs = -Infinity;
  let matchNumber = 0;
  let published: Record<string, string> = {};

  const client = new RobotClient({
    url: options.url,
    key: options.key,
    name: options.name,
    reads: OP_CHANNEL_NAMES,
    onStatus: (status, detail) => log(`relay link ${status}: ${detail}`),
    onValue: (channel, value, rev, retained) => {
      if (!channel.startsWith('op/')) return;
      if (model.applyOp(channel, value)) {
        client.ack(channel, rev);
        if (!retained) lastHumanTapMs = Date.now();
      }
    },
  });
  const publishIfChanged = (channel: string, value: ChannelValue) => {
    const json = JSON.stringify(value);
    if (published[channel] === json) return;
    if (client.publish(channel, value)) published[channel] = json;
  };

  client.start();
  const startedMs = Date.now();
  // Robot time is the clock the robot client syncs with the relay (RFC 5905), so the relay can map it.
  const robotEpochMs = performance.timeOrigin + performance.now();
  let ticks = 0;
  let rows: Float32Array[] = [];
  let batchT0Ms = 0;
  let lastPhase: Phase | undefined;
  let wasOpen = false;

  const targetsOf = () => simTargets(options.season, options.robot, options.alliance, 2);
  let targets = targetsOf();

  function tick(): void {
    const robotMs = robotEpochMs + ticks * TICK_MS;
    const { phase, matchTimeS } = phaseAt((ticks * TICK_MS) / 1000);
    if (phase !== lastPhase) {
      if (phase === 'pre') {
        matchNumber += 1;
        model = createRobotModel({ season: options.season, robot: options.robot, alliance: options.alliance, seed: options.seed + matchNumber });
        script = createOperatorScript({ seed: options.seed + matchNumber, season: options.season });
        targets = targetsOf();
        log(`match ${matchNumber}: waiting ${MATCH_CYCLE.preS} s, then auto`);
      }
      lastPhase = phase;
    }
    const mode = phase === 'auto' ? 'auto' : phase === 'teleop' ? 'teleop' : 'disabled';
    const humanRecently = Date.now() - lastHumanTapMs < autopilotAfterMs;
    if (mode === 'auto' || (mode === 'teleop' && !humanRecently && autopilotAfterMs > 0)) {
      const writes = script.decide({ matchTimeS, mode, state: model.stateName, holding: model.holding, selection: model.selection });
      for (const w of writes) model.applyOp(w.channel, w.value);
    }
    model.setMode(mode);
    for (const event of model.step(ticks === 0 ? 0 : TICK_MS / 1000)) client.sendEvent(event.kind, robotMs, event.data);
    if (rows.length === 0) batchT0Ms = robotMs;
    rows.push(model.sample());
    if (rows.length === BATCH_TICKS) {
      client.sendTelemetry(rows, batchT0Ms, TICK_MS);
      rows = [];
    }
    if (client.status === 'open') {
      if (!wasOpen) published = {};
      publishIfChanged(ROBOT_CHANNELS.simulated, true);
      publishIfChanged(ROBOT_CHANNELS.mode, mode);
      publishIfChanged(ROBOT_CHANNELS.state, model.stateName);
      const t = model.target;
      const pose = t.branch ? targets.branches[t.branch].scoring : undefined;
      publishIfChanged(ROBOT_CHANNELS.target, {
        branch: t.branch ?? null,
        level: t.level ?? null,
        station: t.station ?? null,
        ...(pose ? { xM: round(pose.xM), yM: round(pose.yM), headingDeg: round(pose.headingDeg) } : {}),
        autopilot: mode === 'auto' || !humanRecently,
      });
    }
    wasOpen = client.status === 'open';
    ticks += 1;
  }

  client.declareSignals(SIM_SIGNALS);
  // Catch up by wall-clock time so the loop keeps 50 Hz on average even when a timer fires late.
  const timer = setInterval(() => {
    const due = Math.floor((Date.now() - startedMs) / TICK_MS);
    for (let n = 0; ticks <= due && n < 10; n += 1) tick();
  }, TICK_MS);

  return {
    client,
    get model() {
      return model;
    },
    stop() {
      clearInterval(timer);
      client.stop();
    },
  };
}

const round = (v: number) => Math.round(v * 1000) / 1000;
