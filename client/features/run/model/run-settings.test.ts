import { describe, expect, it } from 'vitest';
import { DEFAULT_RUN_SETTINGS, formatRunSettings, parseRunSettings, seatText } from './run-settings';

describe('parseRunSettings', () => {
  it('reads back what formatRunSettings wrote', () => {
    const settings = { alliance: 'red', driverStation: 3, isVibrationOn: false } as const;
    expect(parseRunSettings(formatRunSettings(settings))).toEqual(settings);
  });

  it.each([null, '', 'not json', '42', '[]'])('falls back to the defaults for %j', (text) => {
    expect(parseRunSettings(text)).toEqual(DEFAULT_RUN_SETTINGS);
  });

  it('keeps the valid parts of a partly broken value', () => {
    expect(parseRunSettings('{"alliance":"red","driverStation":7}')).toEqual({ ...DEFAULT_RUN_SETTINGS, alliance: 'red' });
  });
});

describe('seatText', () => {
  it('names the alliance and driver station', () => {
    expect(seatText({ alliance: 'blue', driverStation: 2 })).toBe('Blue 2');
    expect(seatText({ alliance: 'red', driverStation: 1 })).toBe('Red 1');
  });
});
