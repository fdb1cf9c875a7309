import { z } from 'zod';
import { scoringDepthM } from '../../../../shared/domain/robot-profile';
import { REEF_LEVELS, type ReefLevel } from '../../../../shared/domain/season/season-profile';
import { robotProfileSchema, type RobotProfile } from '../../../../shared/schemas/robot-profile';
import { parseDecimal } from '../../../lib/format-number';

type LevelField = `elevatorHeightsM.${ReefLevel}`;
type NumberField = Exclude<keyof RobotProfile, 'name' | 'scoringSide' | 'elevatorHeightsM'> | LevelField;

/** Input names, equal to the paths of the server's field issues (`elevatorHeightsM.L4`). */
export const ROBOT_FORM_FIELDS = [
  'name',
  'frameLengthM',
  'frameWidthM',
  'bumperThicknessM',
  'scoringSide',
  'standoffM',
  'driveMaxSpeedMps',
  'driveMaxAccelMps2',
  ...REEF_LEVELS.map((l): LevelField => `elevatorHeightsM.${l}`),
  'intakeTimeS',
  'placeTimeS',
] as const satisfies readonly (NumberField | 'name' | 'scoringSide')[];
export type RobotFormField = (typeof ROBOT_FORM_FIELDS)[number];

/** What the inputs hold: text exactly as typed. */
export type RobotFormValues = Record<RobotFormField, string>;

const shape = robotProfileSchema.shape;
const levelShape = shape.elevatorHeightsM.shape;

/** Blank is its own error ("enter …"), never 0; other text must read as a decimal and pass the shared rule. */
const decimal = (emptyMessage: string, rule: z.ZodNumber) =>
  z.string().trim().min(1, emptyMessage).transform(parseDecimal).pipe(rule);

const numberRules: Record<NumberField, z.ZodType<number, string>> = {
  frameLengthM: decimal('Enter the frame length', shape.frameLengthM),
  frameWidthM: decimal('Enter the frame width', shape.frameWidthM),
  bumperThicknessM: decimal('Enter the bumper thickness (0 without bumpers)', shape.bumperThicknessM),
  standoffM: decimal('Enter the standoff (0 if the bumper touches the reef)', shape.standoffM),
  driveMaxSpeedMps: decimal('Enter the top speed', shape.driveMaxSpeedMps),
  driveMaxAccelMps2: decimal('Enter the acceleration', shape.driveMaxAccelMps2),
  'elevatorHeightsM.L1': decimal('Enter the L1 height', levelShape.L1),
  'elevatorHeightsM.L2': decimal('Enter the L2 height', levelShape.L2),
  'elevatorHeightsM.L3': decimal('Enter the L3 height', levelShape.L3),
  'elevatorHeightsM.L4': decimal('Enter the L4 height', levelShape.L4),
  intakeTimeS: decimal('Enter the intake time', shape.intakeTimeS),
  placeTimeS: decimal('Enter the place time', shape.placeTimeS),
};

/**
 * Form text → robot profile, checked field by field so every problem shows at once. Issue paths are the
 * input names, so they land on the same fields as the server's issues.
 */
export const robotFormSchema = z
  .object({ name: shape.name, scoringSide: shape.scoringSide, ...numberRules })
  .transform(
    (v): RobotProfile => ({
      name: v.name,
      frameLengthM: v.frameLengthM,
      frameWidthM: v.frameWidthM,
      bumperThicknessM: v.bumperThicknessM,
      scoringSide: v.scoringSide,
      standoffM: v.standoffM,
      driveMaxSpeedMps: v.driveMaxSpeedMps,
      driveMaxAccelMps2: v.driveMaxAccelMps2,
      elevatorHeightsM: {
        L1: v['elevatorHeightsM.L1'],
        L2: v['elevatorHeightsM.L2'],
        L3: v['elevatorHeightsM.L3'],
        L4: v['elevatorHeightsM.L4'],
      },
      intakeTimeS: v.intakeTimeS,
      placeTimeS: v.placeTimeS,
    }),
  );

/** The profile as form text; numbers keep every digit the server stored. */
export function formFromProfile(profile: RobotProfile): RobotFormValues {
  return {
    name: profile.name,
    frameLengthM: String(profile.frameLengthM),
    frameWidthM: String(profile.frameWidthM),
    bumperThicknessM: String(profile.bumperThicknessM),
    scoringSide: profile.scoringSide,
    standoffM: String(profile.standoffM),
    driveMaxSpeedMps: String(profile.driveMaxSpeedMps),
    driveMaxAccelMps2: String(profile.driveMaxAccelMps2),
    'elevatorHeightsM.L1': String(profile.elevatorHeightsM.L1),
    'elevatorHeightsM.L2': String(profile.elevatorHeightsM.L2),
    'elevatorHeightsM.L3': String(profile.elevatorHeightsM.L3),
    'elevatorHeightsM.L4': String(profile.elevatorHeightsM.L4),
    intakeTimeS: String(profile.intakeTimeS),
    placeTimeS: String(profile.placeTimeS),
  };
}

export type ScoringDepthParts = {
  standoffM: number;
  bumperM: number;
  /** Half the frame along the scoring axis: its length for front/back, its width for left/right. */
  halfFrameM: number;
  halfFrameOf: 'length' | 'width';
  totalM: number;
};

/**
 * Reef face to robot centre for what is typed so far, with the parts it adds up; null while a value it
 * needs (frame length or width, bumper, standoff, side) is blank or out of range.
 */
export function liveScoringDepth(values: RobotFormValues): ScoringDepthParts | null {
  const side = shape.scoringSide.safeParse(values.scoringSide);
  const read = (field: 'frameLengthM' | 'frameWidthM' | 'bumperThicknessM' | 'standoffM') => {
    const parsed = numberRules[field].safeParse(values[field]);
    return parsed.success ? parsed.data : null;
  };
  const frameLengthM = read('frameLengthM');
  const frameWidthM = read('frameWidthM');
  const bumperThicknessM = read('bumperThicknessM');
  const standoffM = read('standoffM');
  if (!side.success || frameLengthM === null || frameWidthM === null || bumperThicknessM === null || standoffM === null) {
    return null;
  }
  const scoringSide = side.data;
  const halfFrameOf = scoringSide === 'front' || scoringSide === 'back' ? 'length' : 'width';
  return {
    standoffM,
    bumperM: bumperThicknessM,
    halfFrameM: (halfFrameOf === 'length' ? frameLengthM : frameWidthM) / 2,
    halfFrameOf,
    totalM: scoringDepthM({ frameLengthM, frameWidthM, bumperThicknessM, standoffM, scoringSide }),
  };
}

/** Whether the form says something other than the saved profile; text that doesn't parse always differs. */
export function hasChanges(values: RobotFormValues, saved: RobotProfile): boolean {
  const parsed = robotFormSchema.safeParse(values);
  if (!parsed.success) return true;
  const now = formFromProfile(parsed.data);
  const before = formFromProfile(saved);
  return ROBOT_FORM_FIELDS.some((f) => now[f] !== before[f]);
}
