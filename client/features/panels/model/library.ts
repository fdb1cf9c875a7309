// Pure: the panel library's forms and labels, no React.
import { z } from 'zod';
import {
  DEVICE_PRESETS,
  deviceSchema,
  panelNameSchema,
  type Device,
  type DevicePreset,
  type PanelSummary,
} from '../../../../shared/schemas/panel';
import type { FieldIssue } from '../../../../shared/schemas/error';

export type PresetChoice = DevicePreset | 'custom';

export type CreatePanelForm = {
  name: string;
  preset: PresetChoice;
  orientation: Device['orientation'];
  /** Only for `custom`: the screen's CSS size in landscape, as typed. */
  widthPx: string;
  heightPx: string;
};

export const DEFAULT_CREATE_FORM: CreatePanelForm = {
  name: '',
  preset: 'tablet-1280x800',
  orientation: 'landscape',
  widthPx: '1280',
  heightPx: '800',
};

export type CreateFormResult =
  | { ok: true; name: string; device: Device }
  | { ok: false; errors: Partial<Record<'name' | 'widthPx' | 'heightPx', string>> };

const wholePx = (label: string) =>
  z
    .string()
    .trim()
    .regex(/^\d+$/, `Type the ${label} in whole CSS pixels`)
    .transform(Number);

/** The create dialog's values checked against the panel contract: the name and the device. */
export function readCreateForm(form: CreatePanelForm): CreateFormResult {
  const errors: Partial<Record<'name' | 'widthPx' | 'heightPx', string>> = {};
  const name = panelNameSchema.safeParse(form.name);
  if (!name.success) errors.name = name.error.issues[0]!.message;
  let widthPx: number;
  let heightPx: number;
  if (form.preset === 'custom') {
    const w = wholePx('width').safeParse(form.widthPx);
    const h = wholePx('height').safeParse(form.heightPx);
    widthPx = w.success ? w.data : NaN;
    heightPx = h.success ? h.data : NaN;
    if (!w.success) errors.widthPx = w.error.issues[0]!.message;
    if (!h.success) errors.heightPx = h.error.issues[0]!.message;
  } else {
    ({ widthPx, heightPx } = DEVICE_PRESETS[form.preset]);
  }
  const device = deviceSchema.safeParse({ preset: form.preset, widthPx, heightPx, orientation: form.orientation });
  if (!device.success) {
    for (const issue of device.error.issues) {
      const field = issue.path[0] === 'widthPx' ? 'widthPx' : issue.path[0] === 'heightPx' ? 'heightPx' : null;
      if (field) errors[field] ??= issue.message;
    }
  }
  if (!name.success || !device.success || Object.keys(errors).length > 0) return { ok: false, errors };
  return { ok: true, name: name.data, device: device.data };
}

/** "Tablet 800 × 1280" (the size as the tablet is held), or "Custom 1366 × 1024". */
export function deviceName(device: Device): string {
  const [w, h] = device.orientation === 'portrait' ? [device.heightPx, device.widthPx] : [device.widthPx, device.heightPx];
  return `${device.preset === 'custom' ? 'Custom' : 'Tablet'} ${w} × ${h}`;
}

/** "Tablet 1280 × 800 · landscape", or "Custom 1366 × 1024 · portrait". */
export function deviceLabel(device: Device): string {
  return `${deviceName(device)} · ${device.orientation}`;
}

export type PublishedState =
  | { kind: 'none' }
  | { kind: 'latest'; number: number }
  /** Published an older version than the newest: the driver station runs vN while edits went on. */
  | { kind: 'older'; number: number; latest: number };

export function publishedState(panel: Pick<PanelSummary, 'publishedVersion' | 'latestVersion'>): PublishedState {
  const published = panel.publishedVersion;
  if (!published) return { kind: 'none' };
  if (published.id === panel.latestVersion.id) return { kind: 'latest', number: published.number };
  return { kind: 'older', number: published.number, latest: panel.latestVersion.number };
}

export type ImportRead = { ok: true; json: unknown } | { ok: false; message: string };

/**
 * A chosen file's text as JSON for the import route. Only "is it JSON at all" is decided here; whether it is
 * a Pitwall panel file is the server's answer, with its issues.
 */
export function readImportText(text: string, fileName: string): ImportRead {
  if (text.trim() === '') return { ok: false, message: `${fileName} is empty.` };
  try {
    return { ok: true, json: JSON.parse(text) as unknown };
  } catch (e) {
    const detail = e instanceof SyntaxError ? ` (${e.message})` : '';
    return { ok: false, message: `${fileName} isn’t JSON, so it can’t be a Pitwall panel file${detail}.` };
  }
}

/** The server's issues as lines a person can act on: "pages.0.tiles.3.channel — channel must look like …". */
export function importIssueLines(issues: readonly FieldIssue[]): string[] {
  return issues.map((i) => (i.path ? `${friendlyPath(i.path)}: ${i.message}` : i.message));
}

/** `document.pages.0.tiles.3.w` → "page 1, tile 4, w". */
export function friendlyPath(path: string): string {
  const parts = path.split('.').filter((p) => p !== 'body');
  const out: string[] = [];
  for (let i = 0; i < parts.length; i += 1) {
    const part = parts[i]!;
    const next = parts[i + 1];
    if ((part === 'pages' || part === 'tiles' || part === 'options' || part === 'channels') && next !== undefined && /^\d+$/.test(next)) {
      const noun = { pages: 'page', tiles: 'tile', options: 'option', channels: 'channel' }[part];
      out.push(`${noun} ${Number(next) + 1}`);
      i += 1;
    } else if (part !== 'document') {
      out.push(part);
    }
  }
  return out.join(', ') || path;
}

/** A file name for a panel's download: "gullwing-match-panel.pitwall-panel.json". */
export function exportFileName(name: string): string {
  const slug = name
    .toLowerCase()
    .normalize('NFKD')
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '');
  return `${slug || 'panel'}.pitwall-panel.json`;
}
