// The panel check measures touch targets with formulas (shared/domain/panels/touch-targets.ts) that restate
// how the tile renderers and run mode lay a panel out. This test holds the formulas to the real thing: run
// mode in headless Chromium draws a panel of pickers, pads and a reef picker on tablets of several sizes,
// and every button's box measured in the page must be where and as large as the formulas say.
import path from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { deviceSize } from '../../shared/domain/panels/grid';
import { DEFAULT_PANEL_THEME, TILE_CATALOGUE } from '../../shared/domain/panels/tile-catalogue';
import { reefPickerGeometry, runCanvasSize, tileTouchTargets } from '../../shared/domain/panels/touch-targets';
import type { Device, PanelDocument, Tile } from '../../shared/schemas/panel';
import { SHOTS, signInAs, startBrowserStack, type BrowserStack } from '../support/e2e';

let stack: BrowserStack;
afterAll(async () => {
  await stack?.close();
});
beforeAll(async () => {
  stack = await startBrowserStack();
});

const at = <K extends Tile['kind']>(kind: K, id: string, place: { x: number; y: number; w: number; h: number }, label: string): Tile =>
  ({ ...TILE_CATALOGUE[kind].create(id, { x: place.x, y: place.y }), w: place.w, h: place.h, label }) as Tile;

function panelFor(device: Device): PanelDocument {
  const portrait = device.orientation === 'portrait';
  const grid = portrait ? { columns: 10, rows: 16, gapPx: 8 } : { columns: 16, rows: 10, gapPx: 8 };
  const tiles: Tile[] = [
    at('reef-picker', 'reef', { x: 0, y: 0, w: 5, h: 5 }, 'Branch'),
    at('level-picker', 'level', { x: 5, y: 0, w: 1, h: 4 }, 'Level'),
    at('cage-picker', 'cage', { x: 0, y: 6, w: 4, h: 1 }, 'Cage'),
    at('station-picker', 'station', { x: 6, y: 0, w: 3, h: 1 }, 'Station'),
    at('algae-picker', 'algae', { x: 6, y: 1, w: 2, h: 2 }, 'Algae'),
    at('push-pad', 'eject', { x: 0, y: 8, w: 2, h: 1 }, 'Eject'),
    at('latch-pad', 'slow', { x: 2, y: 8, w: 1, h: 1 }, 'Slow'),
  ];
  return { device, grid, theme: { ...DEFAULT_PANEL_THEME }, pages: [{ id: 'main', name: 'Main', tiles }] };
}

type Box = { x: number; y: number; width: number; height: number };
async function box(page: Page, selector: string): Promise<Box> {
  const b = await page.locator(selector).first().boundingBox();
  if (!b) throw new Error(`${selector} is not drawn`);
  return b;
}

const DEVICES: Device[] = [
  { preset: 'tablet-1280x800', widthPx: 1280, heightPx: 800, orientation: 'landscape' },
  { preset: 'tablet-1180x820', widthPx: 1180, heightPx: 820, orientation: 'landscape' },
  { preset: 'tablet-1920x1200', widthPx: 1920, heightPx: 1200, orientation: 'landscape' },
  { preset: 'tablet-1280x800', widthPx: 1280, heightPx: 800, orientation: 'portrait' },
];

describe('touch targets in run mode match the panel check’s formulas', () => {
  it.each(DEVICES.map((d) => [`${deviceSize(d).widthPx}×${deviceSize(d).heightPx}`, d] as const))('at %s', async (name, device) => {
    const document = panelFor(device);
    const programmer = await stack.server.client();
    await programmer.post('/api/auth/sign-in').send({ email: 'programmer@harborlight.example', password: 'harborlight-demo' }).expect(200);
    const created = await programmer.post('/api/panels').send({ name: `Targets ${name}`, document }).expect(201);
    const screen = deviceSize(device);
    const page = await signInAs(stack, 'programmer', { width: screen.widthPx, height: screen.heightPx });
    await page.goto(`${stack.server.url}/panels/${created.body.id as string}/run`);
    await page.locator('[data-testid="run-canvas"] [data-tile-id="level"] button').first().waitFor();
    await page.locator('[data-tile-id="reef"] [data-branch="A"] path').waitFor();

    // The canvas: the screen less the status strip, the device's shape kept.
    const canvas = await box(page, '[data-testid="run-canvas"]');
    const expected = runCanvasSize(device);
    expect(canvas.width).toBeCloseTo(expected.widthPx, 0);
    expect(canvas.height).toBeCloseTo(expected.heightPx, 0);
    const drawn = { widthPx: canvas.width, heightPx: canvas.height };

    // Every option and pad button: its box within 1 px of the formula, relative to the canvas.
    const tiles = document.pages[0]!.tiles;
    let checked = 0;
    for (const tile of tiles.filter((t) => t.kind !== 'reef-picker')) {
      const targets = tileTouchTargets(tile, device, document.grid, { canvasPx: drawn });
      const buttons = page.locator(`[data-tile-id="${tile.id}"] button`);
      expect(await buttons.count()).toBe(targets.length);
      for (const [i, target] of targets.entries()) {
        const b = (await buttons.nth(i).boundingBox())!;
        const where = `${tile.id} ${target.key}`;
        expect(Math.abs(b.width - target.widthPx), `${where} width ${b.width} vs ${target.widthPx}`).toBeLessThanOrEqual(1);
        expect(Math.abs(b.height - target.heightPx), `${where} height ${b.height} vs ${target.heightPx}`).toBeLessThanOrEqual(1);
        expect(Math.abs(b.x - canvas.x - target.rectPx!.xPx), `${where} x`).toBeLessThanOrEqual(1);
        expect(Math.abs(b.y - canvas.y - target.rectPx!.yPx), `${where} y`).toBeLessThanOrEqual(1);
        checked += 1;
      }
    }
    expect(checked).toBe(4 + 4 + 2 + 3 + 1 + 1);

    // The reef picker: the drawing's size, and the ring the branch buttons fill (radii and sweep of the
    // path as drawn, in the SVG's metres).
    const reef = reefPickerGeometry(tiles[0]!, device, document.grid, { canvasPx: drawn });
    const svg = await box(page, '[data-tile-id="reef"] svg');
    expect(Math.abs(Math.min(svg.width, svg.height) - reef.drawingSidePx), `reef drawing ${svg.width}×${svg.height} vs ${reef.drawingSidePx}`).toBeLessThanOrEqual(1);
    const d = (await page.locator('[data-tile-id="reef"] [data-branch="A"] path').getAttribute('d'))!;
    const numbers = [...d.matchAll(/-?\d+(?:\.\d+)?/g)].map((m) => Number(m[0]));
    // M x0 y0 A R R 0 0 0 x1 y1 L x2 y2 A r r 0 0 1 x3 y3 Z
    const [x0, y0, outerR, , , , , x1, y1, , , innerR] = numbers as [number, number, number, number, number, number, number, number, number, number, number, number];
    expect(outerR).toBeCloseTo(reef.outerRM, 3);
    expect(innerR).toBeCloseTo(reef.innerRM, 2);
    const sweepDeg = Math.abs(((Math.atan2(-y1, x1) - Math.atan2(-y0, x0)) * 180) / Math.PI);
    expect(Math.min(sweepDeg, 360 - sweepDeg)).toBeCloseTo(reef.sweepDeg, 2);
    // The drawn button's box is at least as large as the square the check counts.
    const branch = await box(page, '[data-tile-id="reef"] [data-branch="A"] path');
    expect(Math.max(branch.width, branch.height)).toBeGreaterThanOrEqual(reef.buttonSidePx - 1);

    await page.screenshot({ path: path.join(SHOTS, `touch-targets-${name}-${device.orientation}.png`) });
    await page.context().close();
  });
});
