// Through the real UI in headless Chromium: a programmer uploads a simulator match file and sees the upload's
// progress and then the new row, filters by kind, and uploads random bytes to read the server's reason;
// a viewer finds no upload control.
import { randomBytes } from 'node:crypto';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seedDemoRecordings } from '../../server/features/demo/demo-recordings';
import type { Role } from '../../shared/domain/roles';
import { DEFAULT_ROBOT_PROFILE } from '../../shared/domain/robot-profile';
import { season2025 } from '../../shared/domain/season/season-2025';
import { runHeadlessMatch } from '../../simulator/src/headless';
import { encodeHeadlessMatch } from '../../simulator/src/match-file';
import { SHOTS, signInAs, startBrowserStack, type BrowserStack } from '../support/e2e';
import type { TestServer } from '../support/test-server';

let stack: BrowserStack;
let server: TestServer;
let matchFile: string;
let corruptFile: string;

beforeAll(async () => {
  const dir = mkdtempSync(path.join(tmpdir(), 'pitwall-recordings-'));
  matchFile = path.join(dir, 'gullwing-seed-3.pitwall');
  writeFileSync(
    matchFile,
    encodeHeadlessMatch(runHeadlessMatch({ seed: 3, season: season2025, robot: DEFAULT_ROBOT_PROFILE, alliance: 'blue' }), {
      source: 'simulator',
      robot: 'Gullwing',
      seed: 3,
    }),
  );
  corruptFile = path.join(dir, 'scrambled.bin');
  writeFileSync(corruptFile, randomBytes(4096));
  stack = await startBrowserStack((s) => seedDemoRecordings(s.db.db).then(() => undefined));
  server = stack.server;
});
afterAll(async () => {
  await stack?.close();
});

const signIn = (role: Role): Promise<Page> => signInAs(stack, role, { width: 1440, height: 900 });

describe('recordings through the UI', () => {
  it('lets a programmer upload a match file, see its progress and row, filter by kind, and read why a corrupt file failed', async () => {
    const page = await signIn('programmer');
    await page.goto(`${server.url}/recordings`);
    const table = page.getByRole('table');
    await table.getByRole('row').nth(1).waitFor();
    await page.screenshot({ path: path.join(SHOTS, 'recordings-list.png'), fullPage: true });

    await page.getByLabel('Store as').selectOption('drill');
    // Record every progress value the bar shows, so the test sees it move rather than only its end.
    await page.evaluate(() => {
      const seen: string[] = [];
      (window as unknown as { seenProgress: string[] }).seenProgress = seen;
      new MutationObserver(() => {
        const bar = document.querySelector('[role=progressbar]');
        if (bar) seen.push(bar.getAttribute('aria-valuenow') ?? '');
      }).observe(document.body, { subtree: true, childList: true, attributes: true });
    });
    await page.locator('input[type=file]').setInputFiles(matchFile);
    await page.getByText('Stored gullwing-seed-3.pitwall').waitFor();
    const seen = await page.evaluate(() => (window as unknown as { seenProgress: string[] }).seenProgress);
    expect(seen.length).toBeGreaterThan(0);

    const newRow = page.getByRole('row').filter({ hasText: 'Just uploaded' });
    await newRow.waitFor();
    await expect.poll(() => newRow.textContent()).toContain('Drill');
    await expect.poll(() => newRow.textContent()).toContain('Gullwing');
    await page.screenshot({ path: path.join(SHOTS, 'recordings-uploaded.png'), fullPage: true });

    await page.getByLabel('Kind', { exact: true }).selectOption('drill');
    await expect.poll(() => page.url()).toContain('kind=drill');
    await expect.poll(() => table.getByRole('row').count()).toBe(2);
    await table.getByRole('row').nth(1).getByText('Drill').waitFor();

    // The URL reproduces the view.
    await page.reload();
    await expect.poll(() => page.getByLabel('Kind', { exact: true }).inputValue()).toBe('drill');
    await expect.poll(() => page.getByRole('table').getByRole('row').count()).toBe(2);

    await page.locator('input[type=file]').setInputFiles(corruptFile);
    const failure = page.getByRole('alert').filter({ hasText: 'scrambled.bin wasn’t stored' });
    await failure.waitFor();
    expect(await failure.textContent()).toMatch(/byte|line|recognis|format/i);
    await page.screenshot({ path: path.join(SHOTS, 'recordings-upload-error.png'), fullPage: true });

    // Select the uploaded row: a programmer may tag it but not delete it.
    await page.getByRole('table').getByRole('row').nth(1).getByRole('checkbox').check();
    await expect.poll(() => page.getByRole('button', { name: 'Delete…' }).isDisabled()).toBe(true);
    await page.getByLabel('Tag to add').fill('wobble');
    await page.getByRole('button', { name: 'Add tag' }).click();
    await page.getByText('done for 1 recording').waitFor();
    await page.getByRole('table').getByText('wobble').waitFor();
    await page.screenshot({ path: path.join(SHOTS, 'recordings-tagged.png'), fullPage: true });

    await page.getByRole('table').getByRole('row').nth(1).getByRole('link').click();
    // The row opens the replay of that recording.
    await page.getByTestId('cursor-time').waitFor();
    expect(page.url()).toMatch(/\/recordings\/[0-9a-f-]{36}/);
    await page.context().close();
  });

  it('shows a viewer no upload control', async () => {
    const page = await signIn('viewer');
    await page.goto(`${server.url}/recordings`);
    await page.getByRole('table').getByRole('row').nth(1).waitFor();
    await page.getByText('Uploading is for programmers and leads').waitFor();
    expect(await page.locator('input[type=file]').count()).toBe(0);
    await page.screenshot({ path: path.join(SHOTS, 'recordings-viewer.png'), fullPage: true });
    await page.context().close();
  });
});
