import { describe, expect, it } from 'vitest';
import { formatAccuracy, formatReaction, tapPrompt } from './format';

describe('formatReaction', () => {
  it.each([
    [843, '0.84 s'],
    [1000, '1.00 s'],
    [null, '—'],
  ])('%s ms reads %s', (ms, text) => {
    expect(formatReaction(ms)).toBe(text);
  });
});

describe('formatAccuracy and tapPrompt', () => {
  it('reads a fraction as a whole percentage and lists the parts still to tap', () => {
    expect(formatAccuracy(5 / 6)).toBe('83 %');
    expect(tapPrompt(['level', 'branch'])).toBe('Tap level and branch');
    expect(tapPrompt(['station'])).toBe('Tap station');
    expect(tapPrompt([])).toBe('');
  });
});
