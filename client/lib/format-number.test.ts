import { describe, expect, it } from 'vitest';
import { formatDegrees, formatFixed, formatMetres, parseDecimal } from './format-number';

describe('formatFixed', () => {
  it.each([
    [13.8905, 3, '13.891'],
    [4.0259, 3, '4.026'],
    [-120, 1, '-120.0'],
    [-0.0004, 3, '0.000'],
    [-13.8905, 3, '-13.891'],
    [0.0000001, 3, '0.000'],
    [-0.04, 1, '0.0'],
    [0, 2, '0.00'],
  ])('formats %d with %d decimals as %s', (value, digits, expected) => {
    expect(formatFixed(value, digits)).toBe(expected);
  });

  it('shows a dash for a value that is not finite', () => {
    expect(formatFixed(Number.NaN, 3)).toBe('—');
    expect(formatFixed(Number.POSITIVE_INFINITY, 3)).toBe('—');
  });
});

describe('formatMetres', () => {
  it('keeps three decimals, to the millimetre', () => {
    expect(formatMetres(1.8288)).toBe('1.829');
  });
});

describe('formatDegrees', () => {
  it('keeps one decimal', () => {
    expect(formatDegrees(59.996)).toBe('60.0');
  });
});

describe('parseDecimal', () => {
  it.each([
    ['0.45', 0.45],
    ['  .5 ', 0.5],
    ['3', 3],
    ['2.', 2],
    ['0,05', 0.05],
    ['-1.2', -1.2],
  ])('reads "%s" as %d', (text, expected) => {
    expect(parseDecimal(text)).toBeCloseTo(expected, 12);
  });

  it('reads blank text as undefined, not as zero', () => {
    expect(parseDecimal('')).toBeUndefined();
    expect(parseDecimal('   ')).toBeUndefined();
  });

  it.each(['abc', '1.2.3', '1e3', '0.4 m', '.', '--1'])('reads "%s" as NaN', (text) => {
    expect(parseDecimal(text)).toBeNaN();
  });
});
