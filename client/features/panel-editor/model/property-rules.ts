// Pure: checks of the property form's fields, with messages in the designer's words. The document schema in
// shared/schemas/panel.ts is the contract; these say, per field, what it wants before the edit is applied.
import { z } from 'zod';
import { OP_CHANNEL_NAMES, ROBOT_CHANNELS } from '../../../../shared/domain/channels';
import { DEFAULT_CHANNELS } from '../../../../shared/domain/panels/tile-catalogue';
import { channelSchema } from '../../../../shared/protocol/messages';
import type { TileKind, TileOption } from '../../../../shared/schemas/panel';

export type Checked<T> = { ok: true; value: T } | { ok: false; message: string };

const WRITING_KINDS: readonly TileKind[] = ['reef-picker', 'level-picker', 'station-picker', 'algae-picker', 'cage-picker', 'push-pad', 'latch-pad', 'choice-pad'];

/** Whether a kind publishes (its channel is an `op/` one the panel writes). */
export const isWritingKind = (kind: TileKind) => WRITING_KINDS.includes(kind);

export function checkLabel(text: string): Checked<string> {
  if (text.length > 80) return { ok: false, message: 'Use at most 80 characters' };
  return { ok: true, value: text };
}

/** A channel name: `op/…` for tiles that write, `robot/…` or `op/…` for tiles that show a value. */
export function checkChannel(text: string, kind: TileKind): Checked<string> {
  const value = text.trim();
  if (value === '') return { ok: false, message: 'Name a channel, e.g. op/reef/level' };
  const parsed = channelSchema.safeParse(value);
  if (!parsed.success) return { ok: false, message: 'A channel is op/… or robot/… with letters, digits, - _ . and /' };
  if (isWritingKind(kind) && !value.startsWith('op/')) return { ok: false, message: 'A tile that publishes writes an op/ channel' };
  if (!isWritingKind(kind) && value.startsWith('sys/')) return { ok: false, message: 'Show a robot/ or op/ channel; sys/ belongs to the relay' };
  return { ok: true, value };
}

/** Channel names to suggest for a kind: the standard op/ channels, the robot's and the catalogue's defaults. */
export function channelSuggestions(kind: TileKind): string[] {
  const defaults = Object.values(DEFAULT_CHANNELS) as string[];
  const robot = Object.values(ROBOT_CHANNELS) as string[];
  const all = isWritingKind(kind) ? [...OP_CHANNEL_NAMES, ...defaults.filter((c) => c.startsWith('op/'))] : [...defaults.filter((c) => c.startsWith('robot/')), ...robot, ...OP_CHANNEL_NAMES];
  return [...new Set(all)];
}

/** How many options a kind takes: pickers 1–8, the choice pad 2–12. */
export function optionLimits(kind: TileKind): { min: number; max: number } {
  return kind === 'choice-pad' ? { min: 2, max: 12 } : { min: 1, max: 8 };
}

export type OptionProblems = { rows: Array<{ label?: string; value?: string }>; list?: string };

/** Each option needs a label (≤ 40) and a value (≤ 64) unique in the tile; the list a count within limits. */
export function checkOptions(options: readonly TileOption[], kind: TileKind): { ok: boolean; problems: OptionProblems } {
  const { min, max } = optionLimits(kind);
  const seen = new Map<string, number>();
  const rows = options.map((o, i) => {
    const row: { label?: string; value?: string } = {};
    if (o.label.trim() === '') row.label = 'Give the option a label';
    else if (o.label.length > 40) row.label = 'At most 40 characters';
    if (o.value.trim() === '') row.value = 'Give the option a value';
    else if (o.value.length > 64) row.value = 'At most 64 characters';
    else if (seen.has(o.value)) row.value = `Same value as option ${seen.get(o.value)! + 1}`;
    seen.set(o.value, i);
    return row;
  });
  const list = options.length < min ? `Give at least ${min} option${min === 1 ? '' : 's'}` : options.length > max ? `At most ${max} options` : undefined;
  const ok = !list && rows.every((r) => !r.label && !r.value);
  return { ok, problems: { rows, list } };
}

const finite = z.number().finite();

/** A number typed in a field; blank or not a number is refused with the field's name. */
export function checkNumber(text: string, what: string, limits: { min?: number; max?: number; isInteger?: boolean } = {}): Checked<number> {
  const trimmed = text.trim().replace(',', '.');
  const n = Number(trimmed);
  if (trimmed === '' || !finite.safeParse(n).success) return { ok: false, message: `Type the ${what} as a number` };
  if (limits.isInteger && !Number.isInteger(n)) return { ok: false, message: `The ${what} is a whole number` };
  if (limits.min !== undefined && n < limits.min) return { ok: false, message: `The ${what} is at least ${limits.min}` };
  if (limits.max !== undefined && n > limits.max) return { ok: false, message: `The ${what} is at most ${limits.max}` };
  return { ok: true, value: n };
}

/**
 * Readout thresholds must lie the right way round: with `below` (low is bad) danger is under warn; with
 * `above` (high is bad) danger is over warn.
 */
export function checkThresholds(t: { direction: 'below' | 'above'; warn: number; danger: number }): string | null {
  if (t.direction === 'below' && t.danger >= t.warn) return 'When low is bad, the danger value is below the warn value';
  if (t.direction === 'above' && t.danger <= t.warn) return 'When high is bad, the danger value is above the warn value';
  return null;
}

export function checkHexColour(text: string): Checked<string> {
  const value = text.trim().toLowerCase();
  if (!/^#[0-9a-f]{6}$/.test(value)) return { ok: false, message: 'A colour is # and six hex digits, e.g. #f5a30f' };
  return { ok: true, value };
}
