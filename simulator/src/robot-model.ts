// Pure: no I/O, clocks, timers or Math.random; imports only shared/ and sibling kernel files. The stand-in robot:
// drive, elevator and intake physics, the cycle state machine and the telemetry values, advanced by step(dtS).
import { angleDiffDeg, distanceM, rotateVector, wrapDeg, type Point2d, type Pose2d } from '../../shared/domain/geometry/pose2d';
import { applySelection, type OperatorSelection } from '../../shared/domain/channels';
import type { MotionLimits } from '../../shared/domain/motion-profile';
import { eventPoints, type ScoringEvent } from '../../shared/domain/season/points';
import type { Alliance, DriverStation, SeasonProfile } from '../../shared/domain/season/season-profile';
import type { RobotProfile } from '../../shared/schemas/robot-profile';
import { simTargets, type SimTargets } from './field-targets';
import { isEndgameAt, matchEndsS, matchRemainingS, MATCH_MODES, type MatchMode } from './match-clock';
import { legStateAt, planLeg, pointAlong, polyline, routeAroundCircle, type Leg, type Polyline } from './motion';
import { createRng, forkRng } from './rng';
import { GAME_PIECES, MODEL_STATES, MODULE_NAMES, SIM_SIGNALS, simSignalIndex, type ModelState } from './signals';

export type Holding = 'none' | 'coral' | 'algae';
export type EventValue = string | number | boolean | null;
export type ModelEventKind =
  | 'mode_changed'
  | 'target_changed'
  | 'leave'
  | 'acquired'
  | 'placed'
  | 'missed'
  | 'algae_scored'
  | 'cage'
  | 'brownout';
export interface ModelEvent {
  kind: ModelEventKind;
  data: Record<string, EventValue>;
}

export interface BatteryParams {
  /** Open-circuit voltage when full, V. */
  restingV: number;
  /** Battery plus wiring resistance, Ω. */
  resistanceOhm: number;
  /** Below this the robot controller browns out, V. */
  brownoutV: number;
}

/** 12.6 V and 0.015 Ω: common practice, no source. 6.8 V brownout: from memory. */
export const DEFAULT_BATTERY: BatteryParams = { restingV: 12.6, resistanceOhm: 0.015, brownoutV: 6.8 };

export interface RobotModelOptions {
  season: SeasonProfile;
  robot: RobotProfile;
  alliance: Alliance;
  seed: number;
  /** Driver station 1–3: sets the start pose and which cage the robot climbs; default 2. */
  station?: DriverStation;
  /** Start somewhere other than the starting line (tests, drills). */
  startPose?: Pose2d;
  /** Robots start a match holding one coral; default true. */
  preload?: boolean;
  battery?: Partial<BatteryParams>;
}

export interface RobotModel {
  /** Switches mode; disabling stops the robot at once, enabling starts from idle. The event comes with the next step. */
  setMode(mode: MatchMode): void;
  /** Applies an op/ channel value; true when it was a standard channel and value (the caller then acknowledges). */
  applyOp(channel: string, value: unknown): boolean;
  /** Advances physics and the state machine by dtS seconds (0 allowed) and returns what happened since the last step. */
  step(dtS: number): ModelEvent[];
  /** A copy of the current values in SIM_SIGNALS order: enums as their label index, booleans 0/1. */
  sample(): Float32Array;
  readonly pose: Pose2d;
  /** Field-relative velocity, m/s, and turn rate, deg/s. */
  readonly velocity: { vxMps: number; vyMps: number; omegaDegPerS: number };
  readonly elevatorHeightM: number;
  readonly stateName: ModelState;
  readonly mode: MatchMode;
  /** What the operator has selected (every applied op). */
  readonly selection: Readonly<OperatorSelection>;
  /** What the robot is acting on: the selection once the driver has reacted to it. */
  readonly target: Readonly<OperatorSelection>;
  readonly holding: Holding;
  /** Robot time since creation, s. */
  readonly timeS: number;
  /** Match time: 0 at the start of auto, counting while enabled, s. */
  readonly matchTimeS: number;
}

// Mechanism limits and timings below are invented for a plausible robot (common practice, no source).
const TURN_LIMITS: MotionLimits = { maxSpeedMps: 360, maxAccelMps2: 720 };
const ELEVATOR_LIMITS: MotionLimits = { maxSpeedMps: 2, maxAccelMps2: 8 };
const ALIGN_LIMITS: MotionLimits = { maxSpeedMps: 1, maxAccelMps2: 4 };
const RAISE_WITHIN_M = 1.5;
const CLIMB_S = { park: 0, shallow: 3, deep: 5 } as const;
const CLIMB_ANGLE_DEG = { park: 0, shallow: 80, deep: 120 } as const;
const MISS_CHANCE = { L1: 0.04, L2: 0.06, L3: 0.06, L4: 0.1 } as const;
const DEEP_CLIMB_FAIL_CHANCE = 0.1;
/** A driver's reaction to a new call, s: a simple human reaction is about 0.2–0.3 s (from memory). */
const REACTION = { meanS: 0.25, sdS: 0.06, minS: 0.12, maxS: 0.6 };
const MODULE_INSET_M = 0.06;
const DRIVE_CURRENT_LIMIT_A = 60;
const AMBIENT_C = 24;
// First-order motor heating: dT/dt = k·I² − (T − ambient)/τ (invented constants, no source).
const HEAT_K = 0.00025;
const COOL_TAU_S = 240;

const IX = Object.fromEntries(SIM_SIGNALS.map((s) => [s.name, simSignalIndex(s.name)])) as Record<string, number>;
const labelIndex = (labels: readonly string[], label: string | undefined) => (label === undefined ? -1 : labels.indexOf(label));

interface DriveMove {
  line: Polyline;
  leg: Leg;
  elapsedS: number;
  goal: Pose2d;
}
interface AxisMove {
  from: number;
  leg: Leg;
  elapsedS: number;
}

/** A deterministic simulated robot; the same options and the same calls give the same results. */
export function createRobotModel(options: RobotModelOptions): RobotModel {
  const { season, robot, alliance, seed } = options;
  const battery = { ...DEFAULT_BATTERY, ...options.battery };
  const targets: SimTargets = simTargets(season, robot, alliance, options.station ?? 2);
  const choices = createRng(seed);
  const noise = forkRng(seed, 1);
  const driveLimits: MotionLimits = { maxSpeedMps: robot.driveMaxSpeedMps, maxAccelMps2: robot.driveMaxAccelMps2 };
  const { teleopEndS } = matchEndsS(season);
  const visionTags = season.tags.map((t) => t.value);
  const modules = MODULE_NAMES.map((name, i) => ({
    name,
    offset: {
      xM: (i < 2 ? 1 : -1) * (robot.frameLengthM / 2 - MODULE_INSET_M),
      yM: (i % 2 === 0 ? 1 : -1) * (robot.frameWidthM / 2 - MODULE_INSET_M),
    },
    speedMps: 0,
    angleDeg: 0,
    vel: { xM: 0, yM: 0 },
    driveA: 0,
    steerA: 0,
    driveTempC: AMBIENT_C,
    steerTempC: AMBIENT_C,
  }));

  let mode: MatchMode = 'disabled';
  let state: ModelState = 'disabled';
  let stateSinceS = 0;
  let timeS = 0;
  let matchTimeS = 0;
  let pose: Pose2d = { ...(options.startPose ?? targets.start) };
  let vel: Point2d = { xM: 0, yM: 0 };
  let lastRobotVel: Point2d = { xM: 0, yM: 0 };
  let omegaDegS = 0;
  let elevatorM = 0;
  let elevatorVel = 0;
  let elevatorGoalM = 0;
  let drive: DriveMove | undefined;
  let turn: AxisMove | undefined;
  let lift: AxisMove | undefined;
  let timerS = 0;
  let holding: Holding = options.preload === false ? 'none' : 'coral';
  let selection: OperatorSelection = {};
  let target: OperatorSelection = {};
  let adoptAtS: number | undefined;
  let lastReactionS = 0;
  let hasLeft = false;
  let cycles = 0;
  let coralScored = 0;
  let coralMissed = 0;
  let algaeScored = 0;
  let points = 0;
  let climbKind: 'park' | 'shallow' | 'deep' = 'park';
  let climberDeg = 0;
  let ampHours = 0;
  let voltageV = battery.restingV;
  let isBrownedOut = false;
  let brownouts = 0;
  let lastVision = { xM: pose.xM, yM: pose.yM, headingDeg: pose.headingDeg, tags: 0, errorM: 0 };
  let pending: ModelEvent[] = [];
  const values = new Float32Array(SIM_SIGNALS.length);

  const emit = (kind: ModelEventKind, data: Record<string, EventValue> = {}) => pending.push({ kind, data });
  const phase = (): 'auto' | 'teleop' => (mode === 'auto' ? 'auto' : 'teleop');
  const score = (event: ScoringEvent) => {
    points += eventPoints(season, event).points;
  };

  function enter(next: ModelState) {
    state = next;
    stateSinceS = timeS;
  }

  function driveTo(goal: Pose2d, limits: MotionLimits, avoidReef: boolean) {
    const points = avoidReef ? routeAroundCircle(pose, goal, targets.reefCentre, targets.reefClearanceM) : [pose, goal];
    const line = polyline(points.map((p) => ({ xM: p.xM, yM: p.yM })));
    const { direction } = pointAlong(line, 0);
    const along = vel.xM * direction.xM + vel.yM * direction.yM;
    const leg = planLeg(line.lengthM, along, limits);
    // Re-planning keeps the speed along the new line; the part across it is dropped (a simplification).
    const startSpeed = legStateAt(leg, 0).velocityMps;
    vel = { xM: direction.xM * startSpeed, yM: direction.yM * startSpeed };
    drive = { line, leg, elapsedS: 0, goal };
    const turnDeg = angleDiffDeg(pose.headingDeg, goal.headingDeg);
    turn = { from: pose.headingDeg, leg: planLeg(turnDeg, omegaDegS, TURN_LIMITS), elapsedS: 0 };
  }

  function liftTo(heightM: number) {
    if (heightM === elevatorGoalM && (lift !== undefined || elevatorM === heightM)) return;
    elevatorGoalM = heightM;
    lift = { from: elevatorM, leg: planLeg(heightM - elevatorM, elevatorVel, ELEVATOR_LIMITS), elapsedS: 0 };
  }

  const isDriveDone = () => drive === undefined && turn === undefined;
  const isLiftDone = () => lift === undefined;
  const levelHeightM = () => robot.elevatorHeightsM[target.level ?? 'L1'];
  const algaeHeightM = () => {
    // Algae sits between L2 and L3 on every other face and between L3 and L4 on the rest (from memory).
    const face = target.branch ? targets.branches[target.branch].faceIndex : 0;
    const h = robot.elevatorHeightsM;
    return face % 2 === 0 ? (h.L2 + h.L3) / 2 : (h.L3 + h.L4) / 2;
  };
  const varied = (baseS: number, sd = 0.15) => baseS * Math.min(2, Math.max(0.5, choices.normal(1, sd)));

  function goToReef() {
    if (!target.branch || !target.level) return enter('idle');
    enter('to_reef');
    driveTo(targets.branches[target.branch].approach, driveLimits, true);
    liftTo(0);
  }

  function goToStation() {
    if (!target.station) return enter('idle');
    enter('to_station');
    driveTo(targets.stations[target.station], driveLimits, true);
    liftTo(0);
  }

  function goToAlgaeTarget() {
    const isNet = target.algae === 'net';
    enter(isNet ? 'to_net' : 'to_processor');
    driveTo(isNet ? targets.net : targets.processor, driveLimits, true);
    liftTo(isNet ? robot.elevatorHeightsM.L4 : 0);
  }

  function goToCage() {
    climbKind = target.cage === 'shallow' || target.cage === 'deep' ? target.cage : 'park';
    enter('to_cage');
    driveTo(climbKind === 'park' ? targets.park : targets.cage, driveLimits, true);
    liftTo(0);
  }

  const wantsCage = () => mode === 'teleop' && target.cage !== undefined && target.cage !== 'none';

  /** What to do next from a standstill between tasks. */
  function decide() {
    if (wantsCage()) return goToCage();
    if (holding === 'coral') return goToReef();
    if (holding === 'algae') return goToAlgaeTarget();
    return goToStation();
  }

  function adopt() {
    adoptAtS = undefined;
    const before = target;
    target = { ...selection };
    emit('target_changed', {
      branch: target.branch ?? null,
      level: target.level ?? null,
      station: target.station ?? null,
      algae: target.algae ?? null,
      cage: target.cage ?? null,
      reactionS: mode === 'disabled' ? 0 : Number(lastReactionS.toFixed(3)),
    });
    if (mode === 'disabled') return;
    const cageCalled = wantsCage() && before.cage !== target.cage;
    if (cageCalled && state !== 'climbing' && state !== 'parked') return goToCage();
    if (state === 'to_cage' && !wantsCage()) return decide();
    switch (state) {
      case 'to_reef':
      case 'aligning':
        if (before.branch !== target.branch) return goToReef();
        if (before.level !== target.level && (state === 'aligning' || lift !== undefined || elevatorGoalM > 0)) liftTo(levelHeightM());
        return;
      case 'to_station':
        if (before.station !== target.station) return goToStation();
        return;
      case 'to_processor':
      case 'to_net':
        if (before.algae !== target.algae) return goToAlgaeTarget();
        return;
      default:
        return;
    }
  }

  function advanceMotion(dtS: number) {
    if (drive) {
      drive.elapsedS += dtS;
      const s = legStateAt(drive.leg, drive.elapsedS);
      const at = pointAlong(drive.line, s.positionM);
      pose = { ...pose, xM: at.point.xM, yM: at.point.yM };
      vel = { xM: at.direction.xM * s.velocityMps, yM: at.direction.yM * s.velocityMps };
      if (drive.elapsedS >= drive.leg.durationS) {
        pose = { ...pose, xM: drive.goal.xM, yM: drive.goal.yM };
        vel = { xM: 0, yM: 0 };
        drive = undefined;
      }
    }
    if (turn) {
      turn.elapsedS += dtS;
      const s = legStateAt(turn.leg, turn.elapsedS);
      pose = { ...pose, headingDeg: wrapDeg(turn.from + s.positionM) };
      omegaDegS = s.velocityMps;
      if (turn.elapsedS >= turn.leg.durationS) {
        omegaDegS = 0;
        turn = undefined;
      }
    }
    if (lift) {
      lift.elapsedS += dtS;
      const s = legStateAt(lift.leg, lift.elapsedS);
      elevatorM = lift.from + s.positionM;
      elevatorVel = s.velocityMps;
      if (lift.elapsedS >= lift.leg.durationS) {
        elevatorM = elevatorGoalM;
        elevatorVel = 0;
        lift = undefined;
      }
    }
  }

  function advanceState(dtS: number) {
    timerS -= dtS;
    switch (state) {
      case 'disabled':
      case 'parked':
        return;
      case 'idle':
        return decide();
      case 'to_station':
        if (!isDriveDone()) return;
        enter('intaking');
        timerS = varied(robot.intakeTimeS);
        return;
      case 'intaking':
        if (timerS > 0) return;
        holding = 'coral';
        cycles += 1;
        emit('acquired', { piece: 'coral', station: target.station ?? null });
        return decide();
      case 'to_reef': {
        const left = drive ? drive.line.lengthM - legStateAt(drive.leg, drive.elapsedS).positionM : 0;
        if (left < RAISE_WITHIN_M) liftTo(levelHeightM());
        if (!isDriveDone()) return;
        enter('aligning');
        driveTo(targets.branches[target.branch ?? 'A'].scoring, ALIGN_LIMITS, false);
        return;
      }
      case 'aligning':
        if (!isDriveDone() || !isLiftDone()) return;
        enter('placing');
        timerS = varied(robot.placeTimeS, 0.1);
        return;
      case 'placing': {
        if (timerS > 0) return;
        const branch = target.branch ?? null;
        const level = target.level ?? 'L1';
        holding = 'none';
        if (choices.chance(MISS_CHANCE[level])) {
          coralMissed += 1;
          emit('missed', { branch, level, phase: phase() });
        } else {
          coralScored += 1;
          score({ kind: 'coral', level, phase: phase() });
          emit('placed', { branch, level, phase: phase() });
        }
        if (target.algae === 'processor' || target.algae === 'net') {
          enter('removing_algae');
          liftTo(algaeHeightM());
          timerS = varied(robot.intakeTimeS);
          return;
        }
        return decide();
      }
      case 'removing_algae':
        if (timerS > 0 || !isLiftDone()) return;
        holding = 'algae';
        emit('acquired', { piece: 'algae', station: 'reef' });
        return decide();
      case 'to_processor':
      case 'to_net':
        if (!isDriveDone() || !isLiftDone()) return;
        enter('scoring_algae');
        timerS = varied(robot.placeTimeS, 0.1);
        return;
      case 'scoring_algae': {
        if (timerS > 0) return;
        const where = target.algae === 'net' ? 'net' : 'processor';
        holding = 'none';
        algaeScored += 1;
        score({ kind: 'algae', target: where, phase: phase() });
        emit('algae_scored', { where, phase: phase() });
        return decide();
      }
      case 'to_cage':
        if (!isDriveDone()) return;
        if (climbKind === 'park') return finishClimb('park', null);
        enter('climbing');
        timerS = varied(CLIMB_S[climbKind], 0.1);
        return;
      case 'climbing':
        climberDeg = Math.min(CLIMB_ANGLE_DEG[climbKind], climberDeg + (CLIMB_ANGLE_DEG[climbKind] / Math.max(1, CLIMB_S[climbKind])) * dtS);
        if (timerS > 0) return;
        if (climbKind === 'deep' && choices.chance(DEEP_CLIMB_FAIL_CHANCE)) return finishClimb('park', 'deep');
        return finishClimb(climbKind, null);
    }
  }

  function finishClimb(kind: 'park' | 'shallow' | 'deep', failed: string | null) {
    enter('parked');
    score({ kind: 'barge', state: kind });
    emit('cage', { kind, failed });
  }

  function checkLeave() {
    if (hasLeft || mode !== 'auto') return;
    const beyond = alliance === 'blue' ? targets.startingLineXM - pose.xM : pose.xM - targets.startingLineXM;
    if (beyond < targets.halfLengthM) return;
    hasLeft = true;
    score({ kind: 'leave' });
    emit('leave', {});
  }

  const heat = (tempC: number, currentA: number, dtS: number) =>
    tempC + dtS * (HEAT_K * currentA * currentA - (tempC - AMBIENT_C) / COOL_TAU_S);

  /** Currents, temperatures, battery and sensors; written into `values`. */
  function updateSignals(dtS: number) {
    const isEnabled = mode !== 'disabled';
    const robotVel = rotateVector(vel, -pose.headingDeg);
    const omegaRadS = (omegaDegS * Math.PI) / 180;
    let totalA = 3;
    for (const m of modules) {
      const v = { xM: robotVel.xM - omegaRadS * m.offset.yM, yM: robotVel.yM + omegaRadS * m.offset.xM };
      const speed = Math.hypot(v.xM, v.yM);
      const accel = dtS > 0 ? Math.hypot(v.xM - m.vel.xM, v.yM - m.vel.yM) / dtS : 0;
      const angle = speed > 0.02 ? (Math.atan2(v.yM, v.xM) * 180) / Math.PI : m.angleDeg;
      const steerRate = dtS > 0 ? Math.abs(angleDiffDeg(m.angleDeg, angle)) / dtS : 0;
      m.vel = v;
      m.speedMps = speed;
      m.angleDeg = angle;
      // About 6.5 A per m/s² of module acceleration for a ~60 kg robot, under a 60 A current limit (rough
      // estimate and common practice, no source); corners of a path turn the velocity in one tick, hence the clamp.
      const torqueAccel = Math.min(accel, robot.driveMaxAccelMps2);
      m.driveA = isEnabled ? Math.min(DRIVE_CURRENT_LIMIT_A, Math.max(0, 1 + 6.5 * torqueAccel + 0.6 * speed + noise.normal(0, 0.3))) : 0;
      m.steerA = isEnabled ? Math.max(0, Math.min(10, 0.4 + 0.004 * steerRate + noise.normal(0, 0.1))) : 0;
      m.driveTempC = heat(m.driveTempC, m.driveA, dtS);
      m.steerTempC = heat(m.steerTempC, m.steerA, dtS);
      totalA += m.driveA + m.steerA;
    }
    const raised = elevatorM > 0.01;
    const elevatorA = isEnabled ? Math.max(0, (raised ? 4 : 0.3) + 6 * Math.max(0, elevatorVel) + 1.5 * Math.abs(elevatorVel)) : 0;
    const leadA = elevatorA + (isEnabled ? noise.normal(0, 0.2) : 0);
    const followA = elevatorA + (isEnabled ? noise.normal(0, 0.2) : 0);
    const intakeRpm = state === 'intaking' ? 4500 : state === 'placing' ? -3000 : holding === 'coral' ? 300 : 0;
    const intakeA = isEnabled ? Math.abs(intakeRpm) / 250 + (intakeRpm !== 0 ? noise.normal(0, 0.3) : 0) : 0;
    const algaeRpm =
      state === 'removing_algae' ? 3500 : state === 'scoring_algae' ? -4000 : holding === 'algae' ? 400 : 0;
    const algaeA = isEnabled ? Math.abs(algaeRpm) / 250 : 0;
    const climberA = state === 'climbing' ? 35 + noise.normal(0, 2) : 0;
    const wristDeg = state === 'placing' || state === 'aligning' ? (target.level === 'L4' ? 55 : 35) : state === 'intaking' ? -10 : 0;
    const wristA = isEnabled ? 1.5 + (wristDeg !== 0 ? 2 : 0) : 0;
    totalA += Math.max(0, leadA) + Math.max(0, followA) + intakeA + algaeA + climberA + wristA;

    ampHours += (totalA * dtS) / 3600;
    const openCircuitV = battery.restingV - 0.05 * ampHours;
    voltageV = openCircuitV - totalA * battery.resistanceOhm + noise.normal(0, 0.03);
    if (!isBrownedOut && voltageV < battery.brownoutV) {
      isBrownedOut = true;
      brownouts += 1;
      emit('brownout', { voltageV: Number(voltageV.toFixed(2)) });
    } else if (isBrownedOut && voltageV > battery.brownoutV + 0.5) {
      isBrownedOut = false;
    }

    const robotAccel =
      dtS > 0 ? { xM: (robotVel.xM - lastRobotVel.xM) / dtS, yM: (robotVel.yM - lastRobotVel.yM) / dtS } : { xM: 0, yM: 0 };
    lastRobotVel = robotVel;
    updateVision();
    writeValues({ totalA, leadA, followA, intakeRpm, intakeA, algaeRpm, algaeA, climberA, wristDeg, wristA, robotAccel });
  }

  function updateVision() {
    // Tags within 4.5 m whose printed face looks at the robot and lie within ±35° of the scoring-side camera.
    const cameraDeg = pose.headingDeg + { front: 0, left: 90, back: 180, right: -90 }[robot.scoringSide];
    let tags = 0;
    let nearestM = Infinity;
    for (const t of visionTags) {
      const d = distanceM(t, pose);
      if (d > 4.5) continue;
      const facing = Math.cos((t.yawDeg * Math.PI) / 180) * (pose.xM - t.xM) + Math.sin((t.yawDeg * Math.PI) / 180) * (pose.yM - t.yM);
      if (facing <= 0) continue;
      const bearing = (Math.atan2(t.yM - pose.yM, t.xM - pose.xM) * 180) / Math.PI;
      if (Math.abs(angleDiffDeg(cameraDeg, bearing)) > 35) continue;
      tags += 1;
      nearestM = Math.min(nearestM, d);
    }
    if (tags === 0) {
      lastVision = { ...lastVision, tags: 0 };
      return;
    }
    const sdM = 0.01 + 0.01 * nearestM;
    const xM = pose.xM + noise.normal(0, sdM);
    const yM = pose.yM + noise.normal(0, sdM);
    lastVision = { xM, yM, headingDeg: wrapDeg(pose.headingDeg + noise.normal(0, 0.5)), tags, errorM: Math.hypot(xM - pose.xM, yM - pose.yM) };
  }

  function writeValues(p: {
    totalA: number;
    leadA: number;
    followA: number;
    intakeRpm: number;
    intakeA: number;
    algaeRpm: number;
    algaeA: number;
    climberA: number;
    wristDeg: number;
    wristA: number;
    robotAccel: Point2d;
  }) {
    const set = (name: string, value: number | boolean) => {
      const i = IX[name];
      if (i === undefined) throw new RangeError(`no simulator signal named ${name}`);
      values[i] = typeof value === 'boolean' ? (value ? 1 : 0) : value;
    };
    const isEnabled = mode !== 'disabled';
    const goal = drive?.goal ?? pose;
    set('drive/pose/x', pose.xM);
    set('drive/pose/y', pose.yM);
    set('drive/pose/heading', pose.headingDeg);
    set('drive/velocity/vx', vel.xM);
    set('drive/velocity/vy', vel.yM);
    set('drive/velocity/omega', omegaDegS);
    set('drive/speed', Math.hypot(vel.xM, vel.yM));
    set('drive/goal/x', goal.xM);
    set('drive/goal/y', goal.yM);
    set('drive/goal/heading', goal.headingDeg);
    set('drive/goal/distance', distanceM(pose, goal));
    set('drive/at-goal', drive === undefined);
    for (const m of modules) {
      const base = `drive/module/${m.name}`;
      set(`${base}/speed`, m.speedMps + (isEnabled && m.speedMps > 0 ? noise.normal(0, 0.02) : 0));
      set(`${base}/speed-setpoint`, m.speedMps);
      set(`${base}/angle`, m.angleDeg + (isEnabled ? noise.normal(0, 0.2) : 0));
      set(`${base}/angle-setpoint`, m.angleDeg);
      set(`${base}/drive-current`, m.driveA);
      set(`${base}/steer-current`, m.steerA);
      set(`${base}/drive-temp`, m.driveTempC);
      set(`${base}/steer-temp`, m.steerTempC);
    }
    set('elevator/height', elevatorM);
    set('elevator/velocity', elevatorVel);
    set('elevator/setpoint', elevatorGoalM);
    set('elevator/lead-current', Math.max(0, p.leadA));
    set('elevator/follow-current', Math.max(0, p.followA));
    set('elevator/lead-temp', AMBIENT_C + 0.4 * Math.max(0, p.leadA));
    set('elevator/follow-temp', AMBIENT_C + 0.4 * Math.max(0, p.followA));
    set('elevator/at-setpoint', lift === undefined);
    set('elevator/at-bottom', elevatorM < 0.01);
    set('wrist/angle', p.wristDeg);
    set('wrist/setpoint', p.wristDeg);
    set('wrist/current', p.wristA);
    set('intake/roller-speed', p.intakeRpm);
    set('intake/current', Math.max(0, p.intakeA));
    set('intake/temp', AMBIENT_C + 0.5 * Math.max(0, p.intakeA));
    set('intake/coral-sensor', holding === 'coral');
    set('algae/roller-speed', p.algaeRpm);
    set('algae/current', p.algaeA);
    set('algae/sensor', holding === 'algae');
    set('climber/angle', climberDeg);
    set('climber/current', Math.max(0, p.climberA));
    set('climber/latched', state === 'parked' && climbKind !== 'park');
    set('battery/voltage', voltageV);
    set('battery/current', p.totalA);
    set('battery/used', ampHours);
    set('battery/brownout', isBrownedOut);
    // Accelerating pitches and rolls the robot slightly (invented: 0.35° per m/s²).
    set('gyro/yaw', pose.headingDeg);
    set('gyro/pitch', noise.normal(0, 0.05) - 0.35 * p.robotAccel.xM);
    set('gyro/roll', noise.normal(0, 0.05) + 0.35 * p.robotAccel.yM);
    set('gyro/yaw-rate', omegaDegS);
    set('vision/tags', lastVision.tags);
    set('vision/has-estimate', lastVision.tags > 0);
    set('vision/pose/x', lastVision.xM);
    set('vision/pose/y', lastVision.yM);
    set('vision/pose/heading', lastVision.headingDeg);
    set('vision/latency', lastVision.tags > 0 ? 28 + Math.abs(noise.normal(0, 4)) : 0);
    set('vision/error', lastVision.errorM);
    set('state/machine', MODEL_STATES.indexOf(state));
    set('state/time-in-state', timeS - stateSinceS);
    set('state/cycles', cycles);
    set('game/piece', GAME_PIECES.indexOf(holding));
    set('game/coral-scored', coralScored);
    set('game/coral-missed', coralMissed);
    set('game/algae-scored', algaeScored);
    set('game/points', points);
    set('target/branch', labelIndex(SIM_SIGNALS[IX['target/branch']!]!.labels ?? [], target.branch));
    set('target/level', labelIndex(SIM_SIGNALS[IX['target/level']!]!.labels ?? [], target.level));
    set('target/station', labelIndex(['left', 'right'], target.station));
    set('target/algae', labelIndex(['none', 'processor', 'net'], target.algae));
    set('target/cage', labelIndex(['none', 'park', 'shallow', 'deep'], target.cage));
    set('target/adopted', adoptAtS === undefined);
    set('target/reaction', lastReactionS);
    set('match/time', matchTimeS);
    set('match/remaining', matchRemainingS(season, matchTimeS));
    set('match/mode', MATCH_MODES.indexOf(mode));
    set('match/enabled', isEnabled);
    set('match/endgame', isEnabled && isEndgameAt(season, matchTimeS));
    const activeMotors = modules.filter((m) => m.driveA > 1.5).length + (p.leadA > 1 ? 2 : 0) + (p.intakeA > 1 ? 1 : 0);
    set('system/can-utilisation', Math.min(100, Math.max(0, 38 + 1.5 * activeMotors + noise.normal(0, 1.5))));
    set('system/can-errors', 0);
    set('system/loop-time', 20 + noise.normal(0, 0.3) + (noise.chance(0.004) ? 8 : 0));
    set('system/cpu', Math.min(100, Math.max(0, 31 + 0.8 * activeMotors + noise.normal(0, 2))));
    set('system/uptime', timeS);
    set('system/brownouts', brownouts);
  }

  updateSignals(0);

  return {
    setMode(next) {
      if (next === mode) return;
      const from = mode;
      mode = next;
      if (next === 'disabled') {
        drive = undefined;
        turn = undefined;
        lift = undefined;
        vel = { xM: 0, yM: 0 };
        omegaDegS = 0;
        elevatorVel = 0;
        elevatorGoalM = elevatorM;
        enter('disabled');
      } else {
        if (next === 'auto') matchTimeS = 0;
        else if (from === 'disabled') matchTimeS = Math.max(matchTimeS, matchEndsS(season).autoEndS);
        if (state === 'disabled') enter('idle');
      }
      emit('mode_changed', { from, to: next });
    },
    applyOp(channel, value) {
      const next = applySelection(selection, channel, value);
      if (!next) return false;
      selection = next;
      if (mode === 'disabled') {
        adopt();
      } else if (adoptAtS === undefined) {
        lastReactionS = Math.min(REACTION.maxS, Math.max(REACTION.minS, choices.normal(REACTION.meanS, REACTION.sdS)));
        adoptAtS = timeS + lastReactionS;
      }
      return true;
    },
    step(dtS) {
      timeS += dtS;
      if (mode !== 'disabled') {
        matchTimeS = Math.min(teleopEndS, matchTimeS + dtS);
        if (adoptAtS !== undefined && timeS >= adoptAtS - 1e-9) adopt();
        if (state === 'idle') decide();
        advanceMotion(dtS);
        advanceState(dtS);
        checkLeave();
      }
      updateSignals(dtS);
      const out = pending;
      pending = [];
      return out;
    },
    sample: () => values.slice(),
    get pose() {
      return { ...pose };
    },
    get velocity() {
      return { vxMps: vel.xM, vyMps: vel.yM, omegaDegPerS: omegaDegS };
    },
    get elevatorHeightM() {
      return elevatorM;
    },
    get stateName() {
      return state;
    },
    get mode() {
      return mode;
    },
    get selection() {
      return { ...selection };
    },
    get target() {
      return { ...target };
    },
    get holding() {
      return holding;
    },
    get timeS() {
      return timeS;
    },
    get matchTimeS() {
      return matchTimeS;
    },
  };
}
