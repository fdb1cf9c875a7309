import { describe, expect, it } from 'vitest';
import { DEFAULT_ROBOT_PROFILE } from '../../../../shared/domain/robot-profile';
import type { RobotProfile } from '../../../../shared/schemas/robot-profile';
import {
  depthError,
  initialTargetControls,
  resolveControls,
  targetControlsReducer,
  targetsQueryFor,
  type TargetControls,
  type TargetControlsAction,
} from './target-controls';

const gullwing: RobotProfile = { ...DEFAULT_ROBOT_PROFILE, frameLengthM: 0.8, frameWidthM: 0.66, scoringSide: 'left', standoffM: 0.04 };
const run = (...actions: TargetControlsAction[]): TargetControls => actions.reduce(targetControlsReducer, initialTargetControls());

describe('depthError', () => {
  it.each([
    ['0.45', null],
    ['3', null],
    ['0', null],
    ['', 'Enter a depth in metres, or reset to the robot profile'],
    ['deep', 'Depth must be a number of metres'],
    ['-0.1', 'Depth cannot be negative'],
    ['3.5', 'Depth is at most 3 m'],
  ])('for "%s" is %s', (text, expected) => {
    expect(depthError(text)).toBe(expected);
  });
});

describe('targetsQueryFor', () => {
  it('sends only the alliance while nothing is overridden', () => {
    expect(targetsQueryFor(run({ type: 'alliance', alliance: 'red' }))).toEqual({ alliance: 'red' });
  });

  it('sends side and depth overrides', () => {
    expect(targetsQueryFor(run({ type: 'side', side: 'back' }, { type: 'depth', text: '0.45' }))).toEqual({
      alliance: 'blue',
      side: 'back',
      depth: 0.45,
    });
  });

  it('keeps the last depth that made sense while the text does not', () => {
    const state = run({ type: 'depth', text: '0.5' }, { type: 'depth', text: '0.5x' });
    expect(state.depthText).toBe('0.5x');
    expect(targetsQueryFor(state).depth).toBe(0.5);
  });

  it('never sends a blank depth as 0', () => {
    expect(targetsQueryFor(run({ type: 'depth', text: '' })).depth).toBeUndefined();
  });
});

describe('targetControlsReducer', () => {
  it('resets to the robot profile but keeps the alliance', () => {
    const state = run({ type: 'alliance', alliance: 'red' }, { type: 'side', side: 'front' }, { type: 'depth', text: '1' }, { type: 'reset' });
    expect(state).toEqual(initialTargetControls('red'));
  });
});

describe('resolveControls', () => {
  it('shows the robot profile’s side and depth while nothing is overridden', () => {
    const shown = resolveControls(initialTargetControls(), gullwing);
    expect(shown).toMatchObject({ side: 'left', depthText: '0.446', depthError: null, isSideOverridden: false, isDepthOverridden: false });
    expect(shown.profileDepthM).toBeCloseTo(0.4462, 9);
  });

  it('follows the profile depth of the chosen side, as the server does', () => {
    // Front: half the 0.8 m frame length instead of half the 0.66 m width.
    const shown = resolveControls(run({ type: 'side', side: 'front' }), gullwing);
    expect(shown).toMatchObject({ side: 'front', depthText: '0.516', isSideOverridden: true, isDepthOverridden: false });
  });

  it('shows typed depth text as typed, with its error', () => {
    const shown = resolveControls(run({ type: 'depth', text: '-1' }), gullwing);
    expect(shown).toMatchObject({ depthText: '-1', depthError: 'Depth cannot be negative', isDepthOverridden: true });
  });

  it('does not call choosing the profile’s own side an override', () => {
    expect(resolveControls(run({ type: 'side', side: 'left' }), gullwing).isSideOverridden).toBe(false);
  });
});
