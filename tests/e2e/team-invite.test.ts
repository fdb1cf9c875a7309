// Through the real UI in headless Chromium: a lead invites a member, the mail arrives in the dev inbox,
// the new member accepts, and the lead sees them in the members table with their role.
import { existsSync, mkdirSync } from 'node:fs';
import path from 'node:path';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_MEMBERS, DEMO_PASSWORD } from '../../server/features/demo/demo-team';
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
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await server?.close();
});

describe('inviting a member through the UI', () => {
  it('signs in, invites, reads the mail in the inbox, accepts, and shows the new member with the role', async () => {
    const lead = DEMO_MEMBERS.find((m) => m.role === 'lead')!;
    const leadContext = await browser.newContext({ viewport: { width: 1280, height: 800 } });
    const page = await leadContext.newPage();

    await page.goto(`${server.url}/sign-in`);
    await page.getByLabel('E-mail').fill(lead.email);
    await page.getByLabel('Password').fill(DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect.poll(() => page.url()).not.toContain('/sign-in');

    await page.goto(`${server.url}/settings/team`);
    await page.getByRole('textbox', { name: 'E-mail' }).fill('nia.calder@harborlight.example');
    await page.getByLabel('Role').selectOption('programmer');
    await page.getByRole('button', { name: 'Send invite' }).click();
    await page.getByText('nia.calder@harborlight.example').first().waitFor();
    await page.screenshot({ path: path.join(SHOTS, 'team-settings-invited.png'), fullPage: true });

    await page.goto(`${server.url}/dev/inbox`);
    const link = page.getByRole('link', { name: /\/invite\// }).first();
    await link.waitFor();
    const href = await link.getAttribute('href');
    expect(href).toContain('/invite/');
    await page.screenshot({ path: path.join(SHOTS, 'dev-inbox.png'), fullPage: true });

    const inviteeContext = await browser.newContext({ viewport: { width: 1280, height: 800 } });
    const invitee = await inviteeContext.newPage();
    await invitee.goto(new URL(href!, server.url).toString());
    await invitee.getByText('Harborlight Robotics').first().waitFor();
    await invitee.getByLabel('Name').fill('Nia Calder');
    await invitee.getByLabel('Password').fill('a-long-enough-password');
    await invitee.getByRole('button', { name: 'Accept invite' }).click();
    await expect.poll(() => invitee.url()).not.toContain('/invite/');
    await invitee.getByText('Nia Calder').first().waitFor();

    await page.goto(`${server.url}/settings/team`);
    const row = page.getByRole('row').filter({ hasText: 'nia.calder@harborlight.example' });
    await row.waitFor();
    // A lead sees each member's role as a select named after the member.
    await expect.poll(() => row.getByRole('combobox', { name: 'Nia Calder' }).inputValue()).toBe('programmer');
    await page.screenshot({ path: path.join(SHOTS, 'team-settings-member.png'), fullPage: true });

    await leadContext.close();
    await inviteeContext.close();
  });
});
