// Through the real UI in headless Chromium: a programmer creates a panel, drags a reef picker and a level picker
// from the palette onto the canvas (real mouse moves past dnd-kit's activation distance), binds channels in the
// property form and watches the panel check flag and clear a clash, saves, publishes and sees the library show
// the published version; two members editing one panel get the conflict dialog without losing work; an operator
// sees the library read only.
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '../../shared/domain/roles';
import { SHOTS, signInAs, startBrowserStack, type BrowserStack } from '../support/e2e';

let stack: BrowserStack;

beforeAll(async () => {
  stack = await startBrowserStack();
});
afterAll(async () => {
  await stack?.close();
});

const signIn = (role: Role): Promise<Page> => signInAs(stack, role, { width: 1440, height: 900 });

/** Presses the mouse on `from`, moves in small steps (dnd-kit starts a drag after 6 px) and releases over `to`. */
async function dragFromTo(page: Page, from: { x: number; y: number }, to: { x: number; y: number }, steps = 24) {
  await page.mouse.move(from.x, from.y);
  await page.mouse.down();
  await page.mouse.move(from.x + 4, from.y + 4, { steps: 2 });
  await page.mouse.move(from.x + 12, from.y + 10, { steps: 3 });
  await page.mouse.move(to.x, to.y, { steps });
  await page.mouse.up();
}

async function centreOf(page: Page, selector: string) {
  const box = (await page.locator(selector).first().boundingBox())!;
  return { x: box.x + box.width / 2, y: box.y + box.height / 2 };
}

/** A point on the canvas given in its own (device) pixels. */
async function canvasPoint(page: Page, xPx: number, yPx: number) {
  const canvas = page.getByTestId('design-canvas');
  const box = (await canvas.boundingBox())!;
  const scale = Number(await canvas.getAttribute('data-scale'));
  return { x: box.x + xPx * scale, y: box.y + yPx * scale };
}

async function createPanel(page: Page, name: string): Promise<string> {
  await page.goto(`${stack.server.url}/panels`);
  await page.getByRole('button', { name: 'New panel' }).click();
  const dialog = page.getByRole('dialog', { name: 'New panel' });
  await dialog.getByLabel('Name').fill(name);
  await dialog.getByLabel('Target tablet').selectOption('tablet-1280x800');
  await dialog.getByRole('button', { name: 'Create and open' }).click();
  await expect.poll(() => page.url()).toMatch(/\/panels\/[0-9a-f-]{36}\/edit$/);
  await page.getByTestId('design-canvas').waitFor();
  return page.url().split('/panels/')[1]!.split('/')[0]!;
}

describe('the panel designer through the UI', () => {
  it('builds a panel by dragging tiles from the palette, binds channels, checks, saves, publishes and shows it in the library', async () => {
    const page = await signIn('programmer');
    await page.goto(`${stack.server.url}/panels`);
    await page.getByRole('heading', { name: 'Team panels' }).waitFor();
    await page.screenshot({ path: path.join(SHOTS, 'panels-library-before.png'), fullPage: true });

    // The create dialog refuses a blank name before anything is sent.
    await page.getByRole('button', { name: 'New panel' }).click();
    const dialog = page.getByRole('dialog', { name: 'New panel' });
    await dialog.getByRole('button', { name: 'Create and open' }).click();
    await expect.poll(() => dialog.getByText('Name the panel').isVisible()).toBe(true);
    await dialog.getByRole('button', { name: 'Cancel' }).click();

    await createPanel(page, 'Lakeshore quals panel');
    await page.screenshot({ path: path.join(SHOTS, 'panel-designer-empty.png') });

    // Drag the reef picker to the canvas's top-left area and the level picker to its right.
    await dragFromTo(page, await centreOf(page, '[data-palette-kind="reef-picker"]'), await canvasPoint(page, 100, 100));
    await page.locator('[data-design-tile]').first().waitFor();
    await dragFromTo(page, await centreOf(page, '[data-palette-kind="level-picker"]'), await canvasPoint(page, 620, 100));
    await expect.poll(() => page.locator('[data-design-tile]').count()).toBe(2);
    const kinds = await page.locator('[data-design-tile]').evaluateAll((els) => els.map((e) => e.closest('[data-tile-kind]') ?? e.parentElement?.querySelector('[data-tile-kind]')).map((e) => e?.getAttribute('data-tile-kind')));
    expect(kinds).toEqual(['reef-picker', 'level-picker']);
    // Dropped where the pointer was: the level picker's top-left cell is under (620, 100) on 80 px cells.
    const level = page.locator('[data-design-tile]').nth(1);
    await expect.poll(() => level.getAttribute('aria-label')).toContain('at column 8, row 2');
    await expect.poll(() => page.getByTestId('save-status').textContent()).toContain('Unsaved changes');

    // The level picker is selected after its drop: bind it to the reef branch channel, which the reef picker
    // writes with other values — the panel check flags the clash on both tiles.
    const channel = page.getByLabel('Channel');
    await channel.fill('op/reef/branch');
    const clash = page.locator('[data-issue-rule="type-clash"]');
    await clash.first().waitFor();
    await expect.poll(() => page.locator('[data-design-tile][data-issue="error"]').count()).toBe(2);
    await page.screenshot({ path: path.join(SHOTS, 'panel-designer-check-issue.png') });
    // Picking the issue selects both tiles it names.
    await clash.first().click();
    await expect.poll(() => page.locator('[data-design-tile][data-selected]').count()).toBe(2);
    await page.locator('[data-design-tile]').nth(1).click();
    // A channel that is not a channel gets an inline message and is not applied.
    await channel.fill('reef level');
    await expect.poll(() => page.getByText('A channel is op/… or robot/…').isVisible()).toBe(true);
    // Fixed: back to the level channel and the clash is gone.
    await channel.fill('op/reef/level');
    await expect.poll(() => clash.count()).toBe(0);
    await page.getByLabel('Label', { exact: true }).fill('Level');

    // Move the level picker one cell right with the keyboard, undo, redo.
    await level.focus();
    await page.keyboard.press('ArrowRight');
    await expect.poll(() => level.getAttribute('aria-label')).toContain('at column 9, row 2');
    await page.keyboard.press('Control+z');
    await expect.poll(() => level.getAttribute('aria-label')).toContain('at column 8, row 2');
    await page.keyboard.press('Control+Shift+z');
    await expect.poll(() => level.getAttribute('aria-label')).toContain('at column 9, row 2');

    // A rectangle drawn on the empty canvas selects both tiles; align their bottom edges (the level picker is
    // 4 cells tall, the reef picker 5, so the level picker moves down one row).
    await dragFromTo(page, await canvasPoint(page, 20, 20), await canvasPoint(page, 900, 500), 12);
    await expect.poll(() => page.locator('[data-design-tile][data-selected]').count()).toBe(2);
    await page.getByRole('button', { name: 'Align bottom edges' }).click();
    await expect.poll(() => level.getAttribute('aria-label')).toContain('at column 9, row 3');

    await page.getByLabel('Note for this version (optional)').fill('Reef and level pickers');
    await page.getByRole('button', { name: 'Save', exact: true }).click();
    await expect.poll(() => page.getByTestId('save-status').textContent()).toContain('Saved as v2');
    await page.screenshot({ path: path.join(SHOTS, 'panel-designer-saved.png') });

    await page.getByRole('button', { name: 'Publish v2' }).click();
    await page.getByRole('dialog', { name: /Publish v2/ }).getByRole('button', { name: 'Publish v2' }).click();
    await expect.poll(() => page.getByTestId('save-status').textContent()).toContain('published');

    // The versions list shows both versions, v2 published, and what changed between them.
    await page.getByRole('button', { name: 'Versions' }).click();
    const versions = page.getByRole('dialog', { name: 'Versions' });
    await versions.locator('[data-version-number="2"]').getByText('Published').waitFor();
    await versions.getByTestId('version-diff').getByText(/Added ‘Level’/).waitFor();
    await page.screenshot({ path: path.join(SHOTS, 'panel-designer-versions.png') });
    await versions.getByRole('button', { name: 'Close' }).click();

    // The contract lists the two channels the panel writes.
    await page.getByRole('button', { name: 'Channel contract' }).click();
    const contract = page.getByRole('dialog', { name: 'Channel contract' });
    await expect.poll(() => contract.getByRole('tabpanel').textContent()).toContain('op/reef/level');
    await contract.getByRole('tab', { name: 'Java' }).click();
    await expect.poll(() => contract.getByRole('tabpanel').textContent()).toContain('public static final String');
    await contract.getByRole('button', { name: 'Close' }).click();

    // Restoring v1 loads it as the working copy; leaving then asks first, and Undo brings v2's tiles back.
    await page.getByRole('button', { name: 'Versions' }).click();
    await versions.getByRole('button', { name: 'Restore v1 into the designer' }).click();
    await expect.poll(() => page.locator('[data-design-tile]').count()).toBe(0);
    await expect.poll(() => page.getByTestId('save-status').textContent()).toContain('Unsaved changes');
    await page.getByRole('link', { name: 'Panels' }).click();
    const leave = page.getByRole('dialog', { name: 'Leave without saving?' });
    await leave.getByRole('button', { name: 'Cancel' }).click();
    await page.getByRole('button', { name: 'Undo (Ctrl+Z)' }).click();
    await expect.poll(() => page.locator('[data-design-tile]').count()).toBe(2);
    await expect.poll(() => page.getByTestId('save-status').textContent()).not.toContain('Unsaved');

    await page.getByRole('link', { name: 'Panels' }).click();
    const row = page.locator('tr', { hasText: 'Lakeshore quals panel' });
    await expect.poll(() => row.getByTestId('published-cell').textContent()).toContain('v2 published');
    await page.screenshot({ path: path.join(SHOTS, 'panels-library-published.png'), fullPage: true });
    await page.context().close();
  });

  it('shows the second of two editors a conflict and keeps their work', async () => {
    const first = await signIn('programmer');
    const id = await createPanel(first, 'Pit rehearsal panel');
    const second = await signIn('lead');
    await second.goto(`${stack.server.url}/panels/${id}/edit`);
    await second.getByTestId('design-canvas').waitFor();

    // The first editor places a push pad and saves (v2).
    await first.locator('[data-palette-kind="push-pad"]').click();
    await first.getByRole('button', { name: 'Save', exact: true }).click();
    await expect.poll(() => first.getByTestId('save-status').textContent()).toContain('Saved as v2');

    // The second, still on v1, places a lamp and a readout and saves: the server refuses the stale base.
    await second.locator('[data-palette-kind="lamp"]').click();
    await second.locator('[data-palette-kind="readout"]').click();
    await second.getByRole('button', { name: 'Save', exact: true }).click();
    const conflict = second.getByRole('dialog', { name: 'Someone else saved this panel first' });
    await conflict.waitFor();
    await expect.poll(() => conflict.getByText(/Their version\s*v2/).isVisible()).toBe(true);
    await expect.poll(() => conflict.getByText(/Added ‘Eject’/).isVisible()).toBe(true);
    await second.screenshot({ path: path.join(SHOTS, 'panel-designer-conflict.png') });
    // Deciding later loses nothing: both new tiles are still on the canvas.
    await conflict.getByRole('button', { name: 'Decide later' }).click();
    await expect.poll(() => second.locator('[data-design-tile]').count()).toBe(2);
    await second.getByRole('button', { name: 'Save', exact: true }).click();
    await conflict.waitFor();
    await conflict.getByRole('button', { name: 'Keep mine (save on top)' }).click();
    await expect.poll(() => second.getByTestId('save-status').textContent()).toContain('Saved as v3');
    await expect.poll(() => second.locator('[data-design-tile]').count()).toBe(2);
    // The readout placed last is still selected: its form has the unit, decimals and thresholds.
    await expect.poll(() => second.getByLabel('Decimals').inputValue()).toBe('1');
    await second.getByLabel('Danger at (V)').fill('11.8');
    await expect.poll(() => second.getByText('When low is bad, the danger value is below the warn value').isVisible()).toBe(true);
    await second.screenshot({ path: path.join(SHOTS, 'panel-designer-readout.png') });
    await first.context().close();
    await second.context().close();
  });

  it('exports a panel to a file and imports it back, and lists what is wrong with a bad file', async () => {
    const page = await signIn('programmer');
    await page.goto(`${stack.server.url}/panels`);
    const row = page.locator('tr', { hasText: 'Gullwing match panel' });
    const [download] = await Promise.all([page.waitForEvent('download'), row.getByRole('link', { name: /^Export / }).click()]);
    const dir = mkdtempSync(path.join(tmpdir(), 'pitwall-panels-'));
    const good = path.join(dir, download.suggestedFilename());
    await download.saveAs(good);
    const file = JSON.parse(readFileSync(good, 'utf8')) as { format: string; name: string; document: { pages: { tiles: { channel?: string }[] }[] } };
    expect(file.format).toBe('pitwall.panel');

    // The same file with a tile bound to something that is not a channel, and a file that is not JSON.
    file.name = 'Gullwing match panel (from file)';
    const broken = structuredClone(file);
    // The first tile bound to a channel (a caption has none).
    const bound = broken.document.pages[0]!.tiles.findIndex((t) => t.channel !== undefined);
    broken.document.pages[0]!.tiles[bound]!.channel = 'reef branch';
    const brokenPath = path.join(dir, 'broken-panel.json');
    writeFileSync(brokenPath, JSON.stringify(broken));
    const notJson = path.join(dir, 'notes.json');
    writeFileSync(notJson, 'reef: A, level: L4');
    const importedPath = path.join(dir, 'imported-panel.json');
    writeFileSync(importedPath, JSON.stringify(file));

    const input = page.getByLabel('Import a panel file');
    await input.setInputFiles(notJson);
    await page.getByText('notes.json wasn’t imported').waitFor();
    await expect.poll(() => page.getByText(/isn’t JSON/).isVisible()).toBe(true);

    await input.setInputFiles(brokenPath);
    const refusal = page.getByRole('alert').filter({ hasText: 'broken-panel.json wasn’t imported' });
    await refusal.waitFor();
    await expect.poll(() => refusal.getByRole('list', { name: 'What is wrong with the file' }).textContent()).toContain(`page 1, tile ${bound + 1}, channel`);
    await page.screenshot({ path: path.join(SHOTS, 'panels-library-import-refused.png'), fullPage: true });

    await input.setInputFiles(importedPath);
    const imported = page.locator('tr', { hasText: 'Gullwing match panel (from file)' });
    await imported.getByText('Just added').waitFor();
    await expect.poll(() => page.getByText('broken-panel.json wasn’t imported').count()).toBe(0);
    await page.context().close();
  });

  it('adds, renames, reorders and deletes pages', async () => {
    const page = await signIn('programmer');
    await page.goto(`${stack.server.url}/panels`);
    await page.getByRole('link', { name: 'Edit Practice layout', exact: true }).click();
    await page.getByTestId('design-canvas').waitFor();
    const tabs = page.getByRole('tablist', { name: 'Pages' }).getByRole('tab');
    const before = await tabs.count();
    // A tab reads "<name>, <n> tiles".
    const first = (await tabs.first().textContent())!.split(',')[0]!;
    await page.getByRole('button', { name: '+ Page' }).click();
    await expect.poll(() => tabs.count()).toBe(before + 1);
    await expect.poll(() => tabs.last().getAttribute('aria-selected')).toBe('true');
    expect(await page.locator('[data-design-tile]').count()).toBe(0);
    await page.getByRole('button', { name: /^Rename page/ }).click();
    await page.getByLabel('Page name').fill('Auto routine');
    await page.getByLabel('Page name').press('Enter');
    await expect.poll(() => tabs.last().textContent()).toMatch(/^Auto routine/);
    for (let i = 0; i < before; i += 1) await page.getByRole('button', { name: 'Move page “Auto routine” left' }).click();
    await expect.poll(() => tabs.first().textContent()).toMatch(/^Auto routine/);
    await expect.poll(() => tabs.nth(1).textContent()).toMatch(new RegExp(`^${first}`));
    await page.getByRole('button', { name: 'Delete page “Auto routine”' }).click();
    await expect.poll(() => tabs.count()).toBe(before);
    await page.keyboard.press('Control+z');
    await expect.poll(() => tabs.count()).toBe(before + 1);
    await page.context().close();
  });

  it('gives an operator a read-only library', async () => {
    const page = await signIn('operator');
    await page.goto(`${stack.server.url}/panels`);
    await page.getByText('Read only').first().waitFor();
    await page.getByRole('link', { name: 'Gullwing match panel', exact: true }).waitFor();
    expect(await page.getByRole('button', { name: 'New panel' }).count()).toBe(0);
    expect(await page.getByRole('link', { name: /^Edit / }).count()).toBe(0);
    expect(await page.getByRole('button', { name: /^(Rename|Duplicate|Delete) / }).count()).toBe(0);
    expect(await page.getByRole('link', { name: /^View / }).count()).toBeGreaterThan(0);
    // Operators run panels: each row opens run mode.
    expect(await page.getByRole('link', { name: 'Run Gullwing match panel', exact: true }).getAttribute('href')).toMatch(/^\/panels\/[0-9a-f-]{36}\/run$/);
    await page.screenshot({ path: path.join(SHOTS, 'panels-library-operator.png'), fullPage: true });
    // Opening a panel shows it without the palette or save.
    await page.getByRole('link', { name: 'View Gullwing match panel', exact: true }).click();
    await page.getByTestId('design-canvas').waitFor();
    expect(await page.getByRole('navigation', { name: 'Tile palette' }).count()).toBe(0);
    await page.screenshot({ path: path.join(SHOTS, 'panel-designer-read-only.png') });
    expect(await page.getByRole('button', { name: 'Save', exact: true }).count()).toBe(0);
    await page.context().close();
  });
});
