// Pure: imports only zod and relative shared files. Where a robot's centre stands, and which way it points, to score or collect.
import { z } from 'zod';
import { unitVector, wrapDeg, type Pose2d } from '../geometry/pose2d';
import { alongFace, reefBranches, tagById } from './reef-faces';
import { REEF_LEVELS, type Alliance, type AprilTag, type ReefLevel, type SeasonProfile } from './season-profile';

export const SCORING_SIDES = ['front', 'back', 'left', 'right'] as const;
export const scoringSideSchema = z.enum(SCORING_SIDES);
export type ScoringSide = z.infer<typeof scoringSideSchema>;

export const robotScoringProfileSchema = z.object({
  /** From the reef face (or station/processor tag plane) to the robot centre while scoring, metres. */
  depthM: z.number().finite().nonnegative(),
  scoringSide: scoringSideSchema,
});
export type RobotScoringProfile = z.infer<typeof robotScoringProfileSchema>;

/** Direction of each robot side relative to its heading, counter-clockwise. */
const SIDE_ANGLE_DEG: Record<ScoringSide, number> = { front: 0, left: 90, back: 180, right: -90 };

export type BranchScoringPose = Pose2d & {
  alliance: Alliance;
  branch: string;
  faceIndex: number;
  tagId: number;
  levelHeightsM: Record<ReefLevel, number>;
};

export type ElementPose = Pose2d & { alliance: Alliance; name: string; tagId: number };

/** Robot heading in degrees, (−180, 180], that turns its `side` toward a surface whose outward normal is normalDeg. */
export function headingFacingDeg(normalDeg: number, side: ScoringSide): number {
  return wrapDeg(normalDeg + 180 - SIDE_ANGLE_DEG[side]);
}

/** Robot centre pose depthM out along a tag's normal and leftOfViewerM along its face, with `side` toward the tag. */
export function poseFacingTag(
  tag: Pick<AprilTag, 'xM' | 'yM' | 'yawDeg'>,
  depthM: number,
  leftOfViewerM: number,
  side: ScoringSide,
): Pose2d {
  const outward = unitVector(tag.yawDeg);
  const t = alongFace(tag.yawDeg, leftOfViewerM);
  return {
    xM: tag.xM + outward.xM * depthM + t.xM,
    yM: tag.yM + outward.yM * depthM + t.yM,
    headingDeg: headingFacingDeg(tag.yawDeg, side),
  };
}

/** Scoring height of each level in metres (top of the trough for L1). */
export function levelHeightsM(season: SeasonProfile): Record<ReefLevel, number> {
  const levels = season.reef.levels;
  return Object.fromEntries(REEF_LEVELS.map((l) => [l, levels[l].value.heightM])) as Record<ReefLevel, number>;
}

/** The 12 branch scoring poses of an alliance's reef, in letter order; depthM 0 puts the robot centre on the face. */
export function branchScoringPoses(
  season: SeasonProfile,
  alliance: Alliance,
  robot: RobotScoringProfile,
): BranchScoringPose[] {
  const heights = levelHeightsM(season);
  const offsetM = season.reef.branchLateralOffsetM.value;
  return reefBranches(season, alliance).map((b) => {
    const face = tagById(season, b.tagId);
    const pose = poseFacingTag(face, robot.depthM, -b.sideSign * offsetM, robot.scoringSide);
    return { ...pose, alliance, branch: b.letter, faceIndex: b.faceIndex, tagId: b.tagId, levelHeightsM: heights };
  });
}

/** Poses in front of the centre of each of an alliance's coral stations, `side` toward the station. */
export function coralStationPoses(season: SeasonProfile, alliance: Alliance, robot: RobotScoringProfile): ElementPose[] {
  return season.coralStations[alliance].value.map((station) => ({
    ...poseFacingTag(tagById(season, station.tagId), robot.depthM, 0, robot.scoringSide),
    alliance,
    name: station.name,
    tagId: station.tagId,
  }));
}

/** Pose in front of an alliance's processor opening, `side` toward it. */
export function processorPose(season: SeasonProfile, alliance: Alliance, robot: RobotScoringProfile): ElementPose {
  const { tagId } = season.processors[alliance].value;
  return {
    ...poseFacingTag(tagById(season, tagId), robot.depthM, 0, robot.scoringSide),
    alliance,
    name: 'processor',
    tagId,
  };
}
