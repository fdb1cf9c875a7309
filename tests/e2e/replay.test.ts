// Through the real UI in headless Chromium: the demo coach opens a simulated match, plays it and sees the cursor
// and the robot move, jumps to the next event, adds a note at the cursor, and opens a link to a moment; the demo
// programmer edits a recording's details, which the coach then sees read only.
import { existsSync, mkdirSync } from 'node:fs';
import path from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '../../shared/domain/roles';
import { DEMO_MEMBERS, DEMO_PASSWORD } from '../../server/features/demo/demo-team';
import { seedDemoRecordings } from '../../server/features/demo/demo-recordings';
import { seedDemo } from '../../server/features/demo/seed';
import { CLIENT_DIST, PROJECT_ROOT } from '../../server/runtime';
import { launchBrowser } from '../support/browser';
import { startTestServer, type TestServer } from '../support/test-server';

const SHOTS = path.join(PROJECT_ROOT, '.data', 'screenshots');
let server: TestServer;
let browser: Browser;

beforeAll(async () => {
  if (!existsSync(path.join(CLIENT_DIST, 'index.html'))) throw new Error('build the client first (npm test does)');
  mkdirSync(SHOTS, { recursive: true });
  server = await startTestServer({ clientDir: CLIENT_DIST });
  await seedDemo(server.db.db);
  await seedDemoRecordings(server.db.db);
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await server?.close();
});

async function signInAs(role: Role): Promise<Page> {
  const member = DEMO_MEMBERS.find((m) => m.role === role)!;
  const context = await browser.newContext({ viewport: { width: 1440, height: 900 } });
  await context.grantPermissions(['clipboard-read', 'clipboard-write'], { origin: server.url });
  const page = await context.newPage();
  await page.goto(`${server.url}/sign-in`);
  await page.getByLabel('E-mail').fill(member.email);
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect.poll(() => page.url()).not.toContain('/sign-in');
  return page;
}

const cursorSeconds = async (page: Page) => Number.parseFloat((await page.getByTestId('cursor-time').textContent()) ?? 'NaN');
const robotAt = (page: Page) =>
  page.locator('[data-robot-x]').evaluate((el) => `${el.getAttribute('data-robot-x')},${el.getAttribute('data-robot-y')}`);

describe('replay through the UI', () => {
  it('plays a simulated match, moves the field map, jumps to an event, takes a note and opens a link to a moment', async () => {
    const page = await signInAs('coach');
    await page.goto(`${server.url}/recordings?kind=simulated`);
    await page.getByRole('table').getByRole('row').nth(1).getByRole('link').first().click();
    await page.getByTestId('cursor-time').waitFor();
    await page.locator('[data-trace-pane] canvas').first().waitFor();
    expect(await cursorSeconds(page)).toBe(0);

    // Start a little into auto so the robot is moving.
    await page.keyboard.press(']');
    await expect.poll(() => cursorSeconds(page)).toBeGreaterThan(0);
    const before = await cursorSeconds(page);
    await page.locator('[data-robot-x]').waitFor();
    const robotBefore = await robotAt(page);
    await page.getByRole('button', { name: 'Play' }).click();
    await expect.poll(() => cursorSeconds(page), { timeout: 10_000 }).toBeGreaterThan(before + 1.5);
    await expect.poll(() => robotAt(page), { timeout: 10_000 }).not.toBe(robotBefore);
    await page.screenshot({ path: path.join(SHOTS, 'replay-playing.png'), fullPage: false });
    await page.getByRole('button', { name: 'Pause' }).click();

    const paused = await cursorSeconds(page);
    await page.getByRole('button', { name: 'Next event' }).click();
    await expect.poll(() => cursorSeconds(page)).toBeGreaterThan(paused);
    const atEvent = await cursorSeconds(page);
    expect(await page.getByTestId('last-event').textContent()).toContain(`${atEvent.toFixed(2)} s`);
    // The address follows the paused cursor.
    await expect.poll(() => new URL(page.url()).searchParams.get('t')).toBe(String(Number(atEvent.toFixed(2))));

    await page.getByLabel('Note at the cursor').fill('Slow to line up on the reef here');
    await page.getByRole('button', { name: 'Add note' }).click();
    const note = page.getByRole('list', { name: 'Notes' }).getByText('Slow to line up on the reef here');
    await note.waitFor();
    await page.getByRole('button', { name: new RegExp(`^Note at ${atEvent.toFixed(2)} s`) }).waitFor();
    await page.getByRole('list', { name: 'Notes' }).scrollIntoViewIfNeeded();
    await page.screenshot({ path: path.join(SHOTS, 'replay-note.png'), fullPage: false });

    const url = new URL(page.url());
    url.searchParams.set('t', '93.2');
    await page.goto(url.toString());
    await expect.poll(() => page.getByTestId('cursor-time').textContent()).toBe('93.20 s');
    await page.locator('[data-trace-pane] canvas').first().waitFor();
    await page.screenshot({ path: path.join(SHOTS, 'replay-moment.png'), fullPage: false });

    // The coach deletes their own note.
    await page.getByRole('button', { name: /^Delete note/ }).click();
    await expect.poll(() => page.getByRole('list', { name: 'Notes' }).count()).toBe(0);
  });

  it('lets the programmer change the match number and operator of a recording, and shows them to the coach read only', async () => {
    const page = await signInAs('programmer');
    await page.goto(`${server.url}/recordings?kind=simulated`);
    await page.getByRole('table').getByRole('row').nth(2).getByRole('link').first().click();
    await page.getByTestId('cursor-time').waitFor();
    const replayUrl = page.url();

    const details = page.getByRole('form', { name: 'Recording details' });
    await details.getByLabel('Match number', { exact: true }).fill('0');
    await details.getByRole('button', { name: 'Save details' }).click();
    await expect.poll(() => details.getByText('Match numbers start at 1').count()).toBe(1);

    await details.getByLabel('Match number', { exact: true }).fill('42');
    await details.getByLabel('Operator', { exact: true }).fill('Priya at the controls');
    await details.getByRole('button', { name: 'Save details' }).click();
    await details.getByText('Details saved').waitFor();
    await details.scrollIntoViewIfNeeded();
    await page.screenshot({ path: path.join(SHOTS, 'replay-details-saved.png'), fullPage: false });

    await page.reload();
    await page.getByTestId('cursor-time').waitFor();
    await expect.poll(() => details.getByLabel('Match number', { exact: true }).inputValue()).toBe('42');
    expect(await details.getByLabel('Operator', { exact: true }).inputValue()).toBe('Priya at the controls');
    expect(await page.getByRole('heading', { level: 1 }).textContent()).toContain('42');
    await page.context().close();

    const coach = await signInAs('coach');
    await coach.goto(replayUrl);
    await coach.getByTestId('cursor-time').waitFor();
    await coach.getByText('Read only for your role').waitFor();
    expect(await coach.getByRole('form', { name: 'Recording details' }).count()).toBe(0);
    const facts = coach.getByRole('definition');
    await expect.poll(() => facts.filter({ hasText: 'Priya at the controls' }).count()).toBe(1);
    expect(await facts.filter({ hasText: /^42$/ }).count()).toBe(1);
    await coach.context().close();
  });
});
