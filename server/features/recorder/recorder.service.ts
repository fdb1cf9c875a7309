// The recorder: cuts each robot stream into recordings, one per match, from the robot's mode. It is the relay's
// TelemetryStore (every message is confirmed; only those inside a recording are written) and its StreamObserver
// (modes, selections, acks and connections arrive synchronously, in frame order).
//
// A recording covers a range of the stream's seqs [fromSeq, toSeq), fixed as messages arrive, so a resend after
// a reconnect lands in the recording it belonged to. Its storage key (recordings.stream_id) is
// `<streamId>:<fromSeq>`, unique per stream.
import type { ChannelValue, Sender } from '../../../shared/protocol/messages';
import type { RecorderRobot } from '../../../shared/schemas/recorder';
import type { Logger } from '../../lib/logger';
import { PgTelemetryStore } from '../../relay/pg-telemetry-store';
import type { DurableMessage, StreamObserver, StreamRef, TelemetryStore } from '../../relay/telemetry-store';
import type { RecorderRepo, RelayEvent } from './recorder.repo';
import type { RecordingKind, RecordingsService } from '../recordings/recordings.service';

export type RobotMode = 'disabled' | 'auto' | 'teleop';

/** How long a recording ended by hand waits for messages the relay had received but not yet stored. */
const FINISH_WAIT_MS = 2000;

export interface RecorderOptions {
  recordings: RecordingsService;
  repo: RecorderRepo;
  logger: Logger;
  /** A robot away longer than this ends its recording; a reconnect within it continues the same one. */
  graceMs?: number;
  /** Kept after the mode goes back to disabled at the end of teleop (robot time). */
  tailMs?: number;
  /** After auto, disabled this long without teleop ends the recording (robot time). */
  autoGapMs?: number;
  /** Between-match telemetry kept in memory and put at the front of the next recording (robot time). */
  preRollMs?: number;
  compactEveryTicks?: number;
  /** Live simulated recordings kept per team (the demo simulator plays a match every few minutes); older ones go. */
  keepLiveSimulated?: number;
}

interface Segment {
  key: string;
  fromSeq: number;
  toSeq: number | undefined;
  kind: RecordingKind;
  manual: boolean;
  sawTeleop: boolean;
  /** Set when the mode went back to disabled: the first batch from this robot time on ends the recording. */
  closeAtRobotMs: number | undefined;
  recordingId: string | undefined;
  /** Selections and acks waiting for the recording's first stored message. */
  relayEvents: RelayEvent[];
  finished: boolean;
  /** Ended now (by hand or past the grace): finish once every message up to this seq has reached the store. */
  finishAfterSeq: number | undefined;
  finishTimer: ReturnType<typeof setTimeout> | undefined;
  /** Called once the recording is finished (stopRecording waits on it). */
  onFinished: (() => void)[];
}

interface StreamState {
  ref: StreamRef;
  maxSeq: number;
  /** The highest seq the relay has handed to the store (it may hold later ones in its queue meanwhile). */
  appendedUpTo: number;
  mode: RobotMode | undefined;
  simulated: boolean;
  robotMinusServerMs: number;
  lastRobotMs: number;
  segments: Segment[];
  /** Messages outside any recording, the last preRollMs of them; never written. */
  between: DurableMessage[];
  connections: number;
  graceTimer: ReturnType<typeof setTimeout> | undefined;
  /** Storage work of this stream, one step after another. */
  chain: Promise<void>;
}

const isMode = (v: ChannelValue): v is RobotMode => v === 'disabled' || v === 'auto' || v === 'teleop';
const endMs = (m: DurableMessage) => (m.type === 'event' ? m.tMs : m.t0Ms + (m.ticks - 1) * m.dtMs);

export function createRecorder(options: RecorderOptions) {
  const { recordings, repo, logger } = options;
  const graceMs = options.graceMs ?? 10_000;
  const tailMs = options.tailMs ?? 500;
  const autoGapMs = options.autoGapMs ?? 5_000;
  const preRollMs = options.preRollMs ?? 1_000;
  const keepLiveSimulated = options.keepLiveSimulated ?? 30;
  const streams = new Map<string, StreamState>();
  const segmentsByKey = new Map<string, { stream: StreamState; segment: Segment }>();
  const pg = new PgTelemetryStore(recordings, {
    logger,
    compactEveryTicks: options.compactEveryTicks,
    classify: (ref) => ({ kind: segmentsByKey.get(`${ref.teamId}/${ref.streamId}`)?.segment.kind ?? 'practice', source: 'live' }),
  });

  const keyOf = (ref: StreamRef) => `${ref.teamId}/${ref.streamId}`;

  function stateOf(ref: StreamRef): StreamState {
    let state = streams.get(keyOf(ref));
    if (!state) {
      state = {
        ref,
        maxSeq: -1,
        appendedUpTo: -1,
        mode: undefined,
        simulated: false,
        robotMinusServerMs: 0,
        lastRobotMs: Number.NEGATIVE_INFINITY,
        segments: [],
        between: [],
        connections: 0,
        graceTimer: undefined,
        chain: Promise.resolve(),
      };
      streams.set(keyOf(ref), state);
    }
    state.ref = ref;
    return state;
  }

  const openSegment = (state: StreamState) => state.segments.find((x) => x.toSeq === undefined);

  function enqueue(state: StreamState, work: () => Promise<void>): Promise<void> {
    const next = state.chain.then(work);
    state.chain = next.catch(() => {});
    return next;
  }

  function start(state: StreamState, boundarySeq: number, mode: RobotMode, manual: boolean): Segment {
    // Pre-roll: the last moments before the start, already confirmed to the robot, join the recording.
    const preRoll = state.between.filter((m) => endMs(m) >= state.lastRobotMs - preRollMs && m.seq < boundarySeq);
    const fromSeq = Math.min(boundarySeq, ...preRoll.map((m) => m.seq));
    const segment: Segment = {
      key: `${state.ref.streamId}:${fromSeq}`,
      fromSeq,
      toSeq: undefined,
      kind: state.simulated ? 'simulated' : mode === 'auto' ? 'match' : 'practice',
      manual,
      sawTeleop: mode === 'teleop',
      closeAtRobotMs: undefined,
      recordingId: undefined,
      relayEvents: [],
      finished: false,
      finishAfterSeq: undefined,
      finishTimer: undefined,
      onFinished: [],
    };
    state.segments.push(segment);
    segmentsByKey.set(`${state.ref.teamId}/${segment.key}`, { stream: state, segment });
    state.between = [];
    if (preRoll.length > 0) void enqueue(state, () => write(state, segment, preRoll)).catch(logFailure);
    logger.info({ robot: state.ref.robot, key: segment.key, kind: segment.kind }, 'recorder: recording started');
    return segment;
  }

  /**
   * Ends the segment before `toSeq`; with `now`, finishes it once every message before `toSeq` is written.
   * The relay may still hold some of them in its store queue, so that can be after a later append (or, should
   * they never come, after FINISH_WAIT_MS).
   */
  function end(state: StreamState, segment: Segment, toSeq: number, now: boolean): void {
    segment.toSeq = toSeq;
    segment.closeAtRobotMs = undefined;
    if (!now) return;
    if (state.appendedUpTo >= toSeq - 1) {
      void enqueue(state, () => finish(state, segment)).catch(logFailure);
      return;
    }
    segment.finishAfterSeq = toSeq - 1;
    segment.finishTimer = setTimeout(() => void enqueue(state, () => finish(state, segment)).catch(logFailure), FINISH_WAIT_MS);
    segment.finishTimer.unref?.();
  }

  function setMode(state: StreamState, mode: RobotMode, boundarySeq: number, robotMs: number): void {
    const previous = state.mode;
    state.mode = mode;
    if (mode === previous) return;
    const open = openSegment(state);
    if (mode === 'disabled') {
      if (open && !open.manual) open.closeAtRobotMs = robotMs + (open.sawTeleop ? tailMs : autoGapMs);
      return;
    }
    if (open && open.closeAtRobotMs !== undefined && mode === 'auto') {
      end(state, open, boundarySeq, false);
      start(state, boundarySeq, mode, false);
      return;
    }
    if (open) {
      open.closeAtRobotMs = undefined;
      if (mode === 'teleop') open.sawTeleop = true;
      return;
    }
    if (previous === 'disabled' || previous === undefined) start(state, boundarySeq, mode, false);
  }

  async function write(state: StreamState, segment: Segment, messages: DurableMessage[]): Promise<void> {
    await pg.append({ ...state.ref, streamId: segment.key }, messages);
    if (!segment.recordingId) segment.recordingId = (await recordings.findByStream(state.ref.teamId, segment.key))?.id;
    await flushRelayEvents(segment);
  }

  async function flushRelayEvents(segment: Segment): Promise<void> {
    if (!segment.recordingId || segment.relayEvents.length === 0) return;
    const events = segment.relayEvents.splice(0, segment.relayEvents.length);
    await repo.insertRelayEvents(segment.recordingId, events);
  }

  async function finish(state: StreamState, segment: Segment): Promise<void> {
    if (segment.finished) return;
    segment.finished = true;
    clearTimeout(segment.finishTimer);
    segment.finishAfterSeq = undefined;
    try {
      await finishStored(state, segment);
    } finally {
      for (const resolve of segment.onFinished.splice(0)) resolve();
    }
  }

  async function finishStored(state: StreamState, segment: Segment): Promise<void> {
    await flushRelayEvents(segment);
    if (segment.recordingId) {
      const row = await recordings.finish(state.ref.teamId, segment.recordingId);
      logger.info({ robot: state.ref.robot, recordingId: row.id, durationMs: row.durationMs }, 'recorder: recording finished');
      if (segment.kind === 'simulated') {
        const removed = await repo.trimLiveSimulated(state.ref.teamId, keepLiveSimulated);
        if (removed > 0) logger.info({ removed, kept: keepLiveSimulated }, 'recorder: removed the oldest live simulated recordings');
      }
    }
    segmentsByKey.delete(`${state.ref.teamId}/${segment.key}`);
    // Keep the finished range only as long as a resend could still fall into it.
    state.segments = state.segments.filter((x) => !x.finished || x.toSeq! > state.maxSeq - 10_000);
  }

  function logFailure(err: unknown): void {
    logger.error({ err }, 'recorder: storing failed');
  }

  function segmentFor(state: StreamState, seq: number): Segment | undefined {
    return state.segments.find((x) => seq >= x.fromSeq && (x.toSeq === undefined || seq < x.toSeq));
  }

  const store: TelemetryStore = {
    async append(ref, messages) {
      const state = stateOf(ref);
      const groups = new Map<Segment, DurableMessage[]>();
      const toFinish = new Set<Segment>();
      for (const m of messages) {
        state.appendedUpTo = Math.max(state.appendedUpTo, m.seq);
        for (const x of state.segments) if (x.toSeq !== undefined && m.seq >= x.toSeq && !x.finished) toFinish.add(x);
        const segment = segmentFor(state, m.seq);
        if (!segment) {
          if (state.between.length === 0 || m.seq > state.between.at(-1)!.seq) state.between.push(m);
          continue;
        }
        let list = groups.get(segment);
        if (!list) groups.set(segment, (list = []));
        list.push(m);
      }
      for (const x of state.segments) if (x.finishAfterSeq !== undefined && !x.finished && state.appendedUpTo >= x.finishAfterSeq) toFinish.add(x);
      const horizon = state.lastRobotMs - preRollMs;
      while (state.between.length > 0 && endMs(state.between[0]!) < horizon) state.between.shift();
      return enqueue(state, async () => {
        for (const [segment, list] of groups) await write(state, segment, list);
        for (const segment of toFinish) await finish(state, segment);
      });
    },
  };

  const observer: StreamObserver = {
    robotConnected(ref) {
      const state = stateOf(ref);
      state.connections += 1;
      clearTimeout(state.graceTimer);
      state.graceTimer = undefined;
    },
    robotDisconnected(ref) {
      const state = stateOf(ref);
      state.connections = Math.max(0, state.connections - 1);
      if (state.connections > 0) return;
      clearTimeout(state.graceTimer);
      state.graceTimer = setTimeout(() => {
        state.graceTimer = undefined;
        const open = openSegment(state);
        if (open) end(state, open, state.maxSeq + 1, true);
        state.mode = undefined;
      }, graceMs);
      state.graceTimer.unref?.();
    },
    received(ref, message, robotMinusServerMs) {
      const state = stateOf(ref);
      state.robotMinusServerMs = robotMinusServerMs;
      if (message.seq <= state.maxSeq) return;
      state.maxSeq = message.seq;
      state.lastRobotMs = Math.max(state.lastRobotMs, endMs(message));
      if (message.type === 'event' && message.kind === 'mode_changed' && isMode(message.data?.to ?? null)) {
        setMode(state, message.data!.to as RobotMode, message.seq, message.tMs);
      } else if (message.type === 'telemetry_batch') {
        const open = openSegment(state);
        if (open?.closeAtRobotMs !== undefined && message.t0Ms >= open.closeAtRobotMs) end(state, open, message.seq, false);
      }
    },
    robotValue(ref, channel, value) {
      const state = stateOf(ref);
      if (channel === 'robot/simulated') state.simulated = value === true;
      // A robot that only publishes its mode: the boundary is the next message it sends.
      else if (channel === 'robot/mode' && isMode(value)) setMode(state, value, state.maxSeq + 1, state.lastRobotMs);
    },
    selection(teamId, selection) {
      for (const state of streams.values()) {
        if (state.ref.teamId !== teamId) continue;
        const open = openSegment(state);
        if (!open) continue;
        const data = { channel: selection.channel, value: selection.value, rev: selection.rev, by: byOf(selection.from) };
        addRelayEvent(state, open, selection.serverMs, 'selection', data);
      }
    },
    ack(ref, ack) {
      const state = stateOf(ref);
      const open = openSegment(state);
      if (open) addRelayEvent(state, open, ack.serverMs, 'ack', { channel: ack.channel, rev: ack.rev, relayRttMs: ack.relayRttMs });
    },
  };

  function addRelayEvent(state: StreamState, segment: Segment, serverMs: number, kind: RelayEvent['kind'], data: Record<string, ChannelValue>): void {
    segment.relayEvents.push({ tMs: serverMs + state.robotMinusServerMs, kind, data });
    if (segment.recordingId) void enqueue(state, () => flushRelayEvents(segment)).catch(logFailure);
  }

  const robotStreams = (teamId: string, robot: string) =>
    [...streams.values()].filter((x) => x.ref.teamId === teamId && x.ref.robot === robot && x.connections > 0);

  return {
    store,
    observer,

    /** Starts recording the robot by hand (a practice run); returns the storage key, or undefined when it is not connected. */
    startRecording(teamId: string, robot: string): string | undefined {
      const [state] = robotStreams(teamId, robot);
      if (!state) return undefined;
      const open = openSegment(state);
      if (open) return open.key;
      return start(state, state.maxSeq + 1, state.mode === 'auto' ? 'auto' : 'teleop', true).key;
    },

    /** Ends the robot's running recording; resolves with its id once it is finished (undefined when none ran). */
    async stopRecording(teamId: string, robot: string): Promise<string | undefined> {
      for (const state of robotStreams(teamId, robot)) {
        const open = openSegment(state);
        if (!open) continue;
        const finished = new Promise<void>((resolve) => open.onFinished.push(resolve));
        end(state, open, state.maxSeq + 1, true);
        await finished;
        await state.chain;
        return open.recordingId;
      }
      return undefined;
    },

    /** The team's connected robots and the recording each is making, for the live page and the recorder routes. */
    status(teamId: string): RecorderRobot[] {
      const byRobot = new Map<string, RecorderRobot>();
      for (const state of streams.values()) {
        if (state.ref.teamId !== teamId || state.connections === 0) continue;
        const open = openSegment(state);
        byRobot.set(state.ref.robot, {
          robot: state.ref.robot,
          mode: state.mode ?? null,
          recording: open ? { recordingId: open.recordingId ?? null, kind: open.kind, isManual: open.manual } : null,
        });
      }
      return [...byRobot.values()].sort((a, b) => a.robot.localeCompare(b.robot));
    },

    /**
     * After a restart: takes up the live recordings the last run left unfinished, so a robot that reconnects
     * with the same stream (and resends what was never confirmed) continues its recording instead of starting
     * a new one. A robot that does not come back within the grace has its recording finished. Call before the
     * relay accepts robots.
     */
    async resumeUnfinished(): Promise<number> {
      const unfinished = await repo.listUnfinishedLive();
      for (const row of unfinished) {
        const cut = row.streamKey.lastIndexOf(':');
        const fromSeq = Number(row.streamKey.slice(cut + 1));
        if (cut <= 0 || !Number.isInteger(fromSeq)) continue;
        const state = stateOf({ teamId: row.teamId, keyId: undefined, robot: row.robot, streamId: row.streamKey.slice(0, cut), signals: undefined });
        if (openSegment(state)) continue;
        const segment: Segment = {
          key: row.streamKey,
          fromSeq,
          toSeq: undefined,
          kind: row.kind,
          manual: false,
          sawTeleop: row.sawTeleop,
          closeAtRobotMs: undefined,
          recordingId: row.id,
          relayEvents: [],
          finished: false,
          finishAfterSeq: undefined,
          finishTimer: undefined,
          onFinished: [],
        };
        state.segments.push(segment);
        state.maxSeq = Math.max(state.maxSeq, row.maxSeq ?? fromSeq - 1);
        state.appendedUpTo = state.maxSeq;
        if (row.lastMode !== null && isMode(row.lastMode)) state.mode = row.lastMode;
        segmentsByKey.set(`${row.teamId}/${segment.key}`, { stream: state, segment });
        state.graceTimer = setTimeout(() => {
          state.graceTimer = undefined;
          if (state.connections === 0 && openSegment(state) === segment) end(state, segment, state.maxSeq + 1, true);
        }, graceMs);
        state.graceTimer.unref?.();
        logger.info({ robot: row.robot, recordingId: row.id, fromSeq, maxSeq: row.maxSeq }, 'recorder: resuming an unfinished recording');
      }
      return unfinished.length;
    },

    /** Resolves once every stream's queued storage work is done (shutdown, tests). */
    async settle(): Promise<void> {
      await Promise.all([...streams.values()].map((x) => x.chain));
    },

    close(): void {
      for (const state of streams.values()) {
        clearTimeout(state.graceTimer);
        for (const segment of state.segments) clearTimeout(segment.finishTimer);
      }
    },
  };
}

function byOf(from: Sender): Record<string, ChannelValue> {
  return { sessionId: from.sessionId, kind: from.kind, name: from.name, role: from.role };
}

export type Recorder = ReturnType<typeof createRecorder>;
