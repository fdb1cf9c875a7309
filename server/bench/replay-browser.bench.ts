// The replay page in headless Chromium (Debian's /usr/bin/chromium): time from navigation to the first drawn
// trace (a uPlot canvas with pixels of a trace colour), against navigating to a static page of the same server
// (/sign-in, to its form); then scrubbing with six traces and the field map, driven by the → key for 3 s while
// the page counts its requestAnimationFrame callbacks.
import { buildClientIfStale } from '../bin/build-client';
import { launchBrowser } from '../../tests/support/browser';
import { signInDemo, type BenchServer } from './bench-server';

const RUNS = 5;
const SCRUB_MS = 3000;
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;

/** In the page: true once some uPlot canvas holds a pixel near the first trace colour (#F5A30F). */
function hasDrawnTrace(): boolean {
  for (const canvas of document.querySelectorAll<HTMLCanvasElement>('.uplot canvas')) {
    if (canvas.width === 0 || canvas.height === 0) continue;
    const data = canvas.getContext('2d')!.getImageData(0, 0, canvas.width, canvas.height).data;
    for (let i = 0; i < data.length; i += 4) {
      if (data[i + 3]! > 200 && Math.abs(data[i]! - 0xf5) < 24 && Math.abs(data[i + 1]! - 0xa3) < 24 && data[i + 2]! < 60) return true;
    }
  }
  return false;
}

export async function benchReplayBrowser(options: { server: BenchServer; recordingId: string }): Promise<string[]> {
  const { server, recordingId } = options;
  buildClientIfStale(() => {});
  const coach = await signInDemo(server.url, 'coach@harborlight.example');
  const browser = await launchBrowser();
  try {
    const context = await browser.newContext({ viewport: { width: 1440, height: 1000 } });
    await context.addCookies(
      coach.cookie.split('; ').map((pair) => {
        const [name, ...rest] = pair.split('=');
        return { name: name!, value: rest.join('='), url: server.url };
      }),
    );
    const page = await context.newPage();
    const staticMs: number[] = [];
    const traceMs: number[] = [];
    for (let run = 0; run < RUNS; run += 1) {
      // Fresh page loads each run (the browser's cache as a returning member has it).
      await page.goto(`${server.url}/sign-in`, { waitUntil: 'commit' });
      await page.waitForFunction(() => document.querySelector('form') !== null, undefined, { polling: 'raf' });
      staticMs.push(await page.evaluate(() => performance.now()));
      await page.goto(`${server.url}/recordings/${recordingId}`, { waitUntil: 'commit' });
      await page.waitForFunction(hasDrawnTrace, undefined, { polling: 'raf', timeout: 30_000 });
      traceMs.push(await page.evaluate(() => performance.now()));
    }

    // Scrubbing: the page is on the replay with the default six traces and the field map.
    const traces = await page.evaluate(() => document.querySelectorAll('.uplot').length);
    const hasField = await page.evaluate(() => document.querySelector('[data-robot-x]') !== null);
    await page.locator('body').click({ position: { x: 5, y: 5 } });
    // A string, not a function: tsx's keepNames would wrap the inner named function in a __name the page lacks.
    await page.evaluate(`(() => {
      window.__frames = 0;
      window.__counting = true;
      const tick = () => { if (!window.__counting) return; window.__frames += 1; requestAnimationFrame(tick); };
      requestAnimationFrame(tick);
    })()`);
    const start = performance.now();
    let keys = 0;
    while (performance.now() - start < SCRUB_MS) {
      await page.keyboard.press('ArrowRight');
      keys += 1;
    }
    const { frames, elapsedMs, cursor } = await page.evaluate((ms) => {
      const w = window as unknown as { __frames: number; __counting: boolean };
      w.__counting = false;
      return { frames: w.__frames, elapsedMs: ms, cursor: document.querySelector('[data-testid="cursor-time"]')?.textContent ?? '' };
    }, performance.now() - start);
    const fps = frames / (elapsedMs / 1000);
    const staticP50 = median(staticMs);
    const traceP50 = median(traceMs);
    return [
      `  replay of the 1.8 M-sample recording, median of ${RUNS} loads (from navigation, the page's own clock)`,
      `  ${'static page: /sign-in to its form'.padEnd(58)} ${staticP50.toFixed(0).padStart(6)} ms   1.00× static`,
      `  ${'replay: /recordings/:id to the first drawn trace'.padEnd(58)} ${traceP50.toFixed(0).padStart(6)} ms   ${(traceP50 / staticP50).toFixed(2)}× static (target ≤ 1.5 s)`,
      `  scrubbing (→ key, ${keys} presses in ${(elapsedMs / 1000).toFixed(1)} s, cursor at ${cursor.trim()}) with ${traces} trace panes (six traces)` +
        `${hasField ? ' and the field map with a pose' : ' (the field map showed no robot pose: data-robot-x absent)'}: ${fps.toFixed(1)} frames per second (target ≥ 50)`,
    ];
  } finally {
    await browser.close();
  }
}
