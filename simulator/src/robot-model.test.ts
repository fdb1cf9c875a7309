import { describe, expect, it } from 'vitest';
import { distanceM, type Pose2d } from '../../shared/domain/geometry/pose2d';
import { DEFAULT_ROBOT_PROFILE, scoringDepthM } from '../../shared/domain/robot-profile';
import { branchScoringPoses, coralStationPoses } from '../../shared/domain/season/scoring-pose';
import { season2025 } from '../../shared/domain/season/season-2025';
import { createRobotModel, type ModelEvent, type RobotModel, type RobotModelOptions } from './robot-model';
import { MODEL_STATES, SIM_SIGNALS, simSignalIndex } from './signals';

const robot = DEFAULT_ROBOT_PROFILE; // 4.5 m/s, 6 m/s², front scoring
const scoring = { depthM: scoringDepthM(robot), scoringSide: robot.scoringSide };
const branchPose = (letter: string) => branchScoringPoses(season2025, 'blue', scoring).find((p) => p.branch === letter)!;
// A blue operator's "left" station is the high-y one: +y is to the left of a blue driver.
const blueLeftStation = coralStationPoses(season2025, 'blue', scoring).find((p) => p.name === 'high-y')!;

function makeModel(overrides: Partial<RobotModelOptions> = {}): RobotModel {
  return createRobotModel({ season: season2025, robot, alliance: 'blue', seed: 1, ...overrides });
}

/** Steps at 50 Hz until `until` holds or maxS passes; returns every event on the way. */
function run(model: RobotModel, maxS: number, until: (e: ModelEvent[]) => boolean = () => false): ModelEvent[] {
  const all: ModelEvent[] = [];
  for (let t = 0; t < maxS; t += 0.02) {
    all.push(...model.step(0.02));
    if (until(all)) break;
  }
  return all;
}

function selectCoralCycle(model: RobotModel, branch: string, level: string) {
  model.applyOp('op/reef/branch', branch);
  model.applyOp('op/reef/level', level);
  model.applyOp('op/station', 'left');
  model.applyOp('op/algae', 'none');
}

const read = (model: RobotModel, name: string) => model.sample()[simSignalIndex(name)]!;

describe('createRobotModel', () => {
  it('drives a straight 4 m to the station on the closed-form trapezoid: 2 m at half of 1.6389 s', () => {
    // 4.5 m/s, 6 m/s²: t_ramp 0.75 s, s_ramp 1.6875 m, cruise 0.13889 s, 1.63889 s in all (worked example,
    // constant-acceleration kinematics); the station pose's own heading, so there is nothing to turn.
    const start: Pose2d = { ...blueLeftStation, xM: blueLeftStation.xM + 4 };
    const model = makeModel({ startPose: start, preload: false });
    model.applyOp('op/station', 'left');
    model.setMode('teleop');
    model.step(1.638889 / 2);
    expect(model.stateName).toBe('to_station');
    expect(distanceM(model.pose, start)).toBeCloseTo(2, 4);
    expect(Math.hypot(model.velocity.vxMps, model.velocity.vyMps)).toBeCloseTo(4.5, 4);
    model.step(1.638889 / 2 - 0.0001);
    expect(model.stateName).toBe('to_station');
    model.step(0.0002);
    expect(model.stateName).toBe('intaking');
    expect(distanceM(model.pose, blueLeftStation)).toBeLessThan(1e-9);
  });

  it('drives a short 1 m as a triangle peaking at √(a·d) = 2.4495 m/s after 0.4082 s', () => {
    const start: Pose2d = { ...blueLeftStation, xM: blueLeftStation.xM + 1 };
    const model = makeModel({ startPose: start, preload: false });
    model.applyOp('op/station', 'left');
    model.setMode('teleop');
    model.step(0.408248);
    expect(Math.hypot(model.velocity.vxMps, model.velocity.vyMps)).toBeCloseTo(2.44949, 3);
    expect(distanceM(model.pose, start)).toBeCloseTo(0.5, 4);
  });

  it('ends a cycle at the selected branch’s scoring pose with the elevator at the selected level', () => {
    const model = makeModel();
    selectCoralCycle(model, 'E', 'L3');
    model.setMode('teleop');
    const events = run(model, 20, (e) => e.some((x) => x.kind === 'placed' || x.kind === 'missed'));
    expect(model.stateName).not.toBe('placing');
    const target = branchPose('E');
    const outcome = events.find((e) => e.kind === 'placed' || e.kind === 'missed')!;
    expect(outcome.data).toMatchObject({ branch: 'E', level: 'L3' });
    expect(distanceM(model.pose, target)).toBeLessThan(0.01);
    expect(model.pose.headingDeg).toBeCloseTo(target.headingDeg, 3);
    expect(model.elevatorHeightM).toBeCloseTo(robot.elevatorHeightsM.L3, 6);
  });

  it('goes to the new branch when op/reef/branch changes mid-drive, keeping its speed along the new line', () => {
    // From the starting line G (the face toward the barge) is straight ahead and J (the next face, counter-clockwise)
    // ahead and to the left, so the re-planned line keeps most of the speed.
    const model = makeModel();
    selectCoralCycle(model, 'G', 'L2');
    model.setMode('teleop');
    run(model, 0.4);
    expect(model.stateName).toBe('to_reef');
    const goal = () => ({ xM: read(model, 'drive/goal/x'), yM: read(model, 'drive/goal/y') });
    const goalBefore = goal();
    expect(model.applyOp('op/reef/branch', 'J')).toBe(true);
    expect(model.target.branch).toBe('G');
    run(model, 0.7, () => model.target.branch === 'J');
    expect(model.target.branch).toBe('J');
    expect(distanceM(goal(), goalBefore)).toBeGreaterThan(1);
    expect(Math.hypot(model.velocity.vxMps, model.velocity.vyMps)).toBeGreaterThan(1);
    const events = run(model, 20, (e) => e.some((x) => x.kind === 'placed' || x.kind === 'missed'));
    expect(events.find((e) => e.kind === 'placed' || e.kind === 'missed')!.data.branch).toBe('J');
    expect(distanceM(model.pose, branchPose('J'))).toBeLessThan(0.01);
  });

  it('reaches a branch on the far side of the reef around it, never closer than a bumper to a face', () => {
    const model = makeModel();
    selectCoralCycle(model, 'G', 'L2');
    model.setMode('teleop');
    run(model, 1);
    model.applyOp('op/reef/branch', 'A');
    const reef = season2025.reefs.blue;
    // Face distance plus half the bumpered width: 0.8317 + 0.3556 + 0.0762 m.
    const closestAllowedM = reef.centreToFaceM.value + robot.frameWidthM / 2 + robot.bumperThicknessM;
    let closestM = Infinity;
    const events = run(model, 20, (e) => {
      closestM = Math.min(closestM, distanceM(model.pose, reef.centre.value));
      return e.some((x) => x.kind === 'placed' || x.kind === 'missed');
    });
    expect(events.find((e) => e.kind === 'placed' || e.kind === 'missed')!.data.branch).toBe('A');
    expect(distanceM(model.pose, branchPose('A'))).toBeLessThan(0.01);
    expect(closestM).toBeGreaterThan(closestAllowedM);
  });

  it('waits a seeded driver reaction before adopting a new selection, and says so', () => {
    const model = makeModel();
    selectCoralCycle(model, 'A', 'L2');
    model.setMode('teleop');
    model.step(0.02);
    model.applyOp('op/reef/level', 'L4');
    expect(model.step(0.1).some((e) => e.kind === 'target_changed')).toBe(false);
    const changed = run(model, 1, (e) => e.some((x) => x.kind === 'target_changed')).find((e) => e.kind === 'target_changed')!;
    expect(changed.data.level).toBe('L4');
    expect(changed.data.reactionS as number).toBeGreaterThanOrEqual(0.12);
    expect(changed.data.reactionS as number).toBeLessThanOrEqual(0.6);
  });

  it('refuses an op value or channel it does not know, so the caller does not acknowledge it', () => {
    const model = makeModel();
    model.applyOp('op/reef/branch', 'C');
    expect(model.applyOp('op/reef/branch', 'M')).toBe(false);
    expect(model.applyOp('op/reef/level', 'L5')).toBe(false);
    expect(model.applyOp('op/cage', 3)).toBe(false);
    expect(model.applyOp('op/reef/colour', 'red')).toBe(false);
    expect(model.selection).toEqual({ branch: 'C' });
  });

  it('sags the battery under hard acceleration and rests near 12.6 V', () => {
    const idle = makeModel({ preload: false });
    idle.setMode('teleop');
    idle.step(0.02);
    expect(idle.stateName).toBe('idle');
    const resting = read(idle, 'battery/voltage');

    const start: Pose2d = { ...blueLeftStation, xM: blueLeftStation.xM + 4 };
    const model = makeModel({ startPose: start, preload: false });
    model.applyOp('op/station', 'left');
    model.setMode('teleop');
    model.step(0.02);
    model.step(0.02);
    // Straight, no turn: four modules at 6 m/s² draw about 4 × (1 + 6.5·6) = 160 A, which 0.015 Ω turns into 2.4 V.
    const loaded = read(model, 'battery/voltage');
    expect(read(model, 'battery/current')).toBeGreaterThan(160);
    expect(resting).toBeGreaterThan(12.3);
    expect(loaded).toBeLessThan(resting - 2.2);
    expect(loaded).toBeGreaterThan(6.8);
  });

  it('reports a brownout when a worn battery sags below 6.8 V', () => {
    const model = makeModel({ battery: { resistanceOhm: 0.05 } });
    selectCoralCycle(model, 'J', 'L4');
    model.setMode('teleop');
    const events = run(model, 2);
    expect(events.some((e) => e.kind === 'brownout')).toBe(true);
    expect(read(model, 'system/brownouts')).toBeGreaterThan(0);
  });

  it('emits mode_changed, stops at once when disabled and starts again from idle', () => {
    const model = makeModel();
    selectCoralCycle(model, 'B', 'L1');
    model.setMode('auto');
    expect(model.step(0).map((e) => e.kind)).toContain('mode_changed');
    run(model, 0.5);
    model.setMode('disabled');
    expect(model.step(0.02)[0]).toEqual({ kind: 'mode_changed', data: { from: 'auto', to: 'disabled' } });
    expect(model.stateName).toBe('disabled');
    const pose = model.pose;
    run(model, 0.5);
    expect(model.pose).toEqual(pose);
    model.setMode('teleop');
    run(model, 0.1);
    expect(model.stateName).toBe('to_reef');
  });

  it('gives the same events for the same seed and different ones for another seed', () => {
    const play = (seed: number) => {
      const model = makeModel({ seed });
      selectCoralCycle(model, 'D', 'L4');
      model.setMode('teleop');
      const timed: (ModelEvent & { tS: number })[] = [];
      for (let k = 1; k <= 1500; k += 1) for (const e of model.step(0.02)) timed.push({ ...e, tS: k * 0.02 });
      return timed;
    };
    expect(play(4)).toEqual(play(4));
    expect(play(4)).not.toEqual(play(5));
  });

  it('samples one value per signal, with no NaN after the first step and enums as label indexes', () => {
    const model = makeModel();
    selectCoralCycle(model, 'K', 'L2');
    model.setMode('teleop');
    model.step(0.02);
    const row = model.sample();
    expect(row.length).toBe(SIM_SIGNALS.length);
    expect(row.some((v) => Number.isNaN(v))).toBe(false);
    expect(row[simSignalIndex('state/machine')]).toBe(MODEL_STATES.indexOf(model.stateName));
    expect(row[simSignalIndex('target/branch')]).toBe(10);
    expect(row[simSignalIndex('match/mode')]).toBe(2);
  });

  it('scores algae after the coral when algae is selected, then heads for the station', () => {
    const model = makeModel({ seed: 2 });
    selectCoralCycle(model, 'C', 'L2');
    model.applyOp('op/algae', 'processor');
    model.setMode('teleop');
    const events = run(model, 25, (e) => e.some((x) => x.kind === 'algae_scored'));
    expect(events.find((e) => e.kind === 'acquired' && e.data.piece === 'algae')).toBeDefined();
    expect(events.find((e) => e.kind === 'algae_scored')!.data).toEqual({ where: 'processor', phase: 'teleop' });
    run(model, 0.1);
    expect(model.stateName).toBe('to_station');
  });

  it('drives to the cage and climbs when a cage is called in teleop', () => {
    const model = makeModel({ seed: 3, station: 1 });
    selectCoralCycle(model, 'A', 'L4');
    model.applyOp('op/cage', 'shallow');
    model.setMode('teleop');
    const events = run(model, 15, (e) => e.some((x) => x.kind === 'cage'));
    expect(events.find((e) => e.kind === 'cage')!.data).toEqual({ kind: 'shallow', failed: null });
    expect(model.stateName).toBe('parked');
    const cageY = season2025.barge.cages.blue.value[0]!.yM;
    expect(model.pose.yM).toBeCloseTo(cageY, 6);
  });
});
