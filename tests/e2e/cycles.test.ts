// Through the real UI in headless Chromium: the demo coach reviews the demo event's cycles at /cycles, filters them,
// opens the slowest cycle and lands in the replay at its start; on a replay page, picking a cycle moves the timeline.
import path from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { cycleReviewSchema } from '../../shared/schemas/cycle';
import { DEMO_EVENT, seedDemoRecordings } from '../../server/features/demo/demo-recordings';
import { SHOTS, signInAs, startBrowserStack, type BrowserStack } from '../support/e2e';

let stack: BrowserStack;

beforeAll(async () => {
  stack = await startBrowserStack(async (server) => {
    await seedDemoRecordings(server.db.db);
  });
}, 120_000);
afterAll(async () => {
  await stack?.close();
});

const cursorSeconds = async (page: Page) => Number.parseFloat((await page.getByTestId('cursor-time').textContent()) ?? 'NaN');

/** The review as the page's own API call answers it, for the numbers the page should show. */
async function reviewFor(page: Page, query: string) {
  const res = await page.request.get(`${stack.server.url}/api/review/cycles?${query}`);
  expect(res.status()).toBe(200);
  return cycleReviewSchema.parse(await res.json());
}

describe('cycles through the UI', () => {
  it('reviews the demo event as the coach, filters it, and opens the slowest cycle in the replay at its start', async () => {
    const page = await signInAs(stack, 'coach', { width: 1440, height: 900 });
    await page.getByRole('navigation').getByRole('link', { name: 'Cycles' }).click();
    await page.getByRole('heading', { name: 'Cycles', level: 1 }).waitFor();
    await page.getByLabel('Event', { exact: true }).selectOption(DEMO_EVENT);
    await expect.poll(() => new URL(page.url()).searchParams.get('event')).toBe(DEMO_EVENT);
    await page.locator('[data-trend-chart] canvas').waitFor();

    const all = await reviewFor(page, new URLSearchParams({ event: DEMO_EVENT }).toString());
    expect(all.recordingCount).toBe(12);
    const perMatch = page.getByRole('table', { name: 'Cycle time per match' });
    await expect.poll(() => perMatch.getByRole('row').count()).toBe(13);
    await page.screenshot({ path: path.join(SHOTS, 'cycles-review.png'), fullPage: true });

    // A filter nothing matches says so, and Clear filters brings the review back.
    await page.getByLabel('Kind', { exact: true }).selectOption('match');
    await page.getByText('No recording matches these filters').waitFor();
    await page.screenshot({ path: path.join(SHOTS, 'cycles-review-empty.png') });
    await page.getByRole('button', { name: 'Clear filters' }).last().click();
    await expect.poll(() => new URL(page.url()).search).toBe('');
    await page.getByLabel('Event', { exact: true }).selectOption(DEMO_EVENT);
    await expect.poll(() => perMatch.getByRole('row').count()).toBe(13);

    // Saturday only: the address keeps the filter and the page shows the six matches of that day.
    await page.getByLabel('From', { exact: true }).fill('2025-03-15');
    await expect.poll(() => new URL(page.url()).searchParams.get('from')).toBe('2025-03-15');
    await expect.poll(() => perMatch.getByRole('row').count()).toBe(7);
    const saturday = await reviewFor(page, new URLSearchParams({ event: DEMO_EVENT, from: '2025-03-15' }).toString());
    expect(saturday.recordingCount).toBe(6);
    await expect.poll(async () => (await perMatch.getByRole('row').nth(1).getByRole('rowheader').textContent())?.trim()).toBe('Q7');

    const slowest = saturday.slowest[0]!;
    const link = page.getByRole('table', { name: 'Slowest cycles' }).getByRole('link').first();
    expect(await link.getAttribute('href')).toBe(`/recordings/${slowest.recordingId}?t=${String(Number(slowest.startS.toFixed(2)))}`);
    await link.click();
    await page.getByTestId('cursor-time').waitFor();
    expect(new URL(page.url()).pathname).toBe(`/recordings/${slowest.recordingId}`);
    expect(await cursorSeconds(page)).toBeCloseTo(slowest.startS, 1);
    await page.screenshot({ path: path.join(SHOTS, 'cycles-slowest-in-replay.png') });
  });

  it('fits the review on a tablet held upright', async () => {
    const page = await signInAs(stack, 'coach', { width: 820, height: 1180 });
    await page.goto(`${stack.server.url}/cycles?${new URLSearchParams({ event: DEMO_EVENT })}`);
    await page.locator('[data-trend-chart] canvas').waitFor();
    await page.getByRole('table', { name: 'Slowest cycles' }).waitFor();
    const overflowPx = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
    expect(overflowPx).toBeLessThanOrEqual(0);
    await page.screenshot({ path: path.join(SHOTS, 'cycles-review-tablet.png') });
  });

  it('shows the cycles view on a replay page, and a picked cycle moves the timeline to its start', async () => {
    const page = await signInAs(stack, 'viewer', { width: 1440, height: 900 });
    const review = await reviewFor(page, new URLSearchParams({ event: DEMO_EVENT }).toString());
    const recordingId = review.matches[0]!.recordingId;
    await page.goto(`${stack.server.url}/recordings/${recordingId}`);
    await page.getByTestId('cursor-time').waitFor();
    const cycles = page.getByRole('table', { name: 'Cycles of this recording' });
    await cycles.waitFor();
    await page.locator('[data-cycle-chart] canvas').waitFor();
    const res = await page.request.get(`${stack.server.url}/api/recordings/${recordingId}/cycles`);
    const { cycles: list, summary } = (await res.json()) as { cycles: { startS: number; index: number }[]; summary: { cycleCount: number } };
    expect(await cycles.getByRole('row').count()).toBe(summary.cycleCount + 1);
    expect(await cursorSeconds(page)).toBe(0);

    const fourth = list[3]!;
    await cycles.getByRole('button', { name: /^Go to cycle 4 at/ }).click();
    await expect.poll(() => cursorSeconds(page)).toBeCloseTo(fourth.startS, 1);
    await expect.poll(() => cycles.locator('tr[aria-current="true"]').getAttribute('data-cycle-row')).toBe('3');
    await expect.poll(() => new URL(page.url()).searchParams.get('t')).toBe(String(Number(fourth.startS.toFixed(2))));
    await page.locator('[data-cycle-chart]').evaluate((el) => el.scrollIntoView({ block: 'center' }));
    await page.screenshot({ path: path.join(SHOTS, 'cycles-replay-view.png') });

    // A click on the chart's bar picks that cycle too.
    const canvas = page.locator('[data-cycle-chart] .u-over');
    const box = (await canvas.boundingBox())!;
    // The x scale runs from 0.4 to n + 0.6 (see SegmentChart), so bar n sits at (n − 0.4) / (n + 0.2) of the width.
    const lastX = box.x + (box.width * (list.length - 0.4)) / (list.length + 0.2);
    await page.mouse.click(lastX, box.y + box.height - 8);
    await expect.poll(() => cursorSeconds(page)).toBeCloseTo(list.at(-1)!.startS, 1);
  });
});
