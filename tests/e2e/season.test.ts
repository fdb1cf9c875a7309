// Through the real UI in headless Chromium: a programmer changes the robot profile, then the season page
// shows the red alliance's 12 branch targets for that profile, with the numbers the API gives.
import path from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { branchTargetsSchema, type BranchTargets } from '../../shared/domain/season/targets';
import { DEMO_MEMBERS } from '../../server/features/demo/demo-team';
import { SHOTS, signInAs, startBrowserStack, type BrowserStack } from '../support/e2e';
import type { TestServer } from '../support/test-server';

let stack: BrowserStack;
let server: TestServer;
let browser: BrowserStack['browser'];

beforeAll(async () => {
  stack = await startBrowserStack();
  ({ server, browser } = stack);
});
afterAll(async () => {
  await stack?.close();
});

/** The API's answer, fetched from the page so it goes with the signed-in member's session. */
async function apiTargets(page: Page, query: string): Promise<BranchTargets> {
  const json = await page.evaluate((q) => fetch(`/api/season/targets?${q}`).then((r) => r.json()), query);
  return branchTargetsSchema.parse(json);
}

/** x and y of a branch as the table shows them. */
async function tableXY(page: Page, branch: string): Promise<[string, string]> {
  const cells = page.locator(`tbody tr[data-branch="${branch}"] td`);
  // Cells after the branch header: face, x, y, heading, L1–L4.
  return [await cells.nth(1).innerText(), await cells.nth(2).innerText()];
}

/** A full-page screenshot from the top, so the sticky header and sidebar sit where a person sees them. */
async function shoot(page: Page, name: string): Promise<void> {
  await page.evaluate(() => window.scrollTo(0, 0));
  await page.screenshot({ path: path.join(SHOTS, name), fullPage: true });
}

describe('season targets through the UI', () => {
  it('saves a robot profile and shows the red targets for it, equal to the API’s numbers', async () => {
    const programmer = DEMO_MEMBERS.find((m) => m.role === 'programmer')!;
    const page = await signInAs(stack, 'programmer');

    await page.getByRole('link', { name: 'Robot profile' }).first().click();
    await page.getByRole('button', { name: 'Save robot profile' }).waitFor();
    await page.getByLabel('Scoring side').selectOption('left');
    await page.getByLabel('Standoff').fill('0.08');
    // Half the 0.7112 m default frame width + 0.0762 m bumper + 0.08 m standoff, recomputed as typed.
    await page.getByText('0.512 m').first().waitFor();
    await page.getByRole('button', { name: 'Save robot profile' }).click();
    await page.getByText('Robot profile saved').waitFor();
    await page.getByText(`Last changed by ${programmer.name}`).waitFor();
    await shoot(page, 'robot-profile-saved.png');

    await page.getByRole('link', { name: 'Season' }).first().click();
    await page.getByText('Blue alliance').first().waitFor();
    await page.getByRole('radio', { name: 'Red' }).check();
    await page.getByText('Red alliance').first().waitFor();

    const rows = page.locator('tbody tr[data-branch]');
    await expect.poll(() => rows.count()).toBe(12);

    const api = await apiTargets(page, 'alliance=red');
    expect(api.side).toBe('left');
    expect(api.depthM).toBeCloseTo(0.7112 / 2 + 0.0762 + 0.08, 9);
    const a = api.targets.find((t) => t.branch === 'A')!;
    const [x, y] = await tableXY(page, 'A');
    expect(Math.abs(Number(x) - a.x)).toBeLessThanOrEqual(0.0005);
    expect(Math.abs(Number(y) - a.y)).toBeLessThanOrEqual(0.0005);

    // Pointing at a row highlights its marker on the field.
    await rows.filter({ has: page.getByRole('button', { name: 'Branch E' }) }).hover();
    await expect.poll(() => page.locator('[data-layer="target"][data-id="E"]').getAttribute('data-highlighted')).toBe('true');
    await shoot(page, 'season-red.png');

    // A depth override refetches; resetting goes back to the profile.
    await page.getByLabel('Reef face to centre').fill('1.2');
    const deep = await apiTargets(page, 'alliance=red&depth=1.2');
    const deepA = deep.targets.find((t) => t.branch === 'A')!;
    await expect.poll(async () => (await tableXY(page, 'A'))[0]).toBe(deepA.x.toFixed(3));
    await page.getByRole('button', { name: 'Reset to robot profile' }).click();
    await expect.poll(async () => Number((await tableXY(page, 'A'))[0])).toBeCloseTo(a.x, 3);

    await page.getByText('Sources').first().click();
    await page.getByRole('heading', { name: 'Behind these targets' }).waitFor();
    await shoot(page, 'season-sources.png');

    await page.context().close();
  });
});
