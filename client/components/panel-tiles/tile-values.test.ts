import { describe, expect, it } from 'vitest';
import { channelTitle, formatClock, formatValue, isOn, optionColumns, phaseColour, phaseText, readoutLevel, readoutWord } from './tile-values';

describe('readoutLevel', () => {
  const battery = { direction: 'below', warn: 11.5, danger: 10.8 } as const;
  const motor = { direction: 'above', warn: 60, danger: 80 } as const;
  it.each([
    [12.6, battery, 'ok'],
    [11.5, battery, 'warn'],
    [11.0, battery, 'warn'],
    [10.8, battery, 'danger'],
    [7.2, battery, 'danger'],
    [25, motor, 'ok'],
    [60, motor, 'warn'],
    [80, motor, 'danger'],
  ] as const)('rates %f against %o as %s', (value, thresholds, level) => {
    expect(readoutLevel(value, thresholds)).toBe(level);
  });

  it('calls every number fine without thresholds', () => {
    expect(readoutLevel(-1e9, null)).toBe('ok');
  });
});

describe('readoutWord', () => {
  it('says LOW or HIGH, with a mark for danger, and nothing when fine', () => {
    expect(readoutWord('warn', 'below')).toBe('LOW');
    expect(readoutWord('danger', 'above')).toBe('HIGH!');
    expect(readoutWord('ok', 'below')).toBeNull();
  });
});

describe('formatClock', () => {
  it.each([
    [150, '2:30'],
    [135.2, '2:16'],
    [60, '1:00'],
    [9.01, '0:10'],
    [0.4, '0:01'],
    [0, '0:00'],
    [-3, '0:00'],
  ])('shows %f s left as %s', (seconds, text) => {
    expect(formatClock(seconds)).toBe(text);
  });
});

describe('formatValue', () => {
  it('writes numbers with the decimals asked, booleans as on/off and nothing as a dash', () => {
    expect(formatValue(12.345, 1)).toBe('12.3');
    expect(formatValue(true)).toBe('on');
    expect(formatValue('L4')).toBe('L4');
    expect(formatValue(undefined)).toBe('—');
    expect(formatValue(Number.NaN)).toBe('—');
  });
});

describe('channelTitle', () => {
  it('takes the last part of the channel as a title', () => {
    expect(channelTitle('op/reef/branch')).toBe('Branch');
    expect(channelTitle('op/auto/routine-name')).toBe('Routine name');
  });
});

describe('phaseText', () => {
  it('words every phase, with the round trip once the robot has it', () => {
    expect(phaseText({ phase: 'pending' })).toBe('Sending…');
    expect(phaseText({ phase: 'acked', roundTripMs: 31.6 })).toBe('Robot has it · 32 ms');
    expect(phaseText({ phase: 'acked' })).toBe('Robot has it');
    expect(phaseText({ phase: 'stale' })).toBe('No answer from robot');
    expect(phaseText({ phase: 'lost' })).toBe('Link lost · resends');
    expect(phaseText({ phase: 'refused' })).toBe('Refused');
    expect(phaseText(undefined)).toBe('Nothing chosen');
  });

  it('colours acked ok, stale warn, lost and refused danger', () => {
    expect([phaseColour('acked'), phaseColour('stale'), phaseColour('lost'), phaseColour('refused'), phaseColour('pending')]).toEqual(['ok', 'warn', 'danger', 'danger', 'muted']);
  });
});

describe('isOn', () => {
  it.each([
    [true, true],
    [false, false],
    [1, true],
    [0, false],
    ['on', true],
    ['off', false],
    [undefined, false],
  ] as const)('reads %s as %s', (value, on) => {
    expect(isOn(value)).toBe(on);
  });
});

describe('optionColumns', () => {
  it.each([
    [4, 0.5, 1], // a tall level picker stacks L4 … L1
    [4, 3, 4], // a wide cage picker lines them up
    [2, 1.5, 2],
    [6, 1.2, 3], // a squarish box gets a grid
    [1, 0.2, 1],
  ])('puts %i options in a box of aspect %f into %i columns', (count, aspect, columns) => {
    expect(optionColumns(count, aspect)).toBe(columns);
  });
});
