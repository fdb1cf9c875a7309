import { colord, extend } from 'colord';
import a11yPlugin from 'colord/plugins/a11y';
import { describe, expect, it } from 'vitest';
import { SIM_SIGNALS } from '../../../simulator/src/signals';
import { OP_CHANNELS } from '../channels';
import { panelDocumentSchema, type PanelDocument, type Tile } from '../../schemas/panel';
import { DEMO_AUTO_ROUTINES, DEMO_MATCH_PANEL, DEMO_PRACTICE_PANEL } from './demo-panel';
import { documentRuleIssues } from './document-rules';

extend([a11yPlugin]);

const panels: [string, PanelDocument][] = [
  ['the match panel', DEMO_MATCH_PANEL],
  ['the practice layout', DEMO_PRACTICE_PANEL],
];
const tilesOf = (doc: PanelDocument): Tile[] => doc.pages.flatMap((p) => p.tiles);
const signal = (channel: string) => SIM_SIGNALS.find((s) => `robot/${s.name}` === channel);

describe.each(panels)('%s', (_name, doc) => {
  it('parses with panelDocumentSchema and keeps the rules zod cannot state', () => {
    expect(panelDocumentSchema.parse(doc)).toEqual(doc);
    expect(documentRuleIssues(doc)).toEqual([]);
  });

  it('has no two tiles on one cell', () => {
    for (const page of doc.pages) {
      const taken = new Map<string, string>();
      for (const tile of page.tiles) {
        for (let x = tile.x; x < tile.x + tile.w; x += 1) {
          for (let y = tile.y; y < tile.y + tile.h; y += 1) {
            expect(taken.get(`${x},${y}`), `${tile.id} at ${x},${y}`).toBeUndefined();
            taken.set(`${x},${y}`, tile.id);
          }
        }
      }
    }
  });

  it('gives every tile a touch target of at least 44 × 44 CSS px (WCAG 2.2 SC 2.5.5)', () => {
    const cellWidthPx = doc.device.widthPx / doc.grid.columns;
    const cellHeightPx = doc.device.heightPx / doc.grid.rows;
    for (const tile of tilesOf(doc)) {
      expect(tile.w * cellWidthPx - doc.grid.gapPx).toBeGreaterThanOrEqual(44);
      expect(tile.h * cellHeightPx - doc.grid.gapPx).toBeGreaterThanOrEqual(44);
    }
  });

  it('draws every tile\'s text at 4.5:1 or more on its fill (WCAG 2.2 SC 1.4.3)', () => {
    for (const tile of tilesOf(doc)) {
      // Outside check: colord's a11y plugin computes the WCAG 2 contrast ratio independently of our code.
      expect(colord(doc.theme[tile.ink]).contrast(doc.theme[tile.fill]), tile.id).toBeGreaterThanOrEqual(4.5);
    }
    expect(colord(doc.theme.accentText).contrast(doc.theme.accent)).toBeGreaterThanOrEqual(4.5);
  });

  it('offers exactly the values the standard op/ channels carry', () => {
    for (const tile of tilesOf(doc)) {
      if (!('options' in tile) || !(tile.channel in OP_CHANNELS)) continue;
      const allowed = OP_CHANNELS[tile.channel as keyof typeof OP_CHANNELS].options as readonly string[];
      for (const option of tile.options) expect(allowed, `${tile.id} ${option.value}`).toContain(option.value);
    }
  });

  it('binds lamps to robot booleans and readouts to robot signals in their own unit', () => {
    for (const tile of tilesOf(doc)) {
      if (tile.kind === 'lamp') expect(signal(tile.channel)?.type, tile.id).toBe('boolean');
      if (tile.kind === 'readout') expect(signal(tile.channel)?.unit, tile.id).toBe(tile.unit);
      if (tile.kind === 'match-clock') expect(signal(tile.channel)).toMatchObject({ type: 'number', unit: 's' });
    }
  });
});

describe('DEMO_MATCH_PANEL', () => {
  it('lays out every picker of the reef game on the 1280 × 800 tablet, with the auto routines and a target echo', () => {
    const tiles = tilesOf(DEMO_MATCH_PANEL);
    const byChannel = (channel: string) => tiles.find((t) => 'channel' in t && t.channel === channel);
    expect(DEMO_MATCH_PANEL.device).toMatchObject({ widthPx: 1280, heightPx: 800, orientation: 'landscape' });
    expect(byChannel('op/reef/branch')?.kind).toBe('reef-picker');
    expect(byChannel('op/reef/level')).toMatchObject({ kind: 'level-picker', options: ['L4', 'L3', 'L2', 'L1'].map((value) => expect.objectContaining({ value })) });
    expect(byChannel('op/station')).toMatchObject({ kind: 'station-picker', options: [{ value: 'left' }, { value: 'right' }] });
    expect(byChannel('op/algae')).toMatchObject({ kind: 'algae-picker', options: [{ value: 'none' }, { value: 'processor' }, { value: 'net' }] });
    expect(byChannel('op/cage')).toMatchObject({ kind: 'cage-picker', options: ['none', 'park', 'shallow', 'deep'].map((value) => ({ label: expect.any(String), value })) });
    expect(byChannel('op/auto/routine')).toMatchObject({ kind: 'choice-pad', options: DEMO_AUTO_ROUTINES });
    expect(tiles.find((t) => t.kind === 'target-echo')).toMatchObject({ channels: ['op/reef/branch', 'op/reef/level'] });
    expect(byChannel('robot/match/remaining')?.kind).toBe('match-clock');
    expect(tiles.some((t) => t.kind === 'caption')).toBe(true);
    // The reef picker is the largest tile.
    const reef = byChannel('op/reef/branch')!;
    for (const tile of tiles) expect(reef.w * reef.h).toBeGreaterThanOrEqual(tile.w * tile.h);
  });
});
