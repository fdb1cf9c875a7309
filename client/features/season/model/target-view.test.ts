import { describe, expect, it } from 'vitest';
import { DEFAULT_ROBOT_PROFILE, scoringDepthM } from '../../../../shared/domain/robot-profile';
import { season2025 } from '../../../../shared/domain/season/season-2025';
import { branchTargets } from '../../../../shared/domain/season/targets';
import { bumperOutline, reefWindow, targetLayers } from './target-view';

const robot = bumperOutline({ frameLengthM: 0.8, frameWidthM: 0.66, bumperThicknessM: 0.0762 });
const red = branchTargets(season2025, 'red', { depthM: scoringDepthM(DEFAULT_ROBOT_PROFILE), scoringSide: 'front' }).targets;

describe('bumperOutline', () => {
  it('adds a bumper on both ends and both sides', () => {
    expect(robot.lengthM).toBeCloseTo(0.9524, 12);
    expect(robot.widthM).toBeCloseTo(0.8124, 12);
  });
});

describe('reefWindow', () => {
  it('is a square centred on the alliance reef', () => {
    const w = reefWindow(season2025, 'red', red, robot);
    expect(w.xMaxM - w.xMinM).toBeCloseTo(w.yMaxM - w.yMinM, 12);
    expect((w.xMinM + w.xMaxM) / 2).toBeCloseTo(13.058902, 9);
    expect((w.yMinM + w.yMaxM) / 2).toBeCloseTo(4.0259, 9);
  });

  it('holds every target with the whole robot on it', () => {
    const w = reefWindow(season2025, 'red', red, robot, 0);
    const r = Math.hypot(robot.lengthM, robot.widthM) / 2;
    for (const t of red) {
      expect(t.x - r).toBeGreaterThanOrEqual(w.xMinM - 1e-9);
      expect(t.x + r).toBeLessThanOrEqual(w.xMaxM + 1e-9);
      expect(t.y - r).toBeGreaterThanOrEqual(w.yMinM - 1e-9);
      expect(t.y + r).toBeLessThanOrEqual(w.yMaxM + 1e-9);
    }
  });

  it('grows with a deeper override', () => {
    const far = branchTargets(season2025, 'blue', { depthM: 3, scoringSide: 'front' }).targets;
    const near = branchTargets(season2025, 'blue', { depthM: 0.4, scoringSide: 'front' }).targets;
    const size = (t: typeof far) => {
      const w = reefWindow(season2025, 'blue', t, robot);
      return w.xMaxM - w.xMinM;
    };
    expect(size(far)).toBeGreaterThan(size(near) + 4);
  });
});

describe('targetLayers', () => {
  const options = { targetColour: '#D55E00', robotColour: '#F5A30F', robot };

  it('puts the robot on the active branch first, then 12 markers with only that one highlighted', () => {
    const layers = targetLayers(red, { ...options, activeBranch: 'C' });
    expect(layers).toHaveLength(13);
    const [first, ...markers] = layers;
    const c = red.find((t) => t.branch === 'C')!;
    expect(first).toMatchObject({ kind: 'robot', xM: c.x, yM: c.y, headingDeg: c.headingDeg, lengthM: robot.lengthM, widthM: robot.widthM });
    expect(markers.map((m) => m.id).join('')).toBe('ABCDEFGHIJKL');
    expect(markers.filter((m) => m.kind === 'target' && m.isHighlighted).map((m) => m.id)).toEqual(['C']);
  });

  it('draws no robot when no branch is active', () => {
    const layers = targetLayers(red, { ...options, activeBranch: null });
    expect(layers.every((l) => l.kind === 'target')).toBe(true);
  });
});
