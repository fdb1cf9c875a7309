import { describe, expect, it } from 'vitest';
import { DEFAULT_CREATE_FORM, deviceLabel, exportFileName, friendlyPath, importIssueLines, publishedState, readCreateForm, readImportText } from './library';

describe('readCreateForm', () => {
  it('takes a preset’s size and the chosen orientation', () => {
    expect(readCreateForm({ ...DEFAULT_CREATE_FORM, name: ' Gullwing match panel ', preset: 'tablet-1180x820', orientation: 'portrait' })).toEqual({
      ok: true,
      name: 'Gullwing match panel',
      device: { preset: 'tablet-1180x820', widthPx: 1180, heightPx: 820, orientation: 'portrait' },
    });
  });

  it('reads a custom size and names each bad field', () => {
    const result = readCreateForm({ ...DEFAULT_CREATE_FORM, name: '', preset: 'custom', widthPx: '200', heightPx: '12.5' });
    expect(result).toEqual({
      ok: false,
      errors: { name: 'Name the panel', widthPx: 'A device is at least 320 px wide', heightPx: 'Type the height in whole CSS pixels' },
    });
  });

  it('accepts a custom size within the contract’s limits', () => {
    const result = readCreateForm({ ...DEFAULT_CREATE_FORM, name: 'Pit tablet', preset: 'custom', widthPx: '1366', heightPx: '1024' });
    expect(result).toMatchObject({ ok: true, device: { preset: 'custom', widthPx: 1366, heightPx: 1024 } });
  });
});

describe('deviceLabel', () => {
  it('gives the size as the tablet is held', () => {
    expect(deviceLabel({ preset: 'tablet-1280x800', widthPx: 1280, heightPx: 800, orientation: 'portrait' })).toBe('Tablet 800 × 1280 · portrait');
    expect(deviceLabel({ preset: 'custom', widthPx: 1366, heightPx: 1024, orientation: 'landscape' })).toBe('Custom 1366 × 1024 · landscape');
  });
});

describe('publishedState', () => {
  const v = (id: string, number: number) => ({ id, number, author: { id: '00000000-0000-4000-8000-000000000001', name: 'Priya Nair', role: 'programmer' as const }, createdAt: '2026-03-14T10:00:00Z', message: '' });
  it('tells apart none, the newest version, and an older one', () => {
    expect(publishedState({ latestVersion: v('a', 3), publishedVersion: null })).toEqual({ kind: 'none' });
    expect(publishedState({ latestVersion: v('a', 3), publishedVersion: v('a', 3) })).toEqual({ kind: 'latest', number: 3 });
    expect(publishedState({ latestVersion: v('a', 3), publishedVersion: v('b', 2) })).toEqual({ kind: 'older', number: 2, latest: 3 });
  });
});

describe('readImportText', () => {
  it('parses JSON and refuses an empty or non-JSON file with its name', () => {
    expect(readImportText('{"format":"pitwall.panel"}', 'a.json')).toEqual({ ok: true, json: { format: 'pitwall.panel' } });
    expect(readImportText('  ', 'a.json')).toEqual({ ok: false, message: 'a.json is empty.' });
    const bad = readImportText('format: panel', 'notes.txt');
    expect(bad.ok).toBe(false);
    expect(!bad.ok && bad.message).toMatch(/^notes\.txt isn’t JSON/);
  });
});

describe('friendlyPath and importIssueLines', () => {
  it.each([
    ['document.pages.0.tiles.3.channel', 'page 1, tile 4, channel'],
    ['body.document.pages.1.name', 'page 2, name'],
    ['format', 'format'],
    ['document.pages.0.tiles.0.options.2.value', 'page 1, tile 1, option 3, value'],
  ])('%s reads as “%s”', (path, expected) => {
    expect(friendlyPath(path)).toBe(expected);
  });

  it('keeps a message without a path as it is', () => {
    expect(importIssueLines([{ path: '', message: 'Not a Pitwall panel file' }, { path: 'version', message: 'Unsupported' }])).toEqual([
      'Not a Pitwall panel file',
      'version: Unsupported',
    ]);
  });
});

describe('exportFileName', () => {
  it('slugs the panel name', () => {
    expect(exportFileName('Gullwing match panel')).toBe('gullwing-match-panel.pitwall-panel.json');
    expect(exportFileName('  ')).toBe('panel.pitwall-panel.json');
  });
});
