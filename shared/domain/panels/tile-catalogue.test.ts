import { describe, expect, it } from 'vitest';
import { TILE_KINDS, tileSchema } from '../../schemas/panel';
import { BRANCH_LETTERS, OP_CHANNELS } from '../channels';
import { REEF_LEVELS } from '../season/season-profile';
import { contrastRatio } from './contrast';
import { DEFAULT_PANEL_THEME, PALETTE_ORDER, TILE_CATALOGUE, tileReads, tileWrites } from './tile-catalogue';

describe('TILE_CATALOGUE', () => {
  it.each(TILE_KINDS)('%s creates a valid tile of its kind at its default size', (kind) => {
    const entry = TILE_CATALOGUE[kind];
    const tile = entry.create('t1', { x: 2, y: 3 });
    expect(tileSchema.parse(tile)).toEqual(tile);
    expect(tile).toMatchObject({ id: 't1', kind, x: 2, y: 3, w: entry.defaultSize.w, h: entry.defaultSize.h });
    expect(entry.minSize.w).toBeLessThanOrEqual(entry.defaultSize.w);
    expect(entry.minSize.h).toBeLessThanOrEqual(entry.defaultSize.h);
    expect(entry.label).not.toBe('');
    expect(entry.description).not.toBe('');
  });

  it('has the palette list every kind exactly once', () => {
    expect([...PALETTE_ORDER].sort()).toEqual([...TILE_KINDS].sort());
  });

  it('defaults to the standard channels with their exact values', () => {
    const level = TILE_CATALOGUE['level-picker'].create('l', { x: 0, y: 0 });
    expect(level.channel).toBe('op/reef/level');
    expect(level.options.map((o) => o.value)).toEqual([...REEF_LEVELS].reverse());
    for (const kind of ['station-picker', 'algae-picker', 'cage-picker'] as const) {
      const tile = TILE_CATALOGUE[kind].create('p', { x: 0, y: 0 });
      const values = OP_CHANNELS[tile.channel as keyof typeof OP_CHANNELS].options as readonly string[];
      expect(tile.options.map((o) => o.value)).toEqual([...values]);
    }
    expect(TILE_CATALOGUE['reef-picker'].create('r', { x: 0, y: 0 }).channel).toBe('op/reef/branch');
    expect(TILE_CATALOGUE.readout.create('v', { x: 0, y: 0 })).toMatchObject({ channel: 'robot/battery/voltage', unit: 'V', thresholds: { direction: 'below' } });
    expect(TILE_CATALOGUE.lamp.create('c', { x: 0, y: 0 }).channel).toBe('robot/intake/coral-sensor');
    expect(TILE_CATALOGUE['match-clock'].create('m', { x: 0, y: 0 }).channel).toBe('robot/match/remaining');
  });

  it('gives fresh option arrays to every new tile', () => {
    const a = TILE_CATALOGUE['level-picker'].create('a', { x: 0, y: 0 });
    const b = TILE_CATALOGUE['level-picker'].create('b', { x: 0, y: 0 });
    a.options[0]!.label = 'Top';
    expect(b.options[0]!.label).toBe('L4');
  });

  it('picks a legible ink from the theme when the preferred one is not', () => {
    const theme = { ...DEFAULT_PANEL_THEME, accentText: '#f0f0f0', accent: '#ffffff' };
    const pad = TILE_CATALOGUE['push-pad'].create('p', { x: 0, y: 0 }, theme);
    expect(pad.fill).toBe('accent');
    expect(contrastRatio(theme[pad.ink], theme.accent)).toBeGreaterThanOrEqual(4.5);
    // With the default theme every kind keeps its preferred ink, and it passes 4.5:1.
    for (const kind of TILE_KINDS) {
      const tile = TILE_CATALOGUE[kind].create('t', { x: 0, y: 0 }, DEFAULT_PANEL_THEME);
      expect(tile.ink).toBe(TILE_CATALOGUE[kind].create('t', { x: 0, y: 0 }).ink);
      expect(contrastRatio(DEFAULT_PANEL_THEME[tile.ink], DEFAULT_PANEL_THEME[tile.fill])).toBeGreaterThanOrEqual(4.5);
    }
  });
});

describe('tileWrites and tileReads', () => {
  const make = <K extends (typeof TILE_KINDS)[number]>(kind: K) => TILE_CATALOGUE[kind].create(kind, { x: 0, y: 0 });

  it('has the reef picker write the 12 branch letters', () => {
    expect(tileWrites(make('reef-picker'))).toEqual([{ channel: 'op/reef/branch', type: 'string', values: [...BRANCH_LETTERS] }]);
    expect(BRANCH_LETTERS).toHaveLength(12);
  });

  it('has pickers write their option values and pads booleans', () => {
    expect(tileWrites(make('cage-picker'))).toEqual([{ channel: 'op/cage', type: 'string', values: ['none', 'park', 'shallow', 'deep'] }]);
    expect(tileWrites(make('choice-pad'))[0]).toMatchObject({ type: 'string', values: ['leave', 'one-coral', 'two-coral'] });
    expect(tileWrites(make('push-pad'))).toEqual([{ channel: 'op/intake/eject', type: 'boolean' }]);
    expect(tileWrites(make('latch-pad'))).toEqual([{ channel: 'op/drive/slow-mode', type: 'boolean' }]);
  });

  it('has lamps, readouts, the match clock and the target echo read, and captions do neither', () => {
    expect(tileReads(make('lamp'))).toEqual([{ channel: 'robot/intake/coral-sensor', type: 'boolean' }]);
    expect(tileReads(make('readout'))).toEqual([{ channel: 'robot/battery/voltage', type: 'number' }]);
    expect(tileReads({ ...make('readout'), unit: '', thresholds: null })).toEqual([{ channel: 'robot/battery/voltage', type: 'json' }]);
    expect(tileReads(make('match-clock'))).toEqual([{ channel: 'robot/match/remaining', type: 'number' }]);
    expect(tileReads(make('target-echo')).map((u) => u.channel)).toEqual(['op/reef/branch', 'op/reef/level']);
    expect(tileReads(make('caption'))).toEqual([]);
    expect(tileWrites(make('caption'))).toEqual([]);
    for (const kind of ['lamp', 'readout', 'match-clock', 'target-echo'] as const) expect(tileWrites(make(kind))).toEqual([]);
  });
});
