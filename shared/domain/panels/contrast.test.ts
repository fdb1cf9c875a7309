import { colord, extend } from 'colord';
import a11yPlugin from 'colord/plugins/a11y';
import { describe, expect, it } from 'vitest';
import { contrastRatio, formatContrastRatio, parseHexColour, relativeLuminance } from './contrast';

extend([a11yPlugin]);

describe('relativeLuminance', () => {
  // WCAG 2.2, definition of "relative luminance": L = 0.2126 R + 0.7152 G + 0.0722 B over linearised sRGB,
  // 0 for darkest black and 1 for lightest white. Pure primaries therefore give the coefficients themselves.
  it('follows the WCAG 2.2 definition at its end points and primaries', () => {
    expect(relativeLuminance('#000000')).toBe(0);
    expect(relativeLuminance('#ffffff')).toBeCloseTo(1, 12);
    expect(relativeLuminance('#ff0000')).toBeCloseTo(0.2126, 12);
    expect(relativeLuminance('#00ff00')).toBeCloseTo(0.7152, 12);
    expect(relativeLuminance('#0000ff')).toBeCloseTo(0.0722, 12);
  });

  it('uses the linear segment below the 0.04045 knee (WCAG 2.2 definition)', () => {
    // 10/255 = 0.0392 is below the knee: 0.0392 / 12.92 for each channel, and the coefficients sum to 1.
    expect(relativeLuminance('#0a0a0a')).toBeCloseTo(10 / 255 / 12.92, 12);
    // 128/255 = 0.502 is above it: ((0.502 + 0.055) / 1.055) ^ 2.4 = 0.2159 (mid grey, computed from the definition).
    expect(relativeLuminance('#808080')).toBeCloseTo(((128 / 255 + 0.055) / 1.055) ** 2.4, 12);
    expect(relativeLuminance('#808080')).toBeCloseTo(0.2159, 4);
  });

  it('refuses anything but #rrggbb', () => {
    expect(() => parseHexColour('#fff')).toThrow(/rrggbb/);
    expect(() => relativeLuminance('red')).toThrow(/rrggbb/);
    expect(parseHexColour('#0A7fFf')).toEqual({ r: 10, g: 127, b: 255 });
  });
});

describe('contrastRatio', () => {
  // WCAG 2.2, definition of "contrast ratio": (L1 + 0.05) / (L2 + 0.05), L1 the lighter; "Contrast ratios
  // can range from 1 to 21 (commonly written 1:1 to 21:1)" — black on white is the 21:1 end.
  it('gives 21:1 for black on white and 1:1 for equal colours (WCAG 2.2 definition)', () => {
    expect(contrastRatio('#000000', '#ffffff')).toBeCloseTo(21, 12);
    expect(contrastRatio('#ffffff', '#000000')).toBeCloseTo(21, 12);
    expect(contrastRatio('#3b444f', '#3b444f')).toBe(1);
  });

  // Values from shared FACTS.md "worked values", computed with WCAG 2.2's formulas: #767676 is the lightest
  // grey that passes 4.5:1 on white, #777777 just fails.
  it.each([
    ['#767676', '#ffffff', 4.54],
    ['#777777', '#ffffff', 4.48],
    ['#ffff00', '#ffffff', 1.07],
    ['#ff0000', '#ffffff', 4.0],
    ['#0000ff', '#ffffff', 8.59],
  ])('%s on %s is %f:1 (FACTS.md worked values, WCAG 2.2 formulas)', (a, b, expected) => {
    expect(contrastRatio(a, b)).toBeCloseTo(expected, 2);
  });

  it('puts #767676 above and #777777 below the SC 1.4.3 minimum of 4.5:1', () => {
    expect(contrastRatio('#767676', '#ffffff')).toBeGreaterThanOrEqual(4.5);
    expect(contrastRatio('#777777', '#ffffff')).toBeLessThan(4.5);
  });

  it('agrees with colord’s a11y plugin on 500 seeded random pairs (reference library)', () => {
    // colord (npm, plugins/a11y) floors its ratio to two decimals, so compare ours floored the same way.
    let seed = 0x19850;
    const random = () => {
      // mulberry32, seeded so the pairs are the same every run.
      seed = (seed + 0x6d2b79f5) | 0;
      let t = seed;
      t = Math.imul(t ^ (t >>> 15), t | 1);
      t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
      return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
    };
    const hex = () => `#${Math.floor(random() * 0x1000000).toString(16).padStart(6, '0')}`;
    let readableAgree = 0;
    for (let i = 0; i < 500; i += 1) {
      const a = hex();
      const b = hex();
      const ours = contrastRatio(a, b);
      expect(Math.floor(ours * 100 + 1e-9) / 100).toBeCloseTo(colord(a).contrast(b), 10);
      if (colord(a).isReadable(b) === ours >= 4.5) readableAgree += 1;
    }
    expect(readableAgree).toBe(500);
  });
});

describe('formatContrastRatio', () => {
  it('rounds down so a failing ratio never reads as passing', () => {
    expect(formatContrastRatio(contrastRatio('#777777', '#ffffff'))).toBe('4.47:1');
    expect(formatContrastRatio(4.4999)).toBe('4.49:1');
    expect(formatContrastRatio(21)).toBe('21.00:1');
  });
});
