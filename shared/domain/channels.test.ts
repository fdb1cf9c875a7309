import { describe, expect, it } from 'vitest';
import { applySelection } from './channels';

describe('applySelection', () => {
  it('sets the field of a standard channel', () => {
    expect(applySelection({ level: 'L2' }, 'op/reef/branch', 'C')).toEqual({ level: 'L2', branch: 'C' });
    expect(applySelection({}, 'op/cage', 'deep')).toEqual({ cage: 'deep' });
  });

  it.each([
    ['op/reef/branch', 'M'],
    ['op/reef/level', 'L5'],
    ['op/unknown', 'A'],
    ['op/station', 3],
  ])('refuses %s = %j', (channel, value) => {
    expect(applySelection({}, channel, value)).toBeUndefined();
  });
});
