import { z } from 'zod';
import { scoringSideSchema } from '../domain/season/scoring-pose';
import { REEF_LEVELS } from '../domain/season/season-profile';

const metres = (label: string, max: number) =>
  z
    .number({ message: `${label} must be a number` })
    .finite(`${label} must be a number`)
    .min(0, `${label} cannot be negative`)
    .max(max, `${label} is at most ${max} m`);

const positive = (label: string, unit: string, max: number) =>
  z
    .number({ message: `${label} must be a number` })
    .finite(`${label} must be a number`)
    .positive(`${label} must be more than 0`)
    .max(max, `${label} is at most ${max} ${unit}`);

/** A team's robot as Pitwall needs it for targets, the simulator and cycle estimates. */
export const robotProfileSchema = z.object({
  name: z.string().trim().min(1, 'Name the robot').max(40, 'Use at most 40 characters'),
  frameLengthM: positive('Frame length', 'm', 1.5),
  frameWidthM: positive('Frame width', 'm', 1.5),
  bumperThicknessM: metres('Bumper thickness', 0.2),
  scoringSide: scoringSideSchema,
  /** Gap between the bumper edge and the reef face when scoring. */
  standoffM: metres('Standoff', 1),
  driveMaxSpeedMps: positive('Top speed', 'm/s', 8),
  driveMaxAccelMps2: positive('Acceleration', 'm/s²', 20),
  elevatorHeightsM: z.object(
    Object.fromEntries(REEF_LEVELS.map((l) => [l, metres(`${l} elevator height`, 3)])) as Record<
      (typeof REEF_LEVELS)[number],
      ReturnType<typeof metres>
    >,
  ),
  intakeTimeS: positive('Intake time', 's', 10),
  placeTimeS: positive('Place time', 's', 10),
});
export type RobotProfile = z.infer<typeof robotProfileSchema>;

export const storedRobotProfileSchema = z.object({
  profile: robotProfileSchema,
  /** Reef face to robot centre when scoring, from the frame, bumper, side and standoff. */
  scoringDepthM: z.number(),
  updatedAt: z.string().nullable(),
  updatedByName: z.string().nullable(),
});
export type StoredRobotProfile = z.infer<typeof storedRobotProfileSchema>;
