// Pure: imports only shared code. Derived quantities of a team's robot profile.
import type { RobotProfile } from '../schemas/robot-profile';

/**
 * Distance in metres from the reef face to the robot's centre while scoring: the standoff, the bumper,
 * and half the frame along the axis of the scoring side (length for front/back, width for left/right).
 */
export function scoringDepthM(profile: Pick<RobotProfile, 'frameLengthM' | 'frameWidthM' | 'bumperThicknessM' | 'standoffM' | 'scoringSide'>): number {
  const half = profile.scoringSide === 'front' || profile.scoringSide === 'back' ? profile.frameLengthM / 2 : profile.frameWidthM / 2;
  return profile.standoffM + profile.bumperThicknessM + half;
}

/**
 * The starting profile of a team that has not filled in its own: a 28 in square frame with 3 in
 * bumpers (common practice, no source), scoring from the front.
 */
export const DEFAULT_ROBOT_PROFILE: RobotProfile = {
  name: 'Robot',
  frameLengthM: 0.7112,
  frameWidthM: 0.7112,
  bumperThicknessM: 0.0762,
  scoringSide: 'front',
  standoffM: 0.05,
  driveMaxSpeedMps: 4.5,
  driveMaxAccelMps2: 6,
  elevatorHeightsM: { L1: 0.3, L2: 0.6, L3: 1.0, L4: 1.6 },
  intakeTimeS: 0.8,
  placeTimeS: 0.5,
};
