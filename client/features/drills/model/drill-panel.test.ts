import { describe, expect, it } from 'vitest';
import { DEMO_MATCH_PANEL } from '../../../../shared/domain/panels/demo-panel';
import type { PanelDocument } from '../../../../shared/schemas/panel';
import { drillPage, pageParts, partForChannel, tapFromTile } from './drill-panel';

describe('partForChannel', () => {
  it.each([
    ['op/reef/branch', 'branch'],
    ['op/reef/level', 'level'],
    ['op/station', 'station'],
    ['op/cage', undefined],
    ['op/drill/call', undefined],
  ])('%s answers %s', (channel, part) => {
    expect(partForChannel(channel)).toBe(part);
  });
});

describe('drillPage', () => {
  it('finds the demo match panel’s page with the reef, level and station pickers', () => {
    const found = drillPage(DEMO_MATCH_PANEL)!;
    expect(found.parts).toEqual(['branch', 'level', 'station']);
    expect(DEMO_MATCH_PANEL.pages).toContain(found.page);
  });

  it('gives nothing for a panel without pickers', () => {
    const bare: PanelDocument = { ...DEMO_MATCH_PANEL, pages: [{ id: 'p1', name: 'Empty', tiles: [] }] };
    expect(drillPage(bare)).toBeUndefined();
    expect(pageParts(bare.pages[0]!)).toEqual([]);
  });
});

describe('tapFromTile', () => {
  it('reads a picker’s string value and ignores tiles that answer nothing', () => {
    const page = drillPage(DEMO_MATCH_PANEL)!.page;
    const reef = page.tiles.find((t) => t.kind === 'reef-picker')!;
    expect(tapFromTile(reef, 'C')).toEqual({ part: 'branch', value: 'C' });
    expect(tapFromTile(reef, true)).toBeUndefined();
    const caption = page.tiles.find((t) => t.kind === 'caption');
    if (caption) expect(tapFromTile(caption, 'x')).toBeUndefined();
  });
});
