// Through the real UI in headless Chromium: the demo operator runs a drill end to end on the published panel
// (calls appear, taps are timed, the result is stored and shows on the chart), and the demo coach sends a call
// that appears on the operator's drill view over the relay.
import path from 'node:path';
import type { Page } from 'playwright-core';
import { sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../server/features/demo/demo-team';
import type { ServerMessage } from '../../shared/protocol/messages';
import { SHOTS, signInAs, startBrowserStack, type BrowserStack } from '../support/e2e';
import { relayUrl, sessionCookie, TestRelayClient } from '../support/relay-clients';

let stack: BrowserStack;
let quickDrillId: string;

beforeAll(async () => {
  stack = await startBrowserStack(async (server) => {
    const coach = await server.client();
    await coach.post('/api/auth/sign-in').send({ email: 'coach@harborlight.example', password: DEMO_PASSWORD }).expect(200);
    const created = await coach
      .post('/api/drills')
      .send({
        name: 'Quick three',
        plan: { mode: 'scripted', calls: [{ branch: 'C', level: 'L4' }, { station: 'left' }, { branch: 'H', level: 'L2' }] },
        pace: { mode: 'on-answer', limitMs: 8000 },
      })
      .expect(201);
    quickDrillId = created.body.id;
  });
});
afterAll(async () => {
  await stack?.close();
});

const chartPoints = (page: Page) => page.getByTestId('drill-results-chart').getAttribute('data-points').then(Number);

async function storedRuns(): Promise<{ n: number; median: number | null; simulated: boolean }> {
  const r = await stack.server.db.db.execute<{ n: number; median: number | null; simulated: boolean }>(
    sql`select count(*)::int as n, max(median_ms) as median, bool_and(is_simulator_driven) as simulated from drill_results where drill_id = ${quickDrillId}`,
  );
  return r.rows[0]!;
}

describe('drills through the UI', () => {
  it('lets the operator run a drill on the published panel and see the stored result on the chart', async () => {
    const page = await signInAs(stack, 'operator', { width: 1280, height: 800 });
    // Keep what the page asks the browser's speech synthesis to say (headless Chromium has no voices to hear).
    await page.addInitScript(() => {
      const spoken: string[] = [];
      Object.assign(window, { spokenCalls: spoken });
      if ('speechSynthesis' in window) window.speechSynthesis.speak = (u: SpeechSynthesisUtterance) => void spoken.push(u.text);
    });
    await page.goto(`${stack.server.url}/drills`);
    await expect.poll(() => page.getByRole('heading', { name: 'Drills', level: 1 }).isVisible()).toBe(true);
    // The demo sessions of Tomas Reyes are on the chart before he runs anything.
    await expect.poll(() => chartPoints(page)).toBeGreaterThan(3);
    await page.screenshot({ path: path.join(SHOTS, 'drills-page-operator.png'), fullPage: true });

    await page.getByRole('link', { name: 'Run Quick three' }).click();
    await expect.poll(() => page.url()).toContain(`/drills/${quickDrillId}/run`);
    await expect.poll(() => page.getByText('Answer on the team’s published panel').isVisible()).toBe(true);
    // Each answer also goes to the standard channels, as the simulator reads them.
    await page.getByRole('switch', { name: 'Drive the simulator' }).click();
    await page.getByRole('switch', { name: 'Speak calls' }).click();
    expect(await page.getByRole('switch', { name: 'Speak calls' }).getAttribute('aria-checked')).toBe('true');
    await expect.poll(() => page.getByRole('complementary', { name: 'Safety' }).isVisible()).toBe(true);
    const watcher = await TestRelayClient.connect(
      relayUrl(stack.server),
      { cookie: await sessionCookie(stack.server, 'viewer@harborlight.example', DEMO_PASSWORD), origin: stack.server.url },
      'viewer',
      'drill watcher',
    );
    watcher.send({ type: 'subscribe', prefixes: ['op/reef/'] });
    await page.getByRole('button', { name: 'Start drill' }).click();

    const call = page.getByTestId('drill-call');
    const canvas = page.getByTestId('drill-panel-canvas');
    await expect.poll(() => call.textContent(), { timeout: 8000 }).toBe('L4 · C');
    await expect.poll(() => page.evaluate(() => (window as unknown as { spokenCalls: string[] }).spokenCalls)).toEqual(['Level 4, branch C']);
    await page.screenshot({ path: path.join(SHOTS, 'drills-run-call.png') });
    // A wrong branch first, then the right branch and level.
    await canvas.getByRole('button', { name: 'Branch D' }).click();
    await expect.poll(() => page.getByTestId('drill-status').textContent()).toContain('1 wrong tap');
    await canvas.getByRole('button', { name: 'Branch C' }).click();
    await canvas.getByRole('button', { name: /L4$/ }).first().click();
    await expect.poll(() => page.getByTestId('drill-status').textContent()).toMatch(/^Right in \d\.\d\d s · 1 wrong tap first$/);
    const isValue = (channel: string, value: string) => (m: ServerMessage) => m.type === 'value' && m.channel === channel && m.value === value;
    await watcher.next(isValue('op/reef/branch', 'C'));
    await watcher.next(isValue('op/reef/level', 'L4'));
    // The wrong tap stayed on the drill view: nothing but the answer reached the channels.
    expect(watcher.messages.some(isValue('op/reef/branch', 'D'))).toBe(false);
    watcher.stop();

    await expect.poll(() => call.textContent(), { timeout: 5000 }).toBe('Left station');
    await canvas.getByRole('button', { name: /Left$/ }).first().click();
    await expect.poll(() => call.textContent(), { timeout: 5000 }).toBe('L2 · H');
    await canvas.getByRole('button', { name: /L2$/ }).first().click();
    await canvas.getByRole('button', { name: 'Branch H' }).click();

    await expect.poll(() => page.getByTestId('drill-saved').isVisible(), { timeout: 10_000 }).toBe(true);
    await expect.poll(() => page.getByRole('heading', { name: 'Drill complete' }).isVisible()).toBe(true);
    await page.screenshot({ path: path.join(SHOTS, 'drills-run-result.png') });
    const stored = await storedRuns();
    expect(stored.n).toBe(1);
    expect(stored.median).toBeGreaterThan(0);
    expect(stored.simulated).toBe(true);
    const rows = page.getByRole('table', { name: 'Each call of the run' }).locator('tbody tr');
    expect(await rows.count()).toBe(3);
    expect(await rows.nth(0).locator('td').nth(3).textContent()).toBe('1');

    await page.getByRole('link', { name: 'See results over time' }).click();
    await page.getByLabel('Drill', { exact: true }).selectOption({ label: 'Quick three' });
    await expect.poll(() => chartPoints(page)).toBe(1);
    await expect.poll(() => page.getByRole('table', { name: 'Recent drill runs' }).getByText('Quick three').count()).toBe(1);
    await page.screenshot({ path: path.join(SHOTS, 'drills-results-after-run.png'), fullPage: true });
    await page.context().close();
  });

  it('shows a call the coach sends on the operator’s drill view', async () => {
    const operator = await signInAs(stack, 'operator', { width: 1280, height: 800 });
    await operator.goto(`${stack.server.url}/drills/follow`);
    await expect.poll(() => operator.getByTestId('drill-waiting').isVisible()).toBe(true);
    await expect.poll(() => operator.getByText('Connected to the relay').isVisible()).toBe(true);

    const coach = await signInAs(stack, 'coach', { width: 1280, height: 800 });
    await coach.goto(`${stack.server.url}/drills/${quickDrillId}/send`);
    await expect.poll(() => coach.getByText(/^[1-9]\d* operator devices? on the relay$/).isVisible()).toBe(true);
    await coach.getByRole('button', { name: 'Start sending calls' }).click();
    await expect.poll(() => coach.getByTestId('coach-call').textContent()).toBe('L4 · C');

    await expect.poll(() => operator.getByTestId('drill-call').textContent()).toBe('L4 · C');
    await expect.poll(() => operator.getByText('Drill · calls from Hana Whitcombe').isVisible()).toBe(true);
    await operator.screenshot({ path: path.join(SHOTS, 'drills-follow-call.png') });
    const canvas = operator.getByTestId('drill-panel-canvas');
    await canvas.getByRole('button', { name: 'Branch C' }).click();
    await canvas.getByRole('button', { name: /L4$/ }).first().click();
    // The answer goes back to the coach, and in on-answer pace the next call follows.
    await expect.poll(() => coach.getByText(/^Right in \d\.\d\d s$/).isVisible()).toBe(true);
    await expect.poll(() => operator.getByTestId('drill-call').textContent(), { timeout: 5000 }).toBe('Left station');
    await coach.screenshot({ path: path.join(SHOTS, 'drills-coach-console.png'), fullPage: true });

    await coach.getByRole('button', { name: 'Stop sending' }).click();
    await expect.poll(() => operator.getByRole('heading', { name: /^Stopped after 1 of 3 calls$/ }).isVisible()).toBe(true);
    await expect.poll(() => operator.getByTestId('drill-saved').isVisible(), { timeout: 10_000 }).toBe(true);
    const r = await stack.server.db.db.execute<{ mode: string; coach: string; complete: boolean }>(
      sql`select mode, coach_name as coach, is_complete as complete from drill_results where drill_id = ${quickDrillId} and mode = 'coached'`,
    );
    expect(r.rows).toEqual([{ mode: 'coached', coach: 'Hana Whitcombe', complete: false }]);
    await operator.context().close();
    await coach.context().close();
  });

  it('lets the coach write a drill in the editor, with a message for each field that needs one', async () => {
    const page = await signInAs(stack, 'coach', { width: 1280, height: 800 });
    await page.goto(`${stack.server.url}/drills`);
    await page.getByRole('button', { name: 'New drill' }).click();
    const editor = page.getByRole('form', { name: 'New drill' });
    await editor.getByRole('button', { name: 'Face AB' }).click();
    await editor.getByRole('button', { name: 'Create drill' }).click();
    await expect.poll(() => editor.getByText('Name the drill').isVisible()).toBe(true);
    await page.screenshot({ path: path.join(SHOTS, 'drills-editor.png'), fullPage: true });

    await editor.getByLabel('Name').fill('Station rhythm');
    await editor.getByText('Scripted', { exact: true }).click();
    await editor.getByRole('textbox', { name: 'Script' }).fill('left\nC L4\nright Q');
    await editor.getByRole('button', { name: 'Create drill' }).click();
    await expect.poll(() => editor.getByText(/^Call 3: /).isVisible()).toBe(true);
    await editor.getByRole('textbox', { name: 'Script' }).fill('left\nC L4\nright\nJ L3');
    await editor.getByText('Next call on answer', { exact: true }).click();
    await editor.getByLabel('Seconds to answer').fill('6');
    await editor.getByRole('button', { name: 'Create drill' }).click();

    await expect.poll(() => page.getByRole('status').getByText('Saved “Station rhythm”.').isVisible()).toBe(true);
    const card = page.getByRole('listitem', { name: 'Station rhythm' });
    await expect.poll(() => card.textContent()).toContain('4 scripted calls: Left station, L4 · C, Right station …');
    await expect.poll(() => card.textContent()).toContain('Next call on answer · 6 s to answer');
    const r = await stack.server.db.db.execute<{ plan: unknown; pace: unknown }>(sql`select plan, pace from drills where name = 'Station rhythm'`);
    expect(r.rows).toEqual([
      {
        plan: { mode: 'scripted', calls: [{ station: 'left' }, { branch: 'C', level: 'L4' }, { station: 'right' }, { branch: 'J', level: 'L3' }] },
        pace: { mode: 'on-answer', limitMs: 6000 },
      },
    ]);
    await page.context().close();
  });

  it('falls back to standard pickers, and says so, when the team has no published panel', async () => {
    // Last in this file: it takes the team's published panel away.
    await stack.server.db.db.execute(sql`delete from team_published_panels`);
    const page = await signInAs(stack, 'operator', { width: 1024, height: 768 });
    await page.goto(`${stack.server.url}/drills/${quickDrillId}/run`);
    await expect.poll(() => page.getByText('Standard pickers instead of the published panel').isVisible()).toBe(true);
    await expect.poll(() => page.getByText('The team has no published panel yet.').isVisible()).toBe(true);
    await page.getByRole('button', { name: 'Start drill' }).click();
    await expect.poll(() => page.getByTestId('drill-call').textContent(), { timeout: 8000 }).toBe('L4 · C');
    expect(await page.getByTestId('drill-panel-canvas').count()).toBe(0);
    await page.getByRole('button', { name: 'Level L4' }).click();
    await page.getByRole('button', { name: 'Branch C' }).click();
    await expect.poll(() => page.getByTestId('drill-status').textContent()).toMatch(/^Right in \d\.\d\d s$/);
    await expect.poll(() => page.getByTestId('drill-call').textContent(), { timeout: 5000 }).toBe('Left station');
    await page.screenshot({ path: path.join(SHOTS, 'drills-run-standard-pickers.png') });
    await page.getByRole('button', { name: 'Stop' }).click();
    await expect.poll(() => page.getByRole('heading', { name: 'Stopped after 1 of 3 calls' }).isVisible()).toBe(true);
    await expect.poll(() => page.getByTestId('drill-saved').isVisible(), { timeout: 10_000 }).toBe(true);
    await page.context().close();
  });
});
