import { describe, expect, it } from 'vitest';
import { DEFAULT_ROBOT_PROFILE } from '../../../../shared/domain/robot-profile';
import { robotProfileSchema, type RobotProfile } from '../../../../shared/schemas/robot-profile';
import { issuesFromZod, mapIssues } from '../../../lib/form-errors';
import { formFromProfile, hasChanges, liveScoringDepth, ROBOT_FORM_FIELDS, robotFormSchema } from './robot-profile-form';

const gullwing: RobotProfile = {
  ...DEFAULT_ROBOT_PROFILE,
  name: 'Gullwing',
  frameLengthM: 0.8,
  frameWidthM: 0.66,
  scoringSide: 'left',
  standoffM: 0.04,
};

const errorsOf = (values: Record<string, string>) => {
  const parsed = robotFormSchema.safeParse(values);
  if (parsed.success) return {};
  return mapIssues(issuesFromZod(parsed.error), ROBOT_FORM_FIELDS).fields;
};

describe('formFromProfile', () => {
  it('names one input per profile value, elevator heights by their server path', () => {
    const values = formFromProfile(gullwing);
    expect(Object.keys(values).sort()).toEqual([...ROBOT_FORM_FIELDS].sort());
    expect(values['elevatorHeightsM.L4']).toBe('1.6');
    expect(values.bumperThicknessM).toBe('0.0762');
  });
});

describe('robotFormSchema', () => {
  it('turns the form text back into the same profile', () => {
    const parsed = robotFormSchema.parse(formFromProfile(gullwing));
    expect(parsed).toEqual(gullwing);
    expect(robotProfileSchema.parse(parsed)).toEqual(gullwing);
  });

  it('reads decimal commas and surrounding spaces', () => {
    const parsed = robotFormSchema.parse({ ...formFromProfile(gullwing), standoffM: ' 0,05 ' });
    expect(parsed.standoffM).toBeCloseTo(0.05, 12);
  });

  it('treats a blank number as a field error, not as 0', () => {
    const errors = errorsOf({ ...formFromProfile(gullwing), standoffM: '', 'elevatorHeightsM.L2': '  ' });
    expect(errors).toEqual({
      standoffM: 'Enter the standoff (0 if the bumper touches the reef)',
      'elevatorHeightsM.L2': 'Enter the L2 height',
    });
  });

  it('reports every bad field at once with the shared messages', () => {
    const errors = errorsOf({
      ...formFromProfile(gullwing),
      name: ' ',
      frameLengthM: '-1',
      driveMaxSpeedMps: 'fast',
      'elevatorHeightsM.L4': '3.5',
      scoringSide: 'top',
    });
    expect(errors.name).toBe('Name the robot');
    expect(errors.frameLengthM).toBe('Frame length must be more than 0');
    expect(errors.driveMaxSpeedMps).toBe('Top speed must be a number');
    expect(errors['elevatorHeightsM.L4']).toBe('L4 elevator height is at most 3 m');
    expect(errors.scoringSide).toBeDefined();
  });
});

describe('liveScoringDepth', () => {
  it('adds standoff, bumper and half the frame width for a side that scores left', () => {
    // 0.04 + 0.0762 + 0.66 / 2, as the server test for the same robot.
    const depth = liveScoringDepth(formFromProfile(gullwing));
    expect(depth?.totalM).toBeCloseTo(0.4462, 9);
    expect(depth).toMatchObject({ standoffM: 0.04, bumperM: 0.0762, halfFrameOf: 'width' });
    expect(depth?.halfFrameM).toBeCloseTo(0.33, 12);
  });

  it('uses half the frame length for the front, and its parts add up to the total', () => {
    const depth = liveScoringDepth({ ...formFromProfile(gullwing), scoringSide: 'front' });
    expect(depth?.halfFrameOf).toBe('length');
    expect(depth?.totalM).toBeCloseTo(0.04 + 0.0762 + 0.4, 9);
    expect(depth && depth.standoffM + depth.bumperM + depth.halfFrameM).toBeCloseTo(depth?.totalM ?? Number.NaN, 12);
  });

  it('ignores values the depth does not need', () => {
    expect(liveScoringDepth({ ...formFromProfile(gullwing), intakeTimeS: '' })).not.toBeNull();
  });

  it.each(['', 'abc', '-0.1'])('is null while the standoff reads "%s"', (standoff) => {
    expect(liveScoringDepth({ ...formFromProfile(gullwing), standoffM: standoff })).toBeNull();
  });
});

describe('hasChanges', () => {
  it('is false for the saved profile, however its numbers are written', () => {
    expect(hasChanges(formFromProfile(gullwing), gullwing)).toBe(false);
    expect(hasChanges({ ...formFromProfile(gullwing), frameLengthM: '0.80', name: 'Gullwing ' }, gullwing)).toBe(false);
  });

  it('is true for a changed value and for text that does not parse', () => {
    expect(hasChanges({ ...formFromProfile(gullwing), scoringSide: 'back' }, gullwing)).toBe(true);
    expect(hasChanges({ ...formFromProfile(gullwing), placeTimeS: '' }, gullwing)).toBe(true);
  });
});
