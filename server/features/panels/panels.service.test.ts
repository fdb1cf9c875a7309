import { describe, expect, it } from 'vitest';
import { panelNameSchema } from '../../../shared/schemas/panel';
import { copyName, exportFileName } from './panels.service';

describe('copyName', () => {
  it('adds " (copy)" to the name', () => {
    expect(copyName('Gullwing match panel')).toBe('Gullwing match panel (copy)');
  });

  it('shortens a long name so the copy still fits the 80-character limit', () => {
    const copy = copyName('Harborlight '.repeat(7).slice(0, 80));
    expect(copy).toHaveLength(80);
    expect(copy.endsWith(' (copy)')).toBe(true);
    expect(panelNameSchema.safeParse(copy).success).toBe(true);
  });

  it('drops spaces left at the cut', () => {
    expect(copyName(`${'a'.repeat(72)} bcdefgh`)).toBe(`${'a'.repeat(72)} (copy)`);
  });
});

describe('exportFileName', () => {
  it.each([
    ['Gullwing match panel', 'Gullwing match panel.pitwall-panel.json'],
    ['Round trip: A/B', 'Round trip- A-B.pitwall-panel.json'],
    ['a\\b*c?"d"<e>|f', 'a-b-c-d-e-f.pitwall-panel.json'],
    ['Tab\there', 'Tab-here.pitwall-panel.json'],
    ['Lakeshore ☆ finals', 'Lakeshore ☆ finals.pitwall-panel.json'],
    ['/Reef/', 'Reef.pitwall-panel.json'],
    ['///', 'panel.pitwall-panel.json'],
  ])('%j → %j', (name, file) => {
    expect(exportFileName(name)).toBe(file);
  });
});
