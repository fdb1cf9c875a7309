import { describe, expect, it } from 'vitest';
import { channelSuggestions, checkChannel, checkHexColour, checkNumber, checkOptions, checkThresholds } from './property-rules';

describe('checkChannel', () => {
  it.each([
    ['op/reef/level', 'level-picker', true],
    ['  op/reef/level ', 'level-picker', true],
    ['robot/battery/voltage', 'readout', true],
    ['op/reef/branch', 'target-echo', true],
    ['robot/reef/level', 'level-picker', false],
    ['sys/clients', 'lamp', false],
    ['', 'push-pad', false],
    ['op/has space', 'push-pad', false],
  ] as const)('%s on a %s is ok: %s', (text, kind, ok) => {
    expect(checkChannel(text, kind).ok).toBe(ok);
  });

  it('says what a publishing tile needs', () => {
    expect(checkChannel('robot/x', 'latch-pad')).toEqual({ ok: false, message: 'A tile that publishes writes an op/ channel' });
  });
});

describe('channelSuggestions', () => {
  it('offers op/ channels to writers and robot/ channels first to readers', () => {
    expect(channelSuggestions('level-picker')).toContain('op/reef/level');
    expect(channelSuggestions('level-picker').every((c) => c.startsWith('op/'))).toBe(true);
    expect(channelSuggestions('readout')[0]).toMatch(/^robot\//);
  });
});

describe('checkOptions', () => {
  it('names duplicate values, blanks and a short list', () => {
    const result = checkOptions(
      [
        { label: 'Left', value: 'left' },
        { label: '', value: 'left' },
      ],
      'station-picker',
    );
    expect(result.ok).toBe(false);
    expect(result.problems.rows).toEqual([{}, { label: 'Give the option a label', value: 'Same value as option 1' }]);
    expect(checkOptions([{ label: 'Only', value: 'only' }], 'choice-pad').problems.list).toBe('Give at least 2 options');
  });
});

describe('checkNumber', () => {
  it('reads numbers with a comma or point and applies limits', () => {
    expect(checkNumber('11,5', 'warn value')).toEqual({ ok: true, value: 11.5 });
    expect(checkNumber('', 'warn value')).toEqual({ ok: false, message: 'Type the warn value as a number' });
    expect(checkNumber('2.5', 'decimals', { isInteger: true })).toEqual({ ok: false, message: 'The decimals is a whole number' });
    expect(checkNumber('9', 'decimals', { max: 4 })).toEqual({ ok: false, message: 'The decimals is at most 4' });
  });
});

describe('checkThresholds', () => {
  it('wants danger past warn in the bad direction', () => {
    expect(checkThresholds({ direction: 'below', warn: 11.5, danger: 10.5 })).toBeNull();
    expect(checkThresholds({ direction: 'below', warn: 10, danger: 11 })).toMatch(/below the warn/);
    expect(checkThresholds({ direction: 'above', warn: 70, danger: 60 })).toMatch(/above the warn/);
  });
});

describe('checkHexColour', () => {
  it('accepts #rrggbb only', () => {
    expect(checkHexColour('#F5A30F')).toEqual({ ok: true, value: '#f5a30f' });
    expect(checkHexColour('f5a30f').ok).toBe(false);
  });
});
