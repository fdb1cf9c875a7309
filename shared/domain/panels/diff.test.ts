import { describe, expect, it } from 'vitest';
import type { PanelDocument, Tile } from '../../schemas/panel';
import { diffDocuments, isEmptyDiff, summarizeDiff } from './diff';
import { DEFAULT_PANEL_THEME } from './tile-catalogue';

const level: Tile = {
  id: 'level',
  kind: 'level-picker',
  x: 3,
  y: 1,
  w: 2,
  h: 4,
  label: 'Level',
  fill: 'surface',
  ink: 'text',
  channel: 'op/reef/level',
  options: [
    { label: 'L4', value: 'L4' },
    { label: 'L3', value: 'L3' },
    { label: 'L2', value: 'L2' },
    { label: 'L1', value: 'L1' },
  ],
};
const volts: Tile = {
  id: 'volts',
  kind: 'readout',
  x: 10,
  y: 0,
  w: 2,
  h: 1,
  label: 'Battery',
  fill: 'surface',
  ink: 'text',
  channel: 'robot/battery/voltage',
  unit: 'V',
  decimals: 1,
  thresholds: { direction: 'below', warn: 11.5, danger: 10.5 },
};
const eject: Tile = { id: 'eject', kind: 'push-pad', x: 0, y: 8, w: 2, h: 1, label: 'Eject', fill: 'accent', ink: 'accentText', channel: 'op/intake/eject' };

const base: PanelDocument = {
  device: { preset: 'tablet-1280x800', widthPx: 1280, heightPx: 800, orientation: 'landscape' },
  grid: { columns: 16, rows: 10, gapPx: 8 },
  theme: { ...DEFAULT_PANEL_THEME },
  pages: [{ id: 'main', name: 'Main', tiles: [level, volts, eject] }],
};

describe('diffDocuments', () => {
  it('finds nothing between a document and a deep copy of it', () => {
    const copy = JSON.parse(JSON.stringify(base)) as PanelDocument;
    const diff = diffDocuments(base, copy);
    expect(isEmptyDiff(diff)).toBe(true);
    expect(summarizeDiff(diff)).toEqual([]);
  });

  it('ignores key order inside tiles', () => {
    const reordered = { ...base, pages: [{ ...base.pages[0]!, tiles: [{ ...volts, thresholds: { danger: 10.5, warn: 11.5, direction: 'below' } } as Tile, level, eject] }] };
    const diff = diffDocuments(base, { ...reordered, pages: [{ ...reordered.pages[0]!, tiles: [level, reordered.pages[0]!.tiles[0]!, eject] }] });
    expect(isEmptyDiff(diff)).toBe(true);
  });

  it('reports a move, a resize, changed fields, an addition and a removal', () => {
    const clock: Tile = { id: 'clock', kind: 'match-clock', x: 12, y: 0, w: 2, h: 1, label: 'Time left', fill: 'surface', ink: 'text', channel: 'robot/match/remaining' };
    const after: PanelDocument = {
      ...base,
      pages: [
        {
          id: 'main',
          name: 'Main',
          tiles: [
            { ...level, x: 5 },
            { ...volts, w: 3, label: 'Volts', channel: 'robot/battery/voltage', thresholds: { direction: 'below', warn: 12, danger: 11 } },
            clock,
          ],
        },
      ],
    };
    const diff = diffDocuments(base, after);
    expect(diff.moved).toEqual([{ pageId: 'main', pageName: 'Main', tileId: 'level', kind: 'level-picker', label: 'Level', from: { x: 3, y: 1 }, to: { x: 5, y: 1 } }]);
    expect(diff.resized).toMatchObject([{ tileId: 'volts', from: { w: 2, h: 1 }, to: { w: 3, h: 1 } }]);
    expect(diff.changed).toMatchObject([{ tileId: 'volts', label: 'Volts', fields: ['label', 'thresholds'], labelBefore: 'Battery' }]);
    expect(diff.added).toMatchObject([{ tileId: 'clock', at: { x: 12, y: 0 } }]);
    expect(diff.removed).toMatchObject([{ tileId: 'eject', label: 'Eject', kind: 'push-pad' }]);
    expect(summarizeDiff(diff)).toEqual([
      'Added ‘Time left’ (match clock) at (12,0)',
      'Removed ‘Eject’ (push pad)',
      'Moved ‘Level’ from (3,1) to (5,1)',
      'Resized ‘Volts’ from 2 × 1 to 3 × 1',
      'Renamed ‘Battery’ to ‘Volts’',
      'Changed ‘Volts’ (readout): thresholds',
    ]);
  });

  it('treats a tile whose kind changed as removed and added', () => {
    const after = { ...base, pages: [{ ...base.pages[0]!, tiles: [level, volts, { ...eject, kind: 'latch-pad' } as Tile] }] };
    const diff = diffDocuments(base, after);
    expect(diff.removed.map((t) => t.kind)).toEqual(['push-pad']);
    expect(diff.added.map((t) => t.kind)).toEqual(['latch-pad']);
    expect(diff.changed).toEqual([]);
  });

  it('reports pages added, removed, renamed and reordered, naming each tile’s page', () => {
    const before: PanelDocument = {
      ...base,
      pages: [
        { id: 'main', name: 'Main', tiles: [level] },
        { id: 'pit', name: 'Pit', tiles: [volts] },
        { id: 'auto', name: 'Auto', tiles: [] },
      ],
    };
    const after: PanelDocument = {
      ...base,
      pages: [
        { id: 'auto', name: 'Auto', tiles: [] },
        { id: 'main', name: 'Match', tiles: [level] },
        { id: 'end', name: 'Endgame', tiles: [eject] },
      ],
    };
    const diff = diffDocuments(before, after);
    expect(diff.pagesAdded).toEqual([{ pageId: 'end', name: 'Endgame' }]);
    expect(diff.pagesRemoved).toEqual([{ pageId: 'pit', name: 'Pit' }]);
    expect(diff.pagesRenamed).toEqual([{ pageId: 'main', from: 'Main', to: 'Match' }]);
    expect(diff.pagesReordered).toBe(true);
    expect(summarizeDiff(diff)).toEqual([
      'Added page ‘Endgame’',
      'Removed page ‘Pit’',
      'Renamed page ‘Main’ to ‘Match’',
      'Reordered the pages',
      'Added ‘Eject’ (push pad) at (0,8) on ‘Endgame’',
      'Removed ‘Battery’ (readout) on ‘Pit’',
    ]);
  });

  it('reports the device, the grid and each theme colour', () => {
    const after: PanelDocument = {
      ...base,
      device: { preset: 'tablet-1180x820', widthPx: 1180, heightPx: 820, orientation: 'portrait' },
      grid: { columns: 10, rows: 14, gapPx: 6 },
      theme: { ...base.theme, accent: '#ffbb3d', accentText: base.theme.accentText.toUpperCase() },
    };
    const diff = diffDocuments(base, after);
    expect(diff.theme).toEqual([{ colour: 'accent', from: '#f5a30f', to: '#ffbb3d' }]);
    expect(summarizeDiff(diff)).toEqual([
      'Device 1280 × 800 landscape → 820 × 1180 portrait',
      'Grid 16 × 10 cells, 8 px gap → 10 × 14 cells, 6 px gap',
      'Accent colour #f5a30f → #ffbb3d',
    ]);
  });

  it('names an unlabelled tile by its kind', () => {
    const after = { ...base, pages: [{ ...base.pages[0]!, tiles: [level, volts, { ...eject, label: '', y: 9 }] }] };
    expect(summarizeDiff(diffDocuments(base, after))).toEqual(['Moved a push pad from (0,8) to (0,9)', 'Cleared the label of ‘Eject’ (push pad)']);
    expect(summarizeDiff(diffDocuments(after, base))).toEqual(['Moved ‘Eject’ from (0,9) to (0,8)', 'Labelled a push pad ‘Eject’']);
  });
});
