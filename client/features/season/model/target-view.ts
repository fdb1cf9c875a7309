import type { FieldLayer, FieldWindow, RobotLayer, TargetLayer } from '../../../components/field/field-drawing';
import type { Alliance, SeasonProfile } from '../../../../shared/domain/season/season-profile';
import type { BranchTarget } from '../../../../shared/domain/season/targets';
import type { RobotProfile } from '../../../../shared/schemas/robot-profile';

/** Bumper to bumper, metres: what the robot's footprint on the field is. */
export type RobotOutline = { lengthM: number; widthM: number };

export function bumperOutline(profile: Pick<RobotProfile, 'frameLengthM' | 'frameWidthM' | 'bumperThicknessM'>): RobotOutline {
  return {
    lengthM: profile.frameLengthM + 2 * profile.bumperThicknessM,
    widthM: profile.frameWidthM + 2 * profile.bumperThicknessM,
  };
}

/**
 * A square window around an alliance's reef that holds every target with a robot standing on it,
 * plus paddingM on each side. Works for any depth, so a 3 m override still fits.
 */
export function reefWindow(
  season: SeasonProfile,
  alliance: Alliance,
  targets: readonly Pick<BranchTarget, 'x' | 'y'>[],
  robot: RobotOutline,
  paddingM = 0.15,
): FieldWindow {
  const centre = season.reefs[alliance].centre.value;
  // The reef hexagon's corners are 1 / cos 30° further out than its faces.
  const reefRadiusM = season.reefs[alliance].centreToFaceM.value / Math.cos(Math.PI / 6);
  const robotRadiusM = Math.hypot(robot.lengthM, robot.widthM) / 2;
  const reachM = Math.max(
    reefRadiusM,
    ...targets.map((t) => Math.max(Math.abs(t.x - centre.xM), Math.abs(t.y - centre.yM)) + robotRadiusM),
  );
  const halfM = reachM + paddingM;
  return { xMinM: centre.xM - halfM, yMinM: centre.yM - halfM, xMaxM: centre.xM + halfM, yMaxM: centre.yM + halfM };
}

export type TargetLayerOptions = {
  targetColour: string;
  robotColour: string;
  /** The branch whose marker is highlighted and where the robot stands, if any. */
  activeBranch: string | null;
  robot: RobotOutline;
};

/**
 * The robot footprint on the active branch (under the markers, so every marker stays visible), then the 12
 * lettered markers. Markers carry no heading tick: it would cross the letter, and the footprint shows the heading.
 */
export function targetLayers(targets: readonly BranchTarget[], options: TargetLayerOptions): FieldLayer[] {
  const active = targets.find((t) => t.branch === options.activeBranch);
  const robot: RobotLayer[] = active
    ? [
        {
          kind: 'robot',
          id: 'robot',
          xM: active.x,
          yM: active.y,
          headingDeg: active.headingDeg,
          lengthM: options.robot.lengthM,
          widthM: options.robot.widthM,
          colour: options.robotColour,
        },
      ]
    : [];
  const markers = targets.map(
    (t): TargetLayer => ({
      kind: 'target',
      id: t.branch,
      xM: t.x,
      yM: t.y,
      colour: options.targetColour,
      label: t.branch,
      isHighlighted: t.branch === options.activeBranch,
    }),
  );
  return [...robot, ...markers];
}
