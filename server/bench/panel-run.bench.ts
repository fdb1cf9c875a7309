// Run mode in headless Chromium (Debian's /usr/bin/chromium) as the demo operator: time from navigation to
// "ready for the first tap" (the reef picker's twelve branch buttons drawn and enabled and the relay link
// open), with a cold cache (a new browser context each run) and warm (reload in the same context, the
// service worker installed), against /sign-in to its form measured the same ways in the same run; and the
// gzipped size of the JavaScript the /run page (client/run.html, its own light entry) loads, from the
// network responses of a cold load.
import { gzipSync } from 'node:zlib';
import type { Browser, BrowserContext } from 'playwright-core';
import { launchBrowser } from '../../tests/support/browser';
import { buildClientIfStale } from '../bin/build-client';
import { signInDemo, type BenchServer } from './bench-server';

const RUNS = 5;
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;

// Strings, not functions: tsx's keepNames would wrap inner named functions in a __name the page lacks.
const RUN_READY = `(() => {
  const buttons = document.querySelectorAll('[data-tile-kind="reef-picker"] [role="button"]');
  if (buttons.length !== 12) return false;
  for (const b of buttons) if (b.getAttribute('aria-disabled') === 'true') return false;
  return document.querySelector('[aria-label="Relay link"][data-tone="ok"]') !== null;
})()`;
const FORM_READY = `document.querySelector('form') !== null`;

async function signedInContext(browser: Browser, url: string, cookie: string): Promise<BrowserContext> {
  const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
  await context.addCookies(
    cookie.split('; ').map((pair) => {
      const [name, ...rest] = pair.split('=');
      return { name: name!, value: rest.join('='), url };
    }),
  );
  return context;
}

/** Milliseconds from navigation (the page's own clock) until `ready` holds; `reload` reloads instead of going. */
async function timeTo(context: BrowserContext, url: string, ready: string, reload = false): Promise<number> {
  const page = context.pages()[0] ?? (await context.newPage());
  if (reload) await page.reload({ waitUntil: 'commit' });
  else await page.goto(url, { waitUntil: 'commit' });
  await page.waitForFunction(ready, undefined, { polling: 'raf', timeout: 30_000 });
  return page.evaluate(() => performance.now());
}

type Script = { url: string; rawBytes: number; gzipBytes: number; text: string };

/** Every script a cold load of `pathname` fetches until `ready` and the network is idle, with its gzipped size. */
async function loadedScripts(browser: Browser, url: string, cookie: string, pathname: string, ready: string): Promise<Script[]> {
  const context = cookie ? await signedInContext(browser, url, cookie) : await browser.newContext({ viewport: { width: 1280, height: 800 } });
  const scripts: Script[] = [];
  const page = await context.newPage();
  page.on('response', async (response) => {
    if (response.request().resourceType() !== 'script') return;
    const body = await response.body().catch(() => undefined);
    if (!body) return;
    scripts.push({ url: new URL(response.url()).pathname, rawBytes: body.length, gzipBytes: gzipSync(body).length, text: body.toString('utf8') });
  });
  await page.goto(`${url}${pathname}`, { waitUntil: 'commit' });
  await page.waitForFunction(ready, undefined, { polling: 'raf', timeout: 30_000 });
  await page.waitForLoadState('networkidle');
  await context.close();
  return scripts;
}

export async function benchPanelRun(options: { server: BenchServer }): Promise<string[]> {
  const { server } = options;
  buildClientIfStale(() => {});
  const operator = await signInDemo(server.url, 'operator@harborlight.example');
  const browser = await launchBrowser();
  try {
    const cold = { run: [] as number[], signIn: [] as number[] };
    const warm = { run: [] as number[], signIn: [] as number[] };
    for (let i = 0; i < RUNS; i += 1) {
      const signInContext = await browser.newContext({ viewport: { width: 1280, height: 800 } });
      cold.signIn.push(await timeTo(signInContext, `${server.url}/sign-in`, FORM_READY));
      warm.signIn.push(await timeTo(signInContext, `${server.url}/sign-in`, FORM_READY, true));
      await signInContext.close();
      const runContext = await signedInContext(browser, server.url, operator.cookie);
      cold.run.push(await timeTo(runContext, `${server.url}/run`, RUN_READY));
      // Let the service worker take the page and keep what it loaded, as a tablet that sat on /run has it.
      await runContext.pages()[0]!.waitForSelector('[data-offline="ready"]', { timeout: 10_000 }).catch(() => {});
      warm.run.push(await timeTo(runContext, `${server.url}/run`, RUN_READY, true));
      await runContext.close();
    }

    // The JavaScript of a cold /run load, as served, gzipped here at the default level; /sign-in's for comparison.
    const scripts = await loadedScripts(browser, server.url, operator.cookie, '/run', RUN_READY);
    const signInScripts = await loadedScripts(browser, server.url, '', '/sign-in', FORM_READY);
    const gzipKb = scripts.reduce((sum, s) => sum + s.gzipBytes, 0) / 1000;
    const rawKb = scripts.reduce((sum, s) => sum + s.rawBytes, 0) / 1000;
    // Markers that survive minification: uPlot's legend class, dnd-kit's accessibility announcer id, a designer
    // command label, React Router's hook guard message (run mode has its own page without the router).
    const unwanted = [
      ['React Router', (t: string) => t.includes('may be used only in the context of a <Router> component')],
      ['uPlot', (t: string) => t.includes('u-legend')],
      ['dnd-kit', (t: string) => t.includes('DndDescribedBy')],
      ['the designer', (t: string) => t.includes('Align horizontal centres')],
    ] as const;
    const loadedUnwanted = unwanted.filter(([, has]) => scripts.some((s) => has(s.text))).map(([name]) => name);
    const shared = scripts.filter((s) => signInScripts.some((o) => o.url === s.url)).reduce((sum, s) => sum + s.gzipBytes, 0) / 1000;
    const bySize = [...scripts].sort((a, b) => b.gzipBytes - a.gzipBytes).map((s) => `${s.url.replace('/assets/', '')} ${(s.gzipBytes / 1000).toFixed(1)}`);

    const row = (label: string, ms: number, base: number, target = '') =>
      `  ${label.padEnd(62)} ${ms.toFixed(0).padStart(6)} ms   ${(ms / base).toFixed(2)}× sign-in${target}`;
    return [
      `  run mode as the demo operator at 1280 × 800, median of ${RUNS} loads (from navigation, the page's own clock)`,
      row('cold: /sign-in to its form (new context)', median(cold.signIn), median(cold.signIn)),
      row('cold: /run to ready for the first tap (new context)', median(cold.run), median(cold.signIn), ' (target ≤ 1 s)'),
      row('warm: /sign-in to its form (reload)', median(warm.signIn), median(warm.signIn)),
      row('warm: /run to ready for the first tap (reload, service worker)', median(warm.run), median(warm.signIn), ' (target ≤ 1 s)'),
      `  JavaScript the /run route loads: ${scripts.length} files, ${rawKb.toFixed(1)} kB raw, ${gzipKb.toFixed(1)} kB gzipped (target ≤ 150 kB)`,
      `    of which ${shared.toFixed(1)} kB is in files /sign-in loads too (React DOM, TanStack Query, zod) and ${(gzipKb - shared).toFixed(1)} kB is run mode's own`,
      `    per file, kB gzipped: ${bySize.join(', ')}`,
      `    ${loadedUnwanted.length === 0 ? 'loads no React Router, no uPlot, no dnd-kit and no designer code' : `ALSO LOADS: ${loadedUnwanted.join(', ')}`}`,
    ];
  } finally {
    await browser.close();
  }
}
