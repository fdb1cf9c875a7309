import { describe, expect, it } from 'vitest';
import { signalSchema } from '../../shared/protocol/messages';
import { MODEL_STATES, SIM_SIGNALS, simEnumValue, simSignalIndex } from './signals';

describe('SIM_SIGNALS', () => {
  it('declares more than 100 signals with unique names, each index its position', () => {
    expect(SIM_SIGNALS.length).toBeGreaterThan(100);
    expect(new Set(SIM_SIGNALS.map((s) => s.name)).size).toBe(SIM_SIGNALS.length);
    SIM_SIGNALS.forEach((s, i) => expect(s.index).toBe(i));
  });

  it('passes the relay protocol’s signal schema, with labels on exactly the enum signals', () => {
    for (const s of SIM_SIGNALS) {
      expect(signalSchema.safeParse(s).success).toBe(true);
      expect(s.type === 'enum').toBe((s.labels?.length ?? 0) > 0);
    }
  });

  it('has four swerve modules with speed, angle, currents and temperatures', () => {
    for (const m of ['fl', 'fr', 'bl', 'br']) {
      for (const part of ['speed', 'angle', 'drive-current', 'steer-current', 'drive-temp', 'steer-temp']) {
        expect(() => simSignalIndex(`drive/module/${m}/${part}`)).not.toThrow();
      }
    }
  });
});

describe('simSignalIndex', () => {
  it('finds a declared signal and refuses an unknown name', () => {
    expect(SIM_SIGNALS[simSignalIndex('battery/voltage')]!.unit).toBe('V');
    expect(() => simSignalIndex('battery/volts')).toThrow(RangeError);
  });
});

describe('simEnumValue', () => {
  it('maps a label to its index in the enum', () => {
    expect(simEnumValue('state/machine', 'placing')).toBe(MODEL_STATES.indexOf('placing'));
    expect(simEnumValue('match/mode', 'teleop')).toBe(2);
    expect(() => simEnumValue('game/piece', 'cone')).toThrow(RangeError);
  });
});
