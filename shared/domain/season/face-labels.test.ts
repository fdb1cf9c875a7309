import { describe, expect, it } from 'vitest';
import { faceLabels, formatFaceLabel } from './face-labels';
import { season2025 } from './season-2025';

describe('faceLabels', () => {
  // Lettering from memory (low confidence). Positions checked by hand: a blue operator looks along +x with +y on
  // their left [WD]; tag 17 (y 3.306 < centre 4.026, x 4.074 < centre 4.489) is therefore near and to their right.
  it.each([
    [18, 'A/B', 'S', 'near', 6],
    [17, 'C/D', 'SE', 'near right', 4],
    [22, 'E/F', 'NE', 'far right', 2],
    [21, 'G/H', 'N', 'far', 12],
    [20, 'I/J', 'NW', 'far left', 10],
    [19, 'K/L', 'SW', 'near left', 8],
  ])('labels blue tag %d face %s / %s / %s / %d o’clock from station 2', (tagId, letters, compass, relative, clock) => {
    const label = faceLabels(season2025, 'blue', 2).find((l) => l.tagId === tagId);
    expect(label).toMatchObject({ letters, compass, relative, clock });
  });

  // A red operator looks along −x with −y on their left: tag 8 (y 4.745, higher than the centre) is near right.
  it.each([
    [7, 'A/B', 'S', 6],
    [8, 'C/D', 'SE', 4],
    [10, 'G/H', 'N', 12],
    [6, 'K/L', 'SW', 8],
  ])('labels red tag %d face %s as %s at %d o’clock', (tagId, letters, compass, clock) => {
    const label = faceLabels(season2025, 'red', 1).find((l) => l.tagId === tagId);
    expect(label).toMatchObject({ letters, compass, clock });
  });

  it('gives the same labels from every station of an alliance in the 2025 field', () => {
    expect(faceLabels(season2025, 'blue', 1)).toEqual(faceLabels(season2025, 'blue', 3));
  });

  it('uses each compass point and clock hour exactly once', () => {
    const labels = faceLabels(season2025, 'red', 2);
    expect(new Set(labels.map((l) => l.compass)).size).toBe(6);
    expect(labels.map((l) => l.clock).sort((a, b) => a - b)).toEqual([2, 4, 6, 8, 10, 12]);
  });
});

describe('formatFaceLabel', () => {
  const label = faceLabels(season2025, 'blue', 2)[1];
  it.each([
    ['letters', 'C/D'],
    ['compass', 'SE'],
    ['relative', 'near right'],
    ['clock', "4 o'clock"],
  ] as const)('writes the %s scheme as %s', (scheme, text) => {
    if (!label) throw new Error('missing label');
    expect(formatFaceLabel(label, scheme)).toBe(text);
  });
});
