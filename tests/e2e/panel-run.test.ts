// Run mode in headless Chromium against the real server, database and relay, with the real simulator as the
// robot: the operator opens /run (the demo team's published panel), taps a branch and a level, sees the
// robot has them with the round trip, and sees through the relay that the simulator took them and drives to
// the branch; the relay socket is pulled and comes back with the selection re-sent; a viewer and a coach
// get the 403 message; a signed-out visitor goes to sign-in and back; the panel opens again with no network;
// a robot that is not the simulator brings up the safety caution.
import path from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../server/features/demo/demo-team';
import { DEFAULT_ROBOT_PROFILE } from '../../shared/domain/robot-profile';
import { season2025 } from '../../shared/domain/season/season-2025';
import type { ServerMessage } from '../../shared/protocol/messages';
import { RobotClient } from '../../simulator/src/robot-client';
import { startLiveRobot, type LiveRobot } from '../../simulator/src/live-robot';
import { SHOTS, signInAs, startBrowserStack, type BrowserStack } from '../support/e2e';
import { relayUrl, sessionCookie, TestRelayClient } from '../support/relay-clients';

let stack: BrowserStack;
let robotKey: string;
let sim: LiveRobot | undefined;
let watcher: TestRelayClient;
let page: Page;
/** While true the relay cable is "pulled": the tablet's relay sockets are closed and new ones refused. */
let isCablePulled = false;

type Value = Extract<ServerMessage, { type: 'value' }>;
type Target = { branch?: string | null; level?: string | null; xM?: number; yM?: number };

beforeAll(async () => {
  stack = await startBrowserStack();
  const server = stack.server;
  const lead = await server.client();
  await lead.post('/api/auth/sign-in').send({ email: 'lead@harborlight.example', password: DEMO_PASSWORD }).expect(200);
  robotKey = (await lead.post('/api/team/robot-keys').send({ name: 'Gullwing' }).expect(201)).body.secret as string;
  // A human tap keeps the simulator's stand-in operator away for the rest of the test.
  sim = startLiveRobot({ url: relayUrl(server), key: robotKey, name: 'Gullwing', season: season2025, robot: DEFAULT_ROBOT_PROFILE, alliance: 'blue', seed: 11, autopilotAfterS: 600 });
  const cookie = await sessionCookie(server, 'programmer@harborlight.example', DEMO_PASSWORD);
  watcher = await TestRelayClient.connect(relayUrl(server), { cookie, origin: server.url }, 'viewer', 'test watcher');
  watcher.send({ type: 'subscribe', prefixes: ['op/', 'robot/'] });
});
// A failed step leaves a picture of the tablet behind.
afterEach(async (ctx) => {
  if (ctx.task.result?.state === 'fail' && page && !page.isClosed()) await page.screenshot({ path: path.join(SHOTS, `run-failed-${ctx.task.name.slice(0, 40).replace(/\W+/g, '-')}.png`) }).catch(() => {});
});
afterAll(async () => {
  watcher?.stop();
  sim?.stop();
  await stack?.close();
});

const until = (test: () => boolean, timeoutMs = 5000) => expect.poll(test, { timeout: timeoutMs, interval: 25 }).toBe(true);
const shot = (name: string) => page.screenshot({ path: path.join(SHOTS, name) });
const relayPill = () => page.getByRole('status', { name: 'Relay link' });
const echo = () => page.locator('[data-tile-kind="target-echo"]');

function distanceToM(target: { xM: number; yM: number }): number {
  const pose = sim!.model.pose;
  return Math.hypot(pose.xM - target.xM, pose.yM - target.yM);
}

describe('run mode', () => {
  it('tells a viewer and a coach that run mode is not for their role', async () => {
    for (const role of ['viewer', 'coach'] as const) {
      const p = await signInAs(stack, role);
      await p.goto(`${stack.server.url}/run`);
      await p.getByRole('heading', { name: 'Run mode is for operators and programmers' }).waitFor();
      expect(await p.getByRole('button', { name: 'Branch A' }).count()).toBe(0);
      if (role === 'viewer') await p.screenshot({ path: path.join(SHOTS, 'run-viewer-403.png') });
      await p.context().close();
    }
  });

  it('sends a signed-out visitor to sign-in and back to the panel afterwards', async () => {
    const context = await stack.browser.newContext({ viewport: { width: 1280, height: 800 } });
    const p = await context.newPage();
    await p.goto(`${stack.server.url}/run`);
    await expect.poll(() => new URL(p.url()).pathname + new URL(p.url()).search).toBe('/sign-in?next=%2Frun');
    await p.getByLabel('E-mail').fill('operator@harborlight.example');
    await p.getByLabel('Password').fill(DEMO_PASSWORD);
    await p.getByRole('button', { name: 'Sign in' }).click();
    // Back at /run inside the app (its router keeps the run routes for in-app navigation).
    await p.getByText('Gullwing match panel').waitFor();
    expect(new URL(p.url()).pathname).toBe('/run');
    expect(await p.getByRole('button', { name: /^Branch [A-L]$/ }).count()).toBe(12);
    await context.close();
  });

  it('opens the published panel full screen for the operator, connected to the simulator', async () => {
    page = await signInAs(stack, 'operator');
    // The tablet's relay socket goes through Playwright, so the test can pull the cable and plug it back in.
    await page.context().routeWebSocket(/\/relay$/, (ws) => {
      if (isCablePulled) return void ws.close({ code: 1001, reason: 'cable pulled' });
      ws.connectToServer();
    });
    await page.goto(`${stack.server.url}/run`);
    await page.getByText('Gullwing match panel').waitFor();
    // /run is run mode's own light page (client/run.html), not the app's; its way back is a plain link.
    expect(await page.title()).toBe('Pitwall · Run mode');
    expect(await page.getByRole('link', { name: 'Leave run mode, back to Pitwall' }).getAttribute('href')).toBe('/');
    await relayPill().getByText('Relay connected').waitFor();
    await page.getByTestId('simulator-band').waitFor();
    await page.getByRole('status', { name: 'Robot link' }).getByText('Robot Gullwing').waitFor();
    expect(await page.getByRole('button', { name: /^Branch [A-L]$/ }).count()).toBe(12);
    // Run mode allows no scrolling, zooming or text selection.
    const lock = await page.evaluate(() => ({
      viewport: document.querySelector('meta[name="viewport"]')?.getAttribute('content'),
      overflow: getComputedStyle(document.body).overflow,
      touchAction: getComputedStyle(document.body).touchAction,
      userSelect: getComputedStyle(document.body).userSelect,
      scrolls: document.documentElement.scrollHeight > innerHeight || document.documentElement.scrollWidth > innerWidth,
    }));
    expect(lock).toMatchObject({ overflow: 'hidden', touchAction: 'none', userSelect: 'none', scrolls: false });
    expect(lock.viewport).toContain('user-scalable=no');
  });

  it('turns the reef to the seat chosen at run time and remembers the seat on the tablet', async () => {
    const nearFace = () => page.locator('[data-tile-kind="reef-picker"] [data-near-face]').textContent();
    expect(await nearFace()).toBe('A/B');
    await page.getByRole('button', { name: /^Seat: Blue 1/ }).click();
    const dialog = page.getByRole('dialog', { name: 'Seat and settings' });
    await dialog.getByRole('button', { name: 'Red' }).click();
    await dialog.getByRole('button', { name: '3' }).click();
    await page.getByRole('button', { name: /^Seat: Red 3/ }).waitFor();
    await page.locator('[data-tile-kind="reef-picker"] svg[data-alliance="red"]').waitFor();
    // The red reef's own near face, as the season profile names it, sits at the bottom for a red operator.
    const redNear = await nearFace();
    expect(redNear).toBe('A/B');
    await shot('run-operator-seat-chooser.png');
    await page.reload();
    await page.getByRole('button', { name: /^Seat: Red 3/ }).waitFor();
    expect(await nearFace()).toBe(redNear);
    await page.getByRole('button', { name: /^Seat: Red 3/ }).click();
    await dialog.getByRole('button', { name: 'Blue' }).click();
    await dialog.getByRole('button', { name: '1' }).click();
    await page.keyboard.press('Escape');
    await page.getByRole('button', { name: /^Seat: Blue 1/ }).waitFor();
  });

  it('asks to turn the tablet when it is held in portrait', async () => {
    await page.setViewportSize({ width: 800, height: 1280 });
    await page.getByRole('alert').getByText('Turn the tablet to landscape').waitFor();
    await shot('run-operator-portrait.png');
    await page.setViewportSize({ width: 1280, height: 800 });
    await expect.poll(() => page.getByText('Turn the tablet to landscape').count()).toBe(0);
  });

  it('sends a tapped branch and level to the simulator, which acknowledges them and drives to the branch', async () => {
    // Taps count in teleop (in auto the robot runs its routine): wait for it, with coral on board.
    await until(() => sim!.model.mode === 'teleop' && sim!.model.holding === 'coral', 40_000);
    const branch = sim!.model.target.branch === 'G' ? 'J' : 'G';
    const ackedBefore = watcher.messages.length;
    const poseAtTap = { ...sim!.model.pose };
    await page.getByRole('button', { name: `Branch ${branch}` }).click();
    await page.getByRole('button', { name: 'Level L3' }).click();
    // The page paints a tap's state on the next frame, so wait for both parts by value, then the summary.
    await echo().locator('[data-channel="op/reef/branch"][data-phase="acked"]').getByText(branch).waitFor();
    await echo().locator('[data-channel="op/reef/level"][data-phase="acked"]').getByText('L3').waitFor();
    await echo().getByText(/Robot has it · \d+ ms/).waitFor();
    expect(await page.getByRole('button', { name: `Branch ${branch}` }).getAttribute('aria-pressed')).toBe('true');
    await shot('run-operator-acked.png');

    // Through the relay: the tablet's values, the simulator's acks, and its retained robot/target.
    await watcher.next((m) => m.type === 'value' && m.channel === 'op/reef/branch' && m.value === branch && m.from.kind === 'panel', 3000);
    const target = await watcher.next<Value>(
      (m) => m.type === 'value' && m.channel === 'robot/target' && (m.value as Target).branch === branch && (m.value as Target).level === 'L3',
      4000,
    );
    expect(watcher.messages.slice(ackedBefore).some((m) => m.type === 'acked' && m.channel === 'op/reef/branch')).toBe(true);
    expect(sim!.model.selection).toMatchObject({ branch, level: 'L3' });
    const goal = target.value as { xM: number; yM: number };
    const startM = Math.hypot(poseAtTap.xM - goal.xM, poseAtTap.yM - goal.yM);
    let closestM = startM;
    await until(() => {
      closestM = Math.min(closestM, distanceToM(goal));
      return closestM < Math.max(0.15, startM - 0.5);
    }, 8000);
    expect(closestM).toBeLessThan(startM);
  });

  it('shows the pressed look in the same task as the pointer-down, before any frame is drawn', async () => {
    const look = await page.evaluate(() => {
      const el = document.querySelector<SVGGElement>('[data-branch="E"]')!;
      el.dispatchEvent(new PointerEvent('pointerdown', { bubbles: true, button: 0, pointerId: 7, isPrimary: true, pointerType: 'touch' }));
      const pressed = { attribute: el.getAttribute('data-pressed'), filter: getComputedStyle(el).filter };
      el.dispatchEvent(new PointerEvent('pointerup', { bubbles: true, button: 0, pointerId: 7, isPrimary: true, pointerType: 'touch' }));
      return { ...pressed, after: el.getAttribute('data-pressed') };
    });
    expect(look).toEqual({ attribute: 'true', filter: 'brightness(1.5)', after: null });
    await until(() => sim!.model.selection.branch === 'E');
  });

  it('takes a selection from the keyboard as from a tap (Enter or Space on a focused button)', async () => {
    await page.getByRole('button', { name: 'Level L2' }).focus();
    await page.keyboard.press('Space');
    await until(() => sim!.model.selection.level === 'L2');
    // The robot can have it a frame before the page draws it (the relay client flushes once per frame).
    await expect.poll(() => page.getByRole('button', { name: 'Level L2' }).getAttribute('aria-pressed')).toBe('true');
    await page.getByRole('button', { name: 'Branch K' }).focus();
    await page.keyboard.press('Enter');
    await until(() => sim!.model.selection.branch === 'K');
    await echo().locator('[data-channel="op/reef/branch"][data-phase="acked"]').getByText('K').waitFor();
  });

  it('shows the lost relay link, keeps a tap made meanwhile, and re-sends the selection when the link is back', async () => {
    const revsBefore = watcher.messages.filter((m) => m.type === 'value' && m.channel === 'op/reef/level').length;
    isCablePulled = true;
    await page.evaluate(() => window.pitwallRunRelay!.dropConnection());
    await relayPill().getByText('Relay link lost · reconnecting').waitFor();
    expect(await relayPill().getAttribute('data-tone')).toBe('danger');
    await page.getByRole('button', { name: 'Coral station Right' }).click();
    await echo().getByText('Link lost · resends').waitFor();
    await shot('run-operator-link-lost.png');

    isCablePulled = false;
    await relayPill().getByText('Relay connected').waitFor({ timeout: 10_000 });
    await echo().getByText(/Robot has it · \d+ ms/).waitFor({ timeout: 5000 });
    // The level was re-sent on the new connection, and the station tapped while away went out too.
    await until(() => watcher.messages.filter((m) => m.type === 'value' && m.channel === 'op/reef/level').length > revsBefore);
    await watcher.next((m) => m.type === 'value' && m.channel === 'op/station' && m.value === 'right' && m.from.kind === 'panel', 3000);
    await until(() => sim!.model.selection.station === 'right');
  });

  it('opens with no network after the first load, from the service worker', async () => {
    await page.locator('[data-offline="ready"]').waitFor({ timeout: 10_000 });
    await page.context().setOffline(true);
    isCablePulled = true;
    await page.reload();
    await page.getByText('Gullwing match panel').waitFor();
    expect(await page.title()).toBe('Pitwall · Run mode');
    // The reef comes from the season profile, kept by the service worker too.
    await page.locator('[data-tile-kind="reef-picker"] polygon').waitFor();
    expect(await page.getByRole('button', { name: /^Branch [A-L]$/ }).count()).toBe(12);
    await relayPill().getByText('Relay link lost · reconnecting').waitFor();
    await shot('run-operator-offline.png');
    await page.context().setOffline(false);
    isCablePulled = false;
    await relayPill().getByText('Relay connected').waitFor({ timeout: 10_000 });
  });

  it('offers a version published while it runs, and switches only when asked', async () => {
    const programmer = await stack.server.client();
    await programmer.post('/api/auth/sign-in').send({ email: 'programmer@harborlight.example', password: DEMO_PASSWORD }).expect(200);
    const published = (await programmer.get('/api/panels/published').expect(200)).body as { panelId: string; version: { id: string; number: number; document: unknown } };
    const panel = (await programmer.get(`/api/panels/${published.panelId}`).expect(200)).body as { latestVersion: { id: string } };
    const saved = (await programmer.put(`/api/panels/${published.panelId}`).send({ baseVersionId: panel.latestVersion.id, document: published.version.document, message: 'Same layout, new version' }).expect(200)).body as {
      latestVersion: { id: string; number: number };
    };
    await programmer.post(`/api/panels/${published.panelId}/publish`).send({ versionId: saved.latestVersion.id }).expect(200);
    const offer = page.getByRole('button', { name: `Version ${saved.latestVersion.number} published · Load it` });
    await offer.waitFor({ timeout: 20_000 });
    await page.getByText(`version ${published.version.number}`, { exact: true }).waitFor();
    await offer.click();
    await page.getByText(`version ${saved.latestVersion.number}`, { exact: true }).waitFor();
    expect(await page.getByRole('button', { name: /^Branch [A-L]$/ }).count()).toBe(12);
  });

  it('runs an unpublished panel at /panels/:id/run for a programmer, marked as a draft', async () => {
    const programmer = await stack.server.client();
    await programmer.post('/api/auth/sign-in').send({ email: 'programmer@harborlight.example', password: DEMO_PASSWORD }).expect(200);
    const list = (await programmer.get('/api/panels').expect(200)).body as { panels: { id: string; name: string; publishedVersion: unknown }[] };
    const draft = list.panels.find((p) => p.publishedVersion === null)!;
    const p = await signInAs(stack, 'programmer');
    await p.goto(`${stack.server.url}/panels/${draft.id}/run`);
    await p.getByText(draft.name).waitFor();
    await p.getByText('draft', { exact: true }).waitFor();
    await p.locator('[data-testid="run-canvas"]').waitFor();
    await p.screenshot({ path: path.join(SHOTS, 'run-programmer-draft.png') });
    await p.context().close();
  });

  it('asks for the safety caution before the panel goes live to a robot that is not the simulator', async () => {
    sim!.stop();
    sim = undefined;
    await page.getByRole('status', { name: 'Robot link' }).getByText('No robot connected').waitFor({ timeout: 10_000 });
    const real = new RobotClient({ url: relayUrl(stack.server), key: robotKey, name: 'Gullwing', reads: ['op/reef/branch'], onValue: () => {} });
    real.start();
    try {
      await until(() => real.status === 'open');
      real.publish('robot/simulated', false);
      const gate = page.getByRole('alertdialog', { name: /live to a real robot: Gullwing/ });
      await gate.waitFor();
      await gate.getByText('A panel connected to a real robot can make it move').waitFor();
      await shot('run-operator-real-robot.png');
      await gate.getByRole('button', { name: 'I understand — open the panel' }).click();
      await page.getByTestId('live-robot-band').waitFor();
      expect(await page.getByTestId('simulator-band').count()).toBe(0);
    } finally {
      real.stop();
    }
  });
});
