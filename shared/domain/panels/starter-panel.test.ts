import { colord, extend } from 'colord';
import a11yPlugin from 'colord/plugins/a11y';
import { describe, expect, it } from 'vitest';
import { DEVICE_PRESETS, panelDocumentSchema, type DevicePreset } from '../../schemas/panel';
import { documentRuleIssues } from './document-rules';
import { presetDevice, STARTER_DEVICE, starterGrid, starterPanelDocument } from './starter-panel';
import { DEFAULT_PANEL_THEME } from './tile-catalogue';

extend([a11yPlugin]);

describe('starterPanelDocument', () => {
  it('is a valid document with one empty page on the default tablet', () => {
    const doc = panelDocumentSchema.parse(starterPanelDocument());
    expect(doc.device).toEqual(STARTER_DEVICE);
    expect(doc.grid).toEqual({ columns: 16, rows: 10, gapPx: 8 });
    expect(doc.pages).toEqual([{ id: 'main', name: 'Main', tiles: [] }]);
    expect(documentRuleIssues(doc)).toEqual([]);
  });

  it.each(Object.keys(DEVICE_PRESETS) as DevicePreset[])('parses for the %s preset in both orientations', (preset) => {
    for (const orientation of ['landscape', 'portrait'] as const) {
      const doc = panelDocumentSchema.parse(starterPanelDocument(presetDevice(preset, orientation)));
      expect(doc.device).toMatchObject({ preset, orientation, widthPx: DEVICE_PRESETS[preset].widthPx });
    }
  });

  it('hands out a fresh copy each time', () => {
    const a = starterPanelDocument();
    a.pages[0]!.tiles.push({ id: 'x', kind: 'caption', x: 0, y: 0, w: 1, h: 1, label: '', fill: 'canvas', ink: 'text', text: 'x', size: 's' });
    a.theme.text = '#000000';
    expect(starterPanelDocument().pages[0]!.tiles).toEqual([]);
    expect(starterPanelDocument().theme.text).toBe(DEFAULT_PANEL_THEME.text);
  });
});

describe('starterGrid', () => {
  it.each([
    [presetDevice('tablet-1280x800'), 16, 10],
    [presetDevice('tablet-1280x800', 'portrait'), 10, 16],
    [presetDevice('tablet-1920x1200'), 24, 15],
    [presetDevice('tablet-1024x768'), 13, 10],
    [{ preset: 'custom' as const, widthPx: 320, heightPx: 240, orientation: 'landscape' as const }, 4, 3],
    [{ preset: 'custom' as const, widthPx: 4096, heightPx: 4096, orientation: 'landscape' as const }, 48, 48],
  ])('fits about 80 px cells to %o: %i × %i', (device, columns, rows) => {
    expect(starterGrid(device)).toEqual({ columns, rows, gapPx: 8 });
  });
});

describe('the starter theme', () => {
  it.each([
    ['text', 'surface'],
    ['text', 'canvas'],
    ['accentText', 'accent'],
    ['muted', 'canvas'],
  ] as const)('%s on %s reads at 4.5:1 or more', (ink, fill) => {
    // Outside check: colord's a11y plugin computes the WCAG 2 contrast ratio independently of our code.
    const theme = starterPanelDocument().theme;
    expect(colord(theme[ink]).contrast(theme[fill])).toBeGreaterThanOrEqual(4.5);
  });
});
