import { describe, expect, it } from 'vitest';
import { panelDocumentSchema, type PanelDocument, type Tile } from '../../schemas/panel';
import { documentRuleIssues } from './document-rules';

const push = (id: string, x: number, y: number, w: number, h: number, label = ''): Tile => ({
  id,
  kind: 'push-pad',
  x,
  y,
  w,
  h,
  label,
  fill: 'surface',
  ink: 'text',
  channel: 'op/intake/eject',
});

function documentWith(pages: { id: string; tiles: Tile[] }[]): PanelDocument {
  return panelDocumentSchema.parse({
    device: { preset: 'tablet-1280x800', widthPx: 1280, heightPx: 800, orientation: 'landscape' },
    grid: { columns: 16, rows: 10, gapPx: 8 },
    theme: { canvas: '#000000', surface: '#111111', text: '#ffffff', accent: '#ffbb3d', accentText: '#000000', ok: '#00ff00', warn: '#ffff00', danger: '#ff0000', muted: '#888888' },
    pages: pages.map((page) => ({ ...page, name: page.id })),
  });
}

describe('documentRuleIssues', () => {
  it('finds nothing in a document whose tiles fill the grid exactly to its edges', () => {
    const doc = documentWith([{ id: 'a', tiles: [push('whole', 0, 0, 16, 10)] }, { id: 'b', tiles: [push('corner', 15, 9, 1, 1)] }]);
    expect(documentRuleIssues(doc)).toEqual([]);
  });

  it('names the width of a tile that runs past the right edge and the height of one past the bottom', () => {
    const doc = documentWith([{ id: 'a', tiles: [push('ok', 0, 0, 2, 2), push('wide', 14, 0, 3, 1, 'Eject'), push('tall', 0, 8, 1, 3)] }]);
    const issues = documentRuleIssues(doc);
    expect(issues.map((i) => i.path)).toEqual(['pages.0.tiles.1.w', 'pages.0.tiles.2.h']);
    expect(issues[0]!.message).toBe('"Eject" runs past the grid\'s right edge (x 14 + w 3 > 16 columns)');
    expect(issues[1]!.message).toBe('Tile "tall" runs past the grid\'s bottom edge (y 8 + h 3 > 10 rows)');
  });

  it('names x and y of a tile that starts outside the grid', () => {
    const doc = documentWith([{ id: 'a', tiles: [push('gone', 16, 10, 1, 1)] }]);
    expect(documentRuleIssues(doc).map((i) => i.path)).toEqual(['pages.0.tiles.0.x', 'pages.0.tiles.0.y']);
  });

  it('finds a tile id used twice, on one page or across pages, and a page id used twice', () => {
    const doc = documentWith([
      { id: 'a', tiles: [push('t1', 0, 0, 1, 1), push('t1', 1, 0, 1, 1)] },
      { id: 'a', tiles: [push('t1', 0, 0, 1, 1), push('t2', 1, 0, 1, 1)] },
    ]);
    expect(documentRuleIssues(doc)).toEqual([
      { path: 'pages.0.tiles.1.id', message: 'Tile id "t1" is already used by pages.0.tiles.0' },
      { path: 'pages.1.id', message: 'Page id "a" is already used by pages.0' },
      { path: 'pages.1.tiles.0.id', message: 'Tile id "t1" is already used by pages.0.tiles.0' },
    ]);
  });

  it('checks against the grid as given, whatever the orientation', () => {
    const doc = documentWith([{ id: 'a', tiles: [push('t', 0, 0, 16, 10)] }]);
    const portrait = { ...doc, device: { ...doc.device, orientation: 'portrait' as const } };
    expect(documentRuleIssues(portrait)).toEqual([]);
  });
});
