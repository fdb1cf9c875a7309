// Pure: no I/O, clocks or randomness; imports only shared/. The poses the simulated robot drives to, for one alliance.
import { unitVector, type Point2d, type Pose2d } from '../../shared/domain/geometry/pose2d';
import type { BranchLetter } from '../../shared/domain/channels';
import { scoringDepthM } from '../../shared/domain/robot-profile';
import { tagById } from '../../shared/domain/season/reef-faces';
import {
  branchScoringPoses,
  coralStationPoses,
  headingFacingDeg,
  poseFacingTag,
  processorPose,
} from '../../shared/domain/season/scoring-pose';
import type { Alliance, DriverStation, SeasonProfile } from '../../shared/domain/season/season-profile';
import type { RobotProfile } from '../../shared/schemas/robot-profile';

export interface BranchTarget {
  branch: BranchLetter;
  faceIndex: number;
  /** Where the robot centre stands to place, scoring side to the face. */
  scoring: Pose2d;
  /** APPROACH_M straight out from `scoring`: where the fast drive ends and the slow align begins. */
  approach: Pose2d;
}

export interface SimTargets {
  alliance: Alliance;
  reefCentre: Point2d;
  /** The reef's corner radius plus half the robot's bumpered width: paths keep out of this circle. */
  reefClearanceM: number;
  branches: Record<BranchLetter, BranchTarget>;
  stations: Record<'left' | 'right', Pose2d & { name: string }>;
  processor: Pose2d;
  net: Pose2d;
  cage: Pose2d;
  park: Pose2d;
  start: Pose2d;
  /** x of the alliance's starting line; the robot has left once its bumpers are wholly on the reef side. */
  startingLineXM: number;
  /** Bumper edge to robot centre along the robot's length, m. */
  halfLengthM: number;
}

/** The align leg's length (invented: long enough to see on the field map, short enough to be quick). */
export const APPROACH_M = 0.5;
/** Gap kept from the barge when scoring in the net or parking (invented). */
const BARGE_GAP_M = 0.3;

/**
 * Station sides as the operator calls them, seen from the alliance's driver station: +y is to the left of a blue
 * driver (season coordinates), so a blue "left" is the high-y station and a red "left" the low-y one.
 */
const STATION_NAME: Record<Alliance, Record<'left' | 'right', string>> = {
  blue: { left: 'high-y', right: 'low-y' },
  red: { left: 'low-y', right: 'high-y' },
};

/** All drive targets of the simulated robot for one alliance and driver station. */
export function simTargets(
  season: SeasonProfile,
  robot: RobotProfile,
  alliance: Alliance,
  station: DriverStation,
): SimTargets {
  const scoring = { depthM: scoringDepthM(robot), scoringSide: robot.scoringSide };
  const halfLengthM = robot.frameLengthM / 2 + robot.bumperThicknessM;
  const halfWidthM = robot.frameWidthM / 2 + robot.bumperThicknessM;
  const reef = season.reefs[alliance];
  const cornerRadiusM = reef.centreToFaceM.value / Math.cos(Math.PI / 6);

  const branches = {} as Record<BranchLetter, BranchTarget>;
  for (const pose of branchScoringPoses(season, alliance, scoring)) {
    const out = unitVector(tagById(season, pose.tagId).yawDeg);
    const place = { xM: pose.xM, yM: pose.yM, headingDeg: pose.headingDeg };
    branches[pose.branch as BranchLetter] = {
      branch: pose.branch as BranchLetter,
      faceIndex: pose.faceIndex,
      scoring: place,
      approach: { xM: place.xM + out.xM * APPROACH_M, yM: place.yM + out.yM * APPROACH_M, headingDeg: place.headingDeg },
    };
  }

  const stationPoses = coralStationPoses(season, alliance, scoring);
  const stationByChoice = (choice: 'left' | 'right') => {
    const name = STATION_NAME[alliance][choice];
    const found = stationPoses.find((p) => p.name === name) ?? stationPoses[0]!;
    return { xM: found.xM, yM: found.yM, headingDeg: found.headingDeg, name };
  };

  // The barge face toward this alliance's half points at its own wall: −x for blue, +x for red.
  const bargeCentreXM = season.barge.centreXM.value;
  const bargeNormalDeg = alliance === 'blue' ? 180 : 0;
  const bargeFaceXM = bargeCentreXM + (alliance === 'blue' ? -1 : 1) * (season.barge.sizeM.value.depthM / 2);
  const cages = season.barge.cages[alliance].value;
  const cage = cages[Math.min(cages.length - 1, station - 1)] ?? { xM: bargeCentreXM, yM: season.field.widthM.value / 2 };
  const bargePose = (yM: number, depthM: number) =>
    poseFacingTag({ xM: bargeFaceXM, yM, yawDeg: bargeNormalDeg }, depthM, 0, robot.scoringSide);
  // The net: from memory (low confidence), an alliance shoots into the barge half away from its own cages.
  const netYM = season.field.widthM.value - cages.reduce((sum, c) => sum + c.yM, 0) / Math.max(1, cages.length);

  const processor = processorPose(season, alliance, scoring);
  const line = season.startingLines[alliance].value;
  const driver = season.driverStations[alliance].value.find((d) => d.station === station);
  const towardBarge = alliance === 'blue' ? 1 : -1;

  return {
    alliance,
    reefCentre: { xM: reef.centre.value.xM, yM: reef.centre.value.yM },
    reefClearanceM: cornerRadiusM + halfWidthM,
    branches,
    stations: { left: stationByChoice('left'), right: stationByChoice('right') },
    processor: { xM: processor.xM, yM: processor.yM, headingDeg: processor.headingDeg },
    net: bargePose(netYM, scoring.depthM + BARGE_GAP_M),
    cage: bargePose(cage.yM, halfLengthM),
    park: bargePose(cage.yM, halfLengthM + BARGE_GAP_M + APPROACH_M),
    // Robots start touching the starting line on the barge side, scoring side toward their reef (from memory).
    start: {
      xM: line.xM + towardBarge * halfLengthM,
      yM: driver?.yM ?? season.field.widthM.value / 2,
      headingDeg: headingFacingDeg(alliance === 'blue' ? 0 : 180, robot.scoringSide),
    },
    startingLineXM: line.xM,
    halfLengthM,
  };
}
