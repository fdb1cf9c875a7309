// Through the real UI in headless Chromium: a lead invites a member, the mail arrives in the dev inbox,
// the new member accepts, and the lead sees them in the members table with their role.
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
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

describe('inviting a member through the UI', () => {
  it('signs in, invites, reads the mail in the inbox, accepts, and shows the new member with the role', async () => {
    const page = await signInAs(stack, 'lead');
    const leadContext = page.context();

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
