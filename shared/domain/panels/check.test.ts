import { describe, expect, it } from 'vitest';
import type { Device, PanelDocument, Tile, TileKind, TileOf } from '../../schemas/panel';
import { OP_CHANNEL_NAMES } from '../channels';
import { checkPanel, countIssues, issuesForTile, robotReadsChannel, type PanelIssue } from './check';
import { DEFAULT_PANEL_THEME, TILE_CATALOGUE } from './tile-catalogue';

const LANDSCAPE_1280: Device = { preset: 'tablet-1280x800', widthPx: 1280, heightPx: 800, orientation: 'landscape' };
const DEVICES: Record<string, Device> = {
  '1280×800': LANDSCAPE_1280,
  '1180×820': { preset: 'tablet-1180x820', widthPx: 1180, heightPx: 820, orientation: 'landscape' },
  '1920×1200': { preset: 'tablet-1920x1200', widthPx: 1920, heightPx: 1200, orientation: 'landscape' },
  '1280×800 portrait': { ...LANDSCAPE_1280, orientation: 'portrait' },
};

function tile<K extends TileKind>(kind: K, id: string, place: { x: number; y: number; w?: number; h?: number }, patch: Partial<TileOf<K>> = {}): TileOf<K> {
  const created = TILE_CATALOGUE[kind].create(id, { x: place.x, y: place.y });
  return { ...created, ...(place.w ? { w: place.w } : {}), ...(place.h ? { h: place.h } : {}), ...patch };
}

function doc(tiles: Tile[], device: Device = LANDSCAPE_1280, more: Partial<PanelDocument> = {}): PanelDocument {
  return { device, grid: { columns: 16, rows: 10, gapPx: 8 }, theme: { ...DEFAULT_PANEL_THEME }, pages: [{ id: 'main', name: 'Main', tiles }], ...more };
}

const rules = (issues: PanelIssue[]) => issues.map((i) => `${i.rule}:${i.tileIds.join('+')}`);

describe('a clean panel', () => {
  it('has no issues when every standard tile is big enough, apart and read by the robot', () => {
    const tiles = [
      tile('reef-picker', 'reef', { x: 0, y: 0 }),
      tile('level-picker', 'level', { x: 5, y: 0 }),
      tile('station-picker', 'station', { x: 7, y: 0 }),
      tile('algae-picker', 'algae', { x: 7, y: 1 }),
      tile('cage-picker', 'cage', { x: 7, y: 2 }),
      tile('target-echo', 'echo', { x: 11, y: 0 }),
      tile('lamp', 'lamp', { x: 11, y: 2 }),
      tile('readout', 'volts', { x: 13, y: 2 }),
      tile('match-clock', 'clock', { x: 11, y: 3 }),
      tile('caption', 'title', { x: 0, y: 9 }),
    ];
    expect(checkPanel(doc(tiles), { robotReads: OP_CHANNEL_NAMES })).toEqual([]);
  });
});

describe('touch targets (WCAG 2.5.5 enhanced 44 px, 2.5.8 minimum 24 px)', () => {
  // The same 1 × 2 level picker on a 16 × 10 grid at each device size, measured as run mode draws it below its
  // 56 px status strip (touch-targets.ts): 29.0 px high at 1280 × 800, 30.3 at 1180 × 820, 47.4 at
  // 1920 × 1200, and 37.4 px wide in portrait.
  const level = tile('level-picker', 'level', { x: 0, y: 0, w: 1, h: 2 });
  it.each([
    ['1280×800', ['target-below-44:level']],
    ['1180×820', ['target-below-44:level']],
    ['1920×1200', []],
    ['1280×800 portrait', ['target-below-44:level']],
  ])('a 1 × 2 level picker at %s', (name, expected) => {
    expect(rules(checkPanel(doc([level], DEVICES[name]!))).filter((r) => r.startsWith('target'))).toEqual(expected);
  });

  it('names the tile, the size and the device in a warning', () => {
    const [issue] = checkPanel(doc([level]));
    expect(issue).toMatchObject({ rule: 'target-below-44', severity: 'warning', pageId: 'main', tileIds: ['level'] });
    expect(issue!.message).toBe(
      '‘Level’ (level picker): its buttons are 62 × 29 px at 1280 × 800 landscape in run mode, under the 44 × 44 px that fingers hit reliably (WCAG 2.5.5). Make the tile larger.',
    );
  });

  it('makes a 2 × 1 cage picker an error at 1280 × 800 and a warning at 1920 × 1200', () => {
    // Run mode at 1280 × 800 draws 74.4 px cells: a 140.8 × 66.4 box, cqmin 0.664, heading 1.99 + 13.75, two
    // rows of two: (66.4 − 15.74 − 3.98 − 1.66) / 2 = 22.5 px high, under 24. At 1920 × 1200 (114.4 px
    // cells, 220.8 × 106.4 box) they are (106.4 − 16.94 − 6.38 − 2.66) / 2 = 40.2 px.
    const cage = tile('cage-picker', 'cage', { x: 0, y: 0, w: 2, h: 1 });
    const at1280 = checkPanel(doc([cage]));
    expect(at1280).toHaveLength(1);
    expect(at1280[0]).toMatchObject({ rule: 'target-below-24', severity: 'error' });
    expect(at1280[0]!.message).toContain('its buttons are 67 × 22 px at 1280 × 800 landscape in run mode, below the 24 × 24 px minimum (WCAG 2.5.8)');
    expect(rules(checkPanel(doc([cage], DEVICES['1920×1200'])))).toEqual(['target-below-44:cage']);
  });

  it('measures the reef picker’s branch buttons: 4 × 4 warns at 1280 × 800 and passes at 1920 × 1200', () => {
    const reef = tile('reef-picker', 'reef', { x: 0, y: 0, w: 4, h: 4 });
    expect(rules(checkPanel(doc([reef])))).toEqual(['target-below-44:reef']);
    expect(checkPanel(doc([reef]))[0]!.message).toContain('its branch buttons are 40 × 40 px');
    expect(checkPanel(doc([reef], DEVICES['1920×1200']))).toEqual([]);
    // The catalogue's 5 × 5 default passes at 1280 × 800 (51 px) but not in portrait (36 px).
    const big = tile('reef-picker', 'reef', { x: 0, y: 0 });
    expect(checkPanel(doc([big]))).toEqual([]);
    expect(rules(checkPanel(doc([big], DEVICES['1280×800 portrait'])))).toEqual(['target-below-44:reef']);
  });

  it('checks a pad as one tap area', () => {
    // A 1 × 1 pad on a 48 × 48 grid at 1280 × 800: 26.7 × 16.7 px cells less the 8 px gap → under 24.
    const pad = tile('push-pad', 'pad', { x: 0, y: 0, w: 1, h: 1 });
    const issues = checkPanel(doc([pad], LANDSCAPE_1280, { grid: { columns: 48, rows: 48, gapPx: 8 } }));
    expect(issues[0]).toMatchObject({ rule: 'target-below-24', tileIds: ['pad'] });
    expect(issues[0]!.message).toContain('its tap area is');
  });
});

describe('text contrast (WCAG 1.4.3, 4.5:1)', () => {
  // #777777 on white is 4.48:1 and #767676 on white 4.54:1 (WCAG 2.2 formulas; FACTS.md worked values).
  it('warns at 4.48:1 and passes at 4.54:1', () => {
    const readout = tile('readout', 'volts', { x: 0, y: 0 }, { thresholds: null });
    const failing = checkPanel(doc([readout], LANDSCAPE_1280, { theme: { ...DEFAULT_PANEL_THEME, surface: '#ffffff', text: '#777777' } }));
    expect(failing).toHaveLength(1);
    expect(failing[0]).toMatchObject({ id: 'low-contrast:main:volts', rule: 'low-contrast', severity: 'warning', tileIds: ['volts'] });
    expect(failing[0]!.message).toBe('‘Battery’ (readout): its text (Text on Surface) has a contrast of 4.47:1; text needs at least 4.5:1 (WCAG 1.4.3).');
    expect(checkPanel(doc([readout], LANDSCAPE_1280, { theme: { ...DEFAULT_PANEL_THEME, surface: '#ffffff', text: '#767676' } }))).toEqual([]);
  });

  it('checks the colours a readout and the match clock turn to', () => {
    const readout = tile('readout', 'volts', { x: 0, y: 0 });
    const clock = tile('match-clock', 'clock', { x: 3, y: 0 });
    const plain = tile('readout', 'temp', { x: 6, y: 0 }, { thresholds: null });
    // #767676 on white passes 4.5:1, #777777 does not (FACTS.md worked values).
    const theme = { ...DEFAULT_PANEL_THEME, surface: '#ffffff', text: '#000000', warn: '#777777', danger: '#767676' };
    const issues = checkPanel(doc([readout, clock, plain], LANDSCAPE_1280, { theme }));
    expect(issues.map((i) => i.id)).toEqual(['low-contrast:main:volts:warn', 'low-contrast:main:clock:warn']);
    expect(issues[0]!.message).toBe('‘Battery’ (readout): past its warn threshold its value turns Warn on Surface, a contrast of 4.47:1; text needs at least 4.5:1 (WCAG 1.4.3).');
    expect(issues[1]!.message).toContain('in the last 20 s it turns Warn on Surface');
  });

  it('checks the theme colours option buttons draw, once per page, naming the button tiles', () => {
    const station = tile('station-picker', 'station', { x: 0, y: 0 });
    const caption = tile('caption', 'title', { x: 0, y: 2 });
    const issues = checkPanel(doc([station, caption], LANDSCAPE_1280, { theme: { ...DEFAULT_PANEL_THEME, accent: '#3b444f', accentText: '#2c333c' } }));
    expect(rules(issues)).toEqual(['low-contrast:station']);
    expect(issues[0]!.id).toBe('low-contrast:main:buttons-chosen');
    expect(issues[0]!.message).toMatch(/^Buttons chosen draw Accent text on Accent at 1\.\d\d:1/);
  });
});

describe('overlap', () => {
  it('is an error naming both tiles; touching edges are fine', () => {
    const a = tile('lamp', 'a', { x: 0, y: 0, w: 2, h: 2 }, { label: 'Coral' });
    const b = tile('lamp', 'b', { x: 1, y: 1, w: 2, h: 2 }, { label: 'Algae' });
    const c = tile('lamp', 'c', { x: 3, y: 0, w: 2, h: 2 }, { label: 'Climb' });
    const issues = checkPanel(doc([a, b, c]));
    expect(issues).toEqual([
      {
        id: 'overlap:main:a+b',
        rule: 'overlap',
        severity: 'error',
        pageId: 'main',
        tileIds: ['a', 'b'],
        message: '‘Coral’ (lamp) and ‘Algae’ (lamp) overlap on page ‘Main’; one would cover the other. Move one of them.',
      },
    ]);
  });
});

describe('channels', () => {
  it('makes a tile with an empty channel an error, and never a caption', () => {
    const readout = tile('readout', 'r', { x: 0, y: 0 }, { channel: '' });
    const pad = tile('latch-pad', 'p', { x: 2, y: 0 }, { channel: '   ', label: '' });
    const echo = tile('target-echo', 'e', { x: 4, y: 0 }, { channels: [] });
    const caption = tile('caption', 'c', { x: 0, y: 3 });
    const issues = checkPanel(doc([readout, pad, echo, caption]));
    expect(rules(issues)).toEqual(['no-channel:r', 'no-channel:p', 'no-channel:e']);
    expect(issues[0]!.message).toBe('‘Battery’ (readout) is bound to no channel. Choose the channel it shows.');
    expect(issues[1]!.message).toBe('A latch pad is bound to no channel. Choose the channel it writes to.');
  });

  it('makes two tiles writing one channel with different types an error', () => {
    const level = tile('level-picker', 'level', { x: 0, y: 0 });
    const pad = tile('push-pad', 'pad', { x: 4, y: 0 }, { channel: 'op/reef/level', label: 'Quick L4' });
    const issues = checkPanel(doc([level, pad]));
    expect(rules(issues)).toEqual(['type-clash:level+pad']);
    expect(issues[0]!.message).toBe(
      'Two tiles write op/reef/level differently: ‘Level’ (level picker) writes string values but ‘Quick L4’ (push pad) writes boolean values. The robot reads one kind of value per channel; make them agree or use another channel.',
    );
  });

  it('says which values differ when two pickers offer different sets, on every page involved', () => {
    const level = tile('level-picker', 'level', { x: 0, y: 0 });
    const high = tile('level-picker', 'high', { x: 0, y: 0, h: 2 }, {
      label: 'High levels',
      options: [
        { label: 'L4', value: 'L4' },
        { label: 'L3', value: 'L3' },
        { label: 'Top', value: 'L5' },
      ],
    });
    const two: PanelDocument = { ...doc([level]), pages: [{ id: 'main', name: 'Main', tiles: [level] }, { id: 'alt', name: 'Alternate', tiles: [high] }] };
    const issues = checkPanel(two);
    expect(issues.map((i) => [i.id, i.pageId, i.tileIds])).toEqual([
      ['type-clash:main:op/reef/level', 'main', ['level', 'high']],
      ['type-clash:alt:op/reef/level', 'alt', ['level', 'high']],
    ]);
    expect(issues[0]!.message).toContain('only ‘Level’ (level picker) on ‘Main’ offers L2, L1; only ‘High levels’ (level picker) on ‘Alternate’ offers L5');
    // The same values in another order are no clash.
    const reordered = { ...high, options: [...level.options].reverse() };
    expect(checkPanel({ ...two, pages: [two.pages[0]!, { ...two.pages[1]!, tiles: [reordered] }] })).toEqual([]);
  });

  it('warns about channels the connected robot does not read, and only when it is connected', () => {
    const level = tile('level-picker', 'level', { x: 0, y: 0 });
    const slow = tile('latch-pad', 'slow', { x: 3, y: 0 });
    const eject = tile('push-pad', 'eject', { x: 3, y: 1 });
    const panel = doc([level, slow, eject]);
    const issues = checkPanel(panel, { robotReads: OP_CHANNEL_NAMES });
    expect(rules(issues)).toEqual(['robot-does-not-read:slow', 'robot-does-not-read:eject']);
    expect(issues[0]).toMatchObject({ id: 'robot-does-not-read:main:op/drive/slow-mode', severity: 'warning' });
    expect(issues[0]!.message).toBe(
      'The connected robot does not read op/drive/slow-mode, so ‘Slow mode’ (latch pad) changes nothing on it. Check the channel name against the robot code, or add it there.',
    );
    expect(checkPanel(panel)).toEqual([]);
    expect(checkPanel(panel, { robotReads: [...OP_CHANNEL_NAMES, 'op/drive/', 'op/intake/eject'] })).toEqual([]);
  });

  it('reads prefixes only where the entry ends in a slash', () => {
    expect(robotReadsChannel(['op/reef/'], 'op/reef/level')).toBe(true);
    expect(robotReadsChannel(['op/reef'], 'op/reef/level')).toBe(false);
    expect(robotReadsChannel(['op/reef/level'], 'op/reef/level')).toBe(true);
  });
});

describe('the issue list', () => {
  it('puts errors first, keeps ids unique, and finds the issues of one tile', () => {
    const small = tile('level-picker', 'small', { x: 0, y: 0, w: 1, h: 2 });
    const a = tile('lamp', 'a', { x: 4, y: 0 });
    const b = tile('lamp', 'b', { x: 4, y: 0 });
    const issues = checkPanel(doc([small, a, b]));
    expect(issues.map((i) => i.severity)).toEqual(['error', 'warning']);
    expect(new Set(issues.map((i) => i.id)).size).toBe(issues.length);
    expect(countIssues(issues)).toEqual({ errors: 1, warnings: 1 });
    expect(issuesForTile(issues, 'main', 'a').map((i) => i.rule)).toEqual(['overlap']);
    // The same document checked again gives the same ids (React keys).
    expect(checkPanel(doc([small, a, b])).map((i) => i.id)).toEqual(issues.map((i) => i.id));
  });
});
