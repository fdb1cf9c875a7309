// Through the real UI in headless Chromium: a coach opens Live with no robot connected and cannot send;
// then a stand-in robot connects over the relay, and an operator sees it, taps branch C and sees the
// robot's acknowledgement with the round trip, while the robot really received op/reef/branch = C.
import path from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../server/features/demo/demo-team';
import type { ChannelValue, Signal } from '../../shared/protocol/messages';
import type { Role } from '../../shared/domain/roles';
import { RobotClient } from '../../simulator/src/robot-client';
import { SHOTS, signInAs, startBrowserStack, type BrowserStack } from '../support/e2e';
import { relayUrl } from '../support/relay-clients';
import type { TestServer } from '../support/test-server';

const SIGNALS: Signal[] = [
  { index: 0, name: 'drive/pose/x', type: 'number', unit: 'm' },
  { index: 1, name: 'drive/pose/y', type: 'number', unit: 'm' },
  { index: 2, name: 'drive/pose/heading', type: 'number', unit: 'deg' },
  { index: 3, name: 'battery/voltage', type: 'number', unit: 'V' },
  { index: 4, name: 'elevator/height', type: 'number', unit: 'm' },
  { index: 5, name: 'state/machine', type: 'enum', unit: '', labels: ['disabled', 'idle', 'to_reef', 'placing'] },
  { index: 6, name: 'game/piece', type: 'enum', unit: '', labels: ['none', 'coral', 'algae'] },
];
const TICK_MS = 20;

let stack: BrowserStack;
let server: TestServer;
let robotKey: string;
let robot: RobotClient | undefined;
let telemetryTimer: NodeJS.Timeout | undefined;
const received: { channel: string; value: ChannelValue; retained: boolean }[] = [];

beforeAll(async () => {
  stack = await startBrowserStack();
  server = stack.server;
  const lead = await server.client();
  await lead.post('/api/auth/sign-in').send({ email: 'lead@harborlight.example', password: DEMO_PASSWORD }).expect(200);
  robotKey = (await lead.post('/api/team/robot-keys').send({ name: 'Gullwing' }).expect(201)).body.secret;
});
afterAll(async () => {
  clearInterval(telemetryTimer);
  robot?.stop();
  await stack?.close();
});

async function until(test: () => boolean, timeoutMs = 5000): Promise<void> {
  await expect.poll(test, { timeout: timeoutMs, interval: 20 }).toBe(true);
}

const signIn = (role: Role): Promise<Page> => signInAs(stack, role);

/** A stand-in robot: drives a slow loop in front of the blue reef, acks every new op/ value. */
async function startRobot(): Promise<RobotClient> {
  const r: RobotClient = new RobotClient({
    url: relayUrl(server),
    key: robotKey,
    name: 'Gullwing',
    reads: ['op/reef/branch', 'op/reef/level', 'op/station'],
    onValue: (channel, value, rev, retained) => {
      received.push({ channel, value, retained });
      if (retained) return;
      r.ack(channel, rev);
      r.sendEvent('selection_applied', Date.now(), { channel, value });
    },
  });
  r.start();
  await until(() => r.status === 'open');
  r.declareSignals(SIGNALS);
  r.publish('robot/simulated', true);
  r.publish('robot/mode', 'teleop');
  r.publish('robot/target', { branch: 'C', level: 'L4', xM: 3.66, yM: 4.37, headingDeg: 0 });
  const t0 = Date.now();
  telemetryTimer = setInterval(() => {
    const now = Date.now();
    const rows = Array.from({ length: 5 }, (_, i) => {
      const tS = (now - t0 + i * TICK_MS) / 1000;
      return [2.4 + 0.9 * Math.cos(tS / 2), 4.0 + 1.4 * Math.sin(tS / 2), (tS * 28.6) % 360, 12.41, 0.62, 2, 1];
    });
    r.sendTelemetry(rows, now, TICK_MS);
  }, 5 * TICK_MS);
  r.sendEvent('coral_acquired', Date.now(), { station: 'left' });
  return r;
}

describe('the Live page', () => {
  it('shows a coach the empty state and a disabled send control with the reason', async () => {
    const page = await signIn('coach');
    await page.goto(`${server.url}/live`);
    await page.getByLabel('Relay link').getByText('Connected to the relay', { exact: true }).waitFor();
    await page.getByText('No robot is connected').waitFor();
    await page.getByText('npm run sim').waitFor();
    expect(await page.getByRole('button', { name: 'Branch C' }).isDisabled()).toBe(true);
    await page.getByText('Coaches watch here').waitFor();
    await page.screenshot({ path: path.join(SHOTS, 'live-coach-no-robot.png'), fullPage: true });
    await page.context().close();
  });

  it('lets an operator tap branch C and see that the robot has it, with the round trip', async () => {
    robot = await startRobot();
    const page = await signIn('operator');
    await page.goto(`${server.url}/live`);
    await page.getByLabel('Relay link').getByText('Connected to the relay', { exact: true }).waitFor();
    await page.getByRole('table', { name: 'Clients connected to the relay' }).getByText('Gullwing').first().waitFor();
    await page.getByText('Simulator', { exact: true }).waitFor();
    await page.getByText('Telemetry live').waitFor();
    await page.locator('[data-layer="robot"]').waitFor();
    await page.locator('[data-layer="trail"]').waitFor();
    await page.locator('[data-layer="target"]').waitFor();

    await page.getByRole('button', { name: 'Branch C' }).click();
    const status = page.getByText(/C: robot has it · [\d.\u2009]+ ms/);
    await status.waitFor();
    expect(await page.getByRole('button', { name: 'Branch C' }).getAttribute('aria-pressed')).toBe('true');
    await until(() => received.some((m) => m.channel === 'op/reef/branch' && m.value === 'C' && !m.retained));

    await page.getByRole('button', { name: 'Level L4' }).click();
    await page.getByText(/L4: robot has it/).waitFor();
    await page.getByText('2 taps acknowledged').waitFor();
    await page.screenshot({ path: path.join(SHOTS, 'live-operator-acked.png'), fullPage: true });
    await page.screenshot({ path: path.join(SHOTS, 'live-operator-viewport.png') });
    await page.getByRole('img', { name: /^Field map/ }).screenshot({ path: path.join(SHOTS, 'live-field.png') });
    await page.context().close();
  });
});
