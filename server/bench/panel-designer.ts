// The panel designer in headless Chromium (Debian's /usr/bin/chromium): a panel of 60 tiles on the canvas, one
// tile dragged across it and back with many pointer moves, while the page records the time between its
// requestAnimationFrame callbacks. Reported: p50 and p95 frame time, the share of frames over 16.7 ms (one
// 60 Hz frame), and frames per second over the drag.
//
// `node --import tsx server/bench/panel-designer.ts` runs this case alone on a throw-away database; `npm run
// bench` runs it with the others.
import pg from 'pg';
import { pathToFileURL } from 'node:url';
import { launchBrowser } from '../../tests/support/browser';
import { TILE_CATALOGUE } from '../../shared/domain/panels/tile-catalogue';
import { starterPanelDocument } from '../../shared/domain/panels/starter-panel';
import type { PanelDocument, Tile, TileKind } from '../../shared/schemas/panel';
import { buildClientIfStale } from '../bin/build-client';
import { connectDb } from '../db/client';
import { withDatabase } from '../db/embedded-postgres';
import { runMigrations } from '../db/migrate';
import { seedDemoRecordings } from '../features/demo/demo-recordings';
import { seedDemo } from '../features/demo/seed';
import { readEnv } from '../env';
import { createLogger } from '../lib/logger';
import { provideDatabase } from '../runtime';
import { signInDemo, startBenchServer, type BenchServer } from './bench-server';

const TILES = 60;
const MOVES = 600;
/** One frame at 60 Hz, ms. */
const FRAME_BUDGET_MS = 1000 / 60;

/** A 4 × 4 reef picker and 59 tiles of every other kind, 2 × 1 cells each, row by row on the 16 × 10 starter grid. */
export function sixtyTilePanel(): PanelDocument {
  const doc = starterPanelDocument();
  const kinds = (Object.keys(TILE_CATALOGUE) as TileKind[]).filter((k) => k !== 'reef-picker');
  const tiles: Tile[] = [{ ...TILE_CATALOGUE['reef-picker'].create('reef', { x: 0, y: 0 }, doc.theme), w: 4, h: 4 }];
  let i = 0;
  for (let y = 0; y < doc.grid.rows && tiles.length < TILES; y += 1) {
    for (let x = 0; x + 2 <= doc.grid.columns && tiles.length < TILES; x += 2) {
      if (x < 4 && y < 4) continue; // under the reef picker
      const kind = kinds[i % kinds.length]!;
      tiles.push({ ...TILE_CATALOGUE[kind].create(`tile-${i}`, { x, y }, doc.theme), w: 2, h: 1 } as Tile);
      i += 1;
    }
  }
  return { ...doc, pages: [{ ...doc.pages[0]!, tiles }] };
}

const quantile = (sorted: number[], p: number) => sorted[Math.min(sorted.length - 1, Math.floor(p * sorted.length))]!;

export async function benchPanelDesigner(options: { server: BenchServer }): Promise<string[]> {
  const { server } = options;
  buildClientIfStale(() => {});
  const programmer = await signInDemo(server.url, 'programmer@harborlight.example');
  const res = await fetch(`${server.url}/api/panels`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', cookie: programmer.cookie, 'x-csrf-token': programmer.csrf },
    body: JSON.stringify({ name: 'Bench: sixty tiles', document: sixtyTilePanel() }),
  });
  if (!res.ok) throw new Error(`creating the bench panel failed: ${res.status} ${await res.text()}`);
  const { id } = (await res.json()) as { id: string };

  const browser = await launchBrowser();
  try {
    const context = await browser.newContext({ viewport: { width: 1440, height: 900 } });
    await context.addCookies(
      programmer.cookie.split('; ').map((pair) => {
        const [name, ...rest] = pair.split('=');
        return { name: name!, value: rest.join('='), url: server.url };
      }),
    );
    const page = await context.newPage();
    await page.goto(`${server.url}/panels/${id}/edit`);
    await page.waitForFunction((n) => document.querySelectorAll('[data-design-tile]').length === n, TILES, { timeout: 30_000 });
    const tileCount = await page.locator('[data-design-tile]').count();
    const canvas = (await page.getByTestId('design-canvas').boundingBox())!;
    const reef = (await page.locator('[data-design-tile="reef"]').boundingBox())!;

    // A string, not a function: tsx's keepNames would wrap an inner named function in a __name the page lacks.
    await page.evaluate(`(() => {
      window.__deltas = [];
      window.__counting = true;
      let last = performance.now();
      const tick = (t) => { if (!window.__counting) return; window.__deltas.push(t - last); last = t; requestAnimationFrame(tick); };
      requestAnimationFrame((t) => { last = t; requestAnimationFrame(tick); });
    })()`);
    const start = { x: reef.x + reef.width / 2, y: reef.y + reef.height / 2 };
    await page.mouse.move(start.x, start.y);
    await page.mouse.down();
    const startedMs = performance.now();
    // Across to the far right, down to the free bottom rows and back: a path over every other tile.
    const path = [
      { x: canvas.x + canvas.width - 20, y: start.y },
      { x: canvas.x + canvas.width - 20, y: canvas.y + canvas.height - 20 },
      { x: canvas.x + 20, y: canvas.y + canvas.height - 20 },
      { x: start.x + 1, y: canvas.y + canvas.height * 0.85 },
    ];
    let from = start;
    for (const to of path) {
      const steps = MOVES / path.length;
      for (let i = 1; i <= steps; i += 1) await page.mouse.move(from.x + ((to.x - from.x) * i) / steps, from.y + ((to.y - from.y) * i) / steps);
      from = to;
    }
    await page.mouse.up();
    const elapsedMs = performance.now() - startedMs;
    const deltas = (await page.evaluate(`(() => { window.__counting = false; return window.__deltas; })()`)) as number[];
    const moved = await page.locator('[data-design-tile="reef"]').getAttribute('aria-label');

    const sorted = [...deltas].sort((a, b) => a - b);
    const over = deltas.filter((d) => d > FRAME_BUDGET_MS + 0.5).length;
    const framesMs = deltas.reduce((s, d) => s + d, 0);
    return [
      `  designer drag: ${tileCount} tiles on the canvas, the reef picker dragged through ${MOVES} pointer moves in ${(elapsedMs / 1000).toFixed(1)} s (${(MOVES / (elapsedMs / 1000)).toFixed(0)} moves/s); dropped ${moved?.split(', ').slice(1).join(', ')}`,
      `  ${'frame time p50 / p95'.padEnd(40)} ${quantile(sorted, 0.5).toFixed(1).padStart(6)} / ${quantile(sorted, 0.95).toFixed(1)} ms   (target ≤ 16.7)`,
      `  ${'frames over 16.7 ms'.padEnd(40)} ${((over / Math.max(1, deltas.length)) * 100).toFixed(1).padStart(6)} %   (${over} of ${deltas.length})`,
      `  ${'frames per second'.padEnd(40)} ${(deltas.length / (framesMs / 1000)).toFixed(1).padStart(6)}     (target ≥ 60)`,
    ];
  } finally {
    await browser.close();
  }
}

// Run alone: a throw-away database on the embedded cluster (or DATABASE_URL's server) and a server child.
if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  const env = readEnv();
  const database = await provideDatabase(env, createLogger('warn'));
  const name = `pitwall_bench_designer_${process.pid}`;
  const admin = new pg.Client({ connectionString: database.url });
  await admin.connect();
  await admin.query(`create database ${name}`);
  let server: BenchServer | undefined;
  try {
    // Migrated and seeded here first (the seed is idempotent), so the server child starts at once.
    const handle = connectDb(withDatabase(database.url, name));
    await runMigrations(handle.db);
    await seedDemo(handle.db);
    await seedDemoRecordings(handle.db);
    await handle.close();
    server = await startBenchServer(withDatabase(database.url, name));
    process.stdout.write(`panel designer in the browser\n${(await benchPanelDesigner({ server })).join('\n')}\n`);
  } finally {
    await server?.stop();
    await admin.query(`drop database if exists ${name} with (force)`);
    await admin.end();
    await database.stop();
  }
}
