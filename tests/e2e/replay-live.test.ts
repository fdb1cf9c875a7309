// Through the real UI in headless Chromium: a programmer starts a recording by hand on the Live page, opens it
// while it is being made, sees the timeline grow and the robot move on the field map from the relay, and when
// the recording is stopped the same page becomes the finished recording without a reload.
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../server/features/demo/demo-team';
import type { Signal } from '../../shared/protocol/messages';
import { RobotClient } from '../../simulator/src/robot-client';
import { SHOTS, signInAs, startBrowserStack, type BrowserStack } from '../support/e2e';
import { relayUrl } from '../support/relay-clients';

const SIGNALS: Signal[] = [
  { index: 0, name: 'drive/pose/x', type: 'number', unit: 'm' },
  { index: 1, name: 'drive/pose/y', type: 'number', unit: 'm' },
  { index: 2, name: 'drive/pose/heading', type: 'number', unit: 'deg' },
  { index: 3, name: 'drive/speed', type: 'number', unit: 'm/s' },
  { index: 4, name: 'battery/voltage', type: 'number', unit: 'V' },
];
const TICK_MS = 20;

let stack: BrowserStack;
let robot: RobotClient;
let timer: NodeJS.Timeout | undefined;

beforeAll(async () => {
  stack = await startBrowserStack();
  const lead = await stack.server.client();
  await lead.post('/api/auth/sign-in').send({ email: 'lead@harborlight.example', password: DEMO_PASSWORD }).expect(200);
  const key = (await lead.post('/api/team/robot-keys').send({ name: 'Gullwing' }).expect(201)).body.secret as string;
  robot = new RobotClient({ url: relayUrl(stack.server), key, name: 'Gullwing', reads: [], onValue: () => {} });
  robot.start();
  for (const deadline = Date.now() + 5000; robot.status !== 'open'; await new Promise((r) => setTimeout(r, 20))) {
    if (Date.now() > deadline) throw new Error('the robot did not connect');
  }
  robot.declareSignals(SIGNALS);
  robot.publish('robot/mode', 'disabled');
  const t0 = Date.now();
  // A slow circle in front of the blue reef, 50 Hz in batches of five ticks.
  timer = setInterval(() => {
    const now = Date.now();
    const rows = Array.from({ length: 5 }, (_, i) => {
      const tS = (now - t0 + i * TICK_MS) / 1000;
      return [2.4 + 1.2 * Math.cos(tS / 1.5), 4.0 + 1.4 * Math.sin(tS / 1.5), (tS * 38) % 360, 1.1, 12.3];
    });
    robot.sendTelemetry(rows, now, TICK_MS);
  }, 5 * TICK_MS);
});
afterAll(async () => {
  clearInterval(timer);
  robot?.stop();
  await stack?.close();
});

describe('following a recording live', () => {
  it('records by hand from the Live page, follows it as it grows, and becomes the finished recording when stopped', async () => {
    const page = await signInAs(stack, 'programmer');
    await page.goto(`${stack.server.url}/live`);
    const card = page.locator('li', { hasText: 'Gullwing' }).filter({ hasText: 'Not recording' });
    await card.waitFor();
    await page.getByRole('button', { name: 'Record now' }).click();
    await page.getByText('Recording a practice run (by hand)').waitFor();
    await page.getByRole('link', { name: 'Watch live' }).click();
    await page.waitForURL(/\/recordings\/[0-9a-f-]{36}$/);
    const id = page.url().split('/').at(-1)!;

    const banner = page.locator('[data-live-banner]');
    await banner.waitFor();
    expect(await banner.getAttribute('data-live-banner')).toBe('following');
    await page.getByText('relay connected').waitFor();
    // The cursor readout shows "now / duration"; both grow while the page follows.
    const scrub = page.getByRole('slider');
    const firstS = Number(await scrub.getAttribute('aria-valuemax'));
    await expect.poll(async () => Number(await scrub.getAttribute('aria-valuemax')), { timeout: 8000 }).toBeGreaterThan(firstS + 1.5);
    // The field map takes the pose from the relay, so it moves between two looks.
    const field = page.locator('[data-robot-x]');
    const x1 = await field.getAttribute('data-robot-x');
    await expect.poll(() => field.getAttribute('data-robot-x'), { timeout: 5000 }).not.toBe(x1);
    await page.locator('[data-trace-pane="1"] canvas').first().waitFor();
    await page.screenshot({ path: path.join(SHOTS, 'replay-live-following.png'), fullPage: true });

    // Leaving the newest moment stops the following; "Back to live" returns to it.
    await page.keyboard.press('Shift+ArrowLeft');
    await expect.poll(() => banner.getAttribute('data-live-banner')).toBe('paused');
    await page.getByRole('button', { name: 'Back to live' }).click();
    await expect.poll(() => banner.getAttribute('data-live-banner')).toBe('following');

    // Stopped by hand (as the Live page's button does): the same page turns into the finished recording.
    const programmer = await stack.server.client();
    await programmer.post('/api/auth/sign-in').send({ email: 'programmer@harborlight.example', password: DEMO_PASSWORD }).expect(200);
    const stopped = await programmer.post('/api/recorder/stop').send({ robot: 'Gullwing' }).expect(200);
    expect(stopped.body.recordingId).toBe(id);
    await banner.waitFor({ state: 'detached', timeout: 5000 });
    const finished = await programmer.get(`/api/recordings/${id}`).expect(200);
    expect(finished.body.status).toBe('finished');
    await expect
      .poll(async () => Number(await scrub.getAttribute('aria-valuemax')), { timeout: 5000 })
      .toBeCloseTo(Number(finished.body.durationS.toFixed(2)), 1);
    await page.screenshot({ path: path.join(SHOTS, 'replay-live-finished.png'), fullPage: true });
    await page.context().close();
  });
});
