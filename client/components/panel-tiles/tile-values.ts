// Pure: display rules shared by the tile renderers (no DOM, no clocks).
import type { ChannelValue } from '../../../shared/protocol/messages';
import type { ThemeColour } from '../../../shared/schemas/panel';
import type { ChannelLive, SelectionPhase } from './tile-types';

export type ReadoutThresholds = { direction: 'below' | 'above'; warn: number; danger: number };
export type ReadoutLevel = 'ok' | 'warn' | 'danger';

/** How bad a number is: `below` means low is bad (volts at or under `warn` warn), `above` means high is bad. */
export function readoutLevel(value: number, thresholds: ReadoutThresholds | null): ReadoutLevel {
  if (!thresholds) return 'ok';
  const past = (limit: number) => (thresholds.direction === 'below' ? value <= limit : value >= limit);
  if (past(thresholds.danger)) return 'danger';
  if (past(thresholds.warn)) return 'warn';
  return 'ok';
}

/** The word beside a readout past a threshold, so the state is not told by colour alone. */
export function readoutWord(level: ReadoutLevel, direction: 'below' | 'above'): string | null {
  if (level === 'ok') return null;
  const word = direction === 'below' ? 'LOW' : 'HIGH';
  return level === 'danger' ? `${word}!` : word;
}

/** Seconds left as m:ss (whole seconds, rounded up so 0:00 means time is over); negative shows 0:00. */
export function formatClock(secondsLeft: number): string {
  const total = Math.max(0, Math.ceil(secondsLeft - 1e-9));
  const m = Math.floor(total / 60);
  const s = total % 60;
  return `${m}:${String(s).padStart(2, '0')}`;
}

/** A channel value as short display text; undefined and null as an em dash. */
export function formatValue(value: ChannelValue | undefined, decimals = 1): string {
  if (value === undefined || value === null) return '—';
  if (typeof value === 'number') return Number.isFinite(value) ? value.toFixed(decimals) : '—';
  if (typeof value === 'boolean') return value ? 'on' : 'off';
  if (typeof value === 'string') return value;
  return JSON.stringify(value);
}

/** A channel's last path part as a title: `op/reef/branch` → "Branch". */
export function channelTitle(channel: string): string {
  const last = channel.split('/').filter(Boolean).pop() ?? channel;
  return last.charAt(0).toUpperCase() + last.slice(1).replace(/[-_]/g, ' ');
}

/** The words for where a selection stands, e.g. "Robot has it · 32 ms". */
export function phaseText(live: Pick<ChannelLive, 'phase' | 'roundTripMs'> | undefined): string {
  switch (live?.phase) {
    case undefined:
      return 'Nothing chosen';
    case 'pending':
      return 'Sending…';
    case 'acked':
      return live.roundTripMs === undefined ? 'Robot has it' : `Robot has it · ${Math.round(live.roundTripMs)} ms`;
    case 'stale':
      return 'No answer from robot';
    case 'lost':
      return 'Link lost · resends';
    case 'refused':
      return 'Refused';
  }
}

/** The theme colour a phase is drawn in. */
export function phaseColour(phase: SelectionPhase | undefined): ThemeColour {
  switch (phase) {
    case 'acked':
      return 'ok';
    case 'stale':
      return 'warn';
    case 'lost':
    case 'refused':
      return 'danger';
    default:
      return 'muted';
  }
}

/** True for a value that reads as "on": true, a non-zero number, or "true"/"on". */
export function isOn(value: ChannelValue | undefined): boolean {
  if (typeof value === 'boolean') return value;
  if (typeof value === 'number') return value !== 0;
  if (typeof value === 'string') return value === 'true' || value === 'on';
  return false;
}

/** Columns for `count` options in a box of `aspect`: one row when wide, one column when tall, a grid between. */
export function optionColumns(count: number, aspect: number): number {
  if (count <= 1) return 1;
  let best = { columns: 1, score: -Infinity };
  for (let columns = 1; columns <= count; columns += 1) {
    const rows = Math.ceil(count / columns);
    // The most square cells win: each option's shortest side as a share of the box.
    const score = Math.min(aspect / columns, 1 / rows) - (columns * rows - count) * 0.01;
    if (score > best.score) best = { columns, score };
  }
  return best.columns;
}
