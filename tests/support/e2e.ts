// Shared set-up of the browser tests: the real server with the built client, the demo team, Chromium.
import { existsSync, mkdirSync } from 'node:fs';
import path from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { expect } from 'vitest';
import { DEMO_MEMBERS, DEMO_PASSWORD } from '../../server/features/demo/demo-team';
import { seedDemo } from '../../server/features/demo/seed';
import { CLIENT_DIST, PROJECT_ROOT } from '../../server/runtime';
import type { Role } from '../../shared/domain/roles';
import { launchBrowser } from './browser';
import { startTestServer, type TestServer } from './test-server';

/** Screenshots of the browser tests (git-ignored). */
export const SHOTS = path.join(PROJECT_ROOT, '.data', 'screenshots');

export interface BrowserStack {
  server: TestServer;
  browser: Browser;
  close(): Promise<void>;
}

/** A test server serving the built client, seeded with the demo team, and a headless Chromium. */
export async function startBrowserStack(seed: (server: TestServer) => Promise<void> = async () => {}): Promise<BrowserStack> {
  if (!existsSync(path.join(CLIENT_DIST, 'index.html'))) throw new Error('build the client first (npm test does)');
  mkdirSync(SHOTS, { recursive: true });
  const server = await startTestServer({ clientDir: CLIENT_DIST });
  await seedDemo(server.db.db);
  await seed(server);
  const browser = await launchBrowser();
  return {
    server,
    browser,
    async close() {
      await browser.close();
      await server.close();
    },
  };
}

/** A fresh browser context signed in through the UI as the demo member with `role`. */
export async function signInAs(stack: BrowserStack, role: Role, viewport = { width: 1280, height: 800 }): Promise<Page> {
  const member = DEMO_MEMBERS.find((m) => m.role === role)!;
  const context = await stack.browser.newContext({ viewport });
  const page = await context.newPage();
  await page.goto(`${stack.server.url}/sign-in`);
  await page.getByLabel('E-mail').fill(member.email);
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect.poll(() => page.url()).not.toContain('/sign-in');
  return page;
}
