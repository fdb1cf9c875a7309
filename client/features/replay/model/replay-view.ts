// Pure: what the replay shows of a recording's events, signals and notes.
import type { Signal } from '../../../../shared/protocol/messages';
import type { RecordingEvent } from '../../../../shared/schemas/recording';
import { lowerBound } from '../../../../shared/domain/timeline';

export type MarkKind = 'call' | 'mode' | 'acquire' | 'place' | 'miss' | 'fault' | 'other';
export type EventMark = { seq: number; tS: number; kind: MarkKind; label: string };

export const MARK_KINDS: { kind: MarkKind; label: string; colour: string }[] = [
  { kind: 'call', label: 'Selections and calls', colour: '#56B4E9' },
  { kind: 'mode', label: 'Mode changes', colour: '#AEB7C1' },
  { kind: 'acquire', label: 'Acquisitions', colour: '#F5A30F' },
  { kind: 'place', label: 'Placements', colour: '#2FBF8F' },
  { kind: 'miss', label: 'Misses', colour: '#FF7A59' },
  { kind: 'fault', label: 'Faults', colour: '#E069A8' },
  { kind: 'other', label: 'Other', colour: '#8893A0' },
];
export const MARK_COLOURS = Object.fromEntries(MARK_KINDS.map((k) => [k.kind, k.colour])) as Record<MarkKind, string>;

const text = (v: unknown) => (v === null || v === undefined ? '' : String(v));

/** The event strip: one mark per event worth seeing (acknowledgements are left out: one per tap). */
export function eventMarks(events: readonly RecordingEvent[]): EventMark[] {
  const marks: EventMark[] = [];
  for (const e of events) {
    const d = e.data ?? {};
    const at = (kind: MarkKind, label: string) => marks.push({ seq: e.seq, tS: e.tS, kind, label });
    switch (e.kind) {
      case 'ack':
        break;
      case 'selection':
        at('call', `Operator chose ${text(d.value)} on ${text(d.channel).replace(/^op\//, '')}`);
        break;
      case 'target_changed':
        at('call', `Target now ${[d.branch, d.level, d.station, d.algae, d.cage].filter((v) => v !== null && v !== undefined && v !== 'none').join(' ') || 'none'}`);
        break;
      case 'mode_changed':
        at('mode', `Mode ${text(d.from)} → ${text(d.to)}`);
        break;
      case 'acquired':
        at('acquire', `Acquired ${text(d.piece)}${d.station ? ` at ${text(d.station)}` : ''}`);
        break;
      case 'placed':
        at('place', `Placed on ${text(d.branch)} ${text(d.level)}`);
        break;
      case 'algae_scored':
        at('place', `Algae scored in the ${text(d.where)}`);
        break;
      case 'missed':
        at('miss', `Missed ${text(d.branch)} ${text(d.level)}`);
        break;
      case 'brownout':
        at('fault', `Brownout at ${text(d.voltageV)} V`);
        break;
      default:
        at('other', e.kind.replaceAll('_', ' '));
    }
  }
  return marks.sort((a, b) => a.tS - b.tS || a.seq - b.seq);
}

/** What the robot was told to go for at tS: the branch and level of the last target_changed at or before it. */
export function calledTarget(events: readonly RecordingEvent[], tS: number): { branch: string; level: string | null } | null {
  for (let i = events.length - 1; i >= 0; i--) {
    const e = events[i]!;
    if (e.tS > tS || e.kind !== 'target_changed') continue;
    const branch = e.data?.branch;
    return typeof branch === 'string' ? { branch, level: typeof e.data?.level === 'string' ? e.data.level : null } : null;
  }
  return null;
}

/** The places reached up to tS: every placed event's branch and level, newest last. */
export function placesReached(events: readonly RecordingEvent[], tS: number): { seq: number; branch: string; level: string }[] {
  return events
    .filter((e) => e.kind === 'placed' && e.tS <= tS && typeof e.data?.branch === 'string')
    .map((e) => ({ seq: e.seq, branch: String(e.data!.branch), level: text(e.data!.level) }));
}

/** The latest mark at or before tS, for the "last event" readout. */
export function markAtOrBefore(marks: readonly EventMark[], tS: number): EventMark | null {
  const i = lowerBound(marks.map((m) => m.tS), tS + 1e-9) - 1;
  return i >= 0 ? marks[i]! : null;
}

export type SignalGroup = { path: string; signals: Signal[]; groups: SignalGroup[] };

/** The signal tree, grouped by the `/` path, filtered by a search (every word must appear in the name). */
export function signalTree(signals: readonly Signal[], search: string): SignalGroup {
  const words = search.toLowerCase().split(/\s+/).filter(Boolean);
  const root: SignalGroup = { path: '', signals: [], groups: [] };
  for (const s of signals) {
    const name = s.name.toLowerCase();
    if (!words.every((w) => name.includes(w))) continue;
    const parts = s.name.split('/');
    let group = root;
    for (let i = 0; i < parts.length - 1; i++) {
      const path = parts.slice(0, i + 1).join('/');
      let child = group.groups.find((g) => g.path === path);
      if (!child) {
        child = { path, signals: [], groups: [] };
        group.groups.push(child);
      }
      group = child;
    }
    group.signals.push(s);
  }
  return root;
}

/** A value of a signal as a person reads it: enum labels, yes/no, or the number with its unit. */
export function formatSignalValue(signal: Pick<Signal, 'type' | 'unit' | 'labels'>, value: number | null): string {
  if (value === null) return '—';
  if (signal.type === 'enum') return signal.labels?.[Math.round(value)] ?? String(value);
  if (signal.type === 'boolean') return value ? 'yes' : 'no';
  const digits = Math.abs(value) >= 100 ? 1 : Math.abs(value) >= 10 ? 2 : 3;
  return `${value.toFixed(digits)}${signal.unit ? ` ${signal.unit}` : ''}`;
}

/** Cursor time as the replay shows it: seconds with two decimals and the match clock, e.g. "93.20 s · 1:33.2". */
export function formatCursor(tS: number): { seconds: string; clock: string } {
  const m = Math.floor(tS / 60);
  const s = tS - m * 60;
  return { seconds: `${tS.toFixed(2)} s`, clock: `${m}:${s.toFixed(1).padStart(4, '0')}` };
}
