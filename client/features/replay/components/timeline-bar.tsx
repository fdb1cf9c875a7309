import { useEffect, useRef, useState, type PointerEvent } from 'react';
import { PLAYBACK_SPEEDS } from '../../../../shared/domain/timeline';
import type { Note } from '../../../../shared/schemas/note';
import { Button } from '../../../components/ui/button';
import { cx } from '../../../lib/cx';
import { useReplay, useReplayStore } from '../hooks/use-replay';
import { formatCursor, MARK_COLOURS, MARK_KINDS, markAtOrBefore, type EventMark } from '../model/replay-view';

export const SHORTCUTS: { keys: string[]; what: string }[] = [
  { keys: ['Space'], what: 'play or pause' },
  { keys: ['←', '→'], what: 'one tick (20 ms)' },
  { keys: ['Shift', '←/→'], what: 'one second' },
  { keys: ['[', ']'], what: 'previous or next event' },
  { keys: [',', '.'], what: 'slower or faster' },
];

type TimelineBarProps = {
  marks: readonly EventMark[];
  notes: readonly Note[];
  onStep: (ticks: number) => void;
  onJump: (direction: 1 | -1) => void;
  onCopyLink: () => Promise<boolean>;
};

/** Transport, the cursor time, and the scrub bar with the event strip and notes. */
export function TimelineBar({ marks, notes, onStep, onJump, onCopyLink }: TimelineBarProps) {
  const store = useReplayStore();
  const isPlaying = useReplay((s) => s.isPlaying);
  const speed = useReplay((s) => s.speed);
  const durationS = useReplay((s) => s.durationS);
  const [copy, setCopy] = useState<'idle' | 'copied' | 'failed'>('idle');
  useEffect(() => {
    if (copy === 'idle') return;
    const timer = setTimeout(() => setCopy('idle'), 2000);
    return () => clearTimeout(timer);
  }, [copy]);

  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-wrap items-center gap-x-5 gap-y-3">
        <div className="flex items-center gap-1.5" role="group" aria-label="Playback">
          <Button variant="ghost" size="sm" onClick={() => onJump(-1)} aria-label="Previous event" title="Previous event ( [ )">
            <Glyph d="M6 5v14M18 5 9 12l9 7z" />
          </Button>
          <Button variant="ghost" size="sm" onClick={() => onStep(-1)} aria-label="Back one tick" title="Back one tick (←)">
            −1
          </Button>
          <Button variant="primary" onClick={() => store.toggle()} aria-label={isPlaying ? 'Pause' : 'Play'} className="w-28">
            {isPlaying ? <Glyph d="M7 5h3v14H7zM14 5h3v14h-3z" isFilled /> : <Glyph d="M7 5l12 7-12 7z" isFilled />}
            {isPlaying ? 'Pause' : 'Play'}
          </Button>
          <Button variant="ghost" size="sm" onClick={() => onStep(1)} aria-label="Forward one tick" title="Forward one tick (→)">
            +1
          </Button>
          <Button variant="ghost" size="sm" onClick={() => onJump(1)} aria-label="Next event" title="Next event ( ] )">
            <Glyph d="M18 5v14M6 5l9 7-9 7z" />
          </Button>
        </div>
        <CursorReadout durationS={durationS} />
        <label className="flex items-center gap-2 text-sm text-asphalt-300">
          Speed
          <select
            value={speed}
            onChange={(e) => store.setSpeed(Number(e.target.value))}
            className="num min-h-11 rounded-lg bg-asphalt-900 px-3 text-asphalt-100 ring-1 ring-asphalt-600 ring-inset"
          >
            {PLAYBACK_SPEEDS.map((s) => (
              <option key={s} value={s}>
                {s}×
              </option>
            ))}
          </select>
        </label>
        <div className="ml-auto flex items-center gap-2">
          <span aria-live="polite" className="text-sm text-asphalt-300">
            {copy === 'copied' && 'Link copied'}
            {copy === 'failed' && 'Couldn’t copy; the address bar has the link'}
          </span>
          <Button size="sm" onClick={async () => setCopy((await onCopyLink()) ? 'copied' : 'failed')}>
            Copy link to this moment
          </Button>
        </div>
      </div>
      <ScrubBar marks={marks} notes={notes} />
      <div className="flex flex-wrap items-center justify-between gap-x-6 gap-y-2">
        <ul className="flex flex-wrap gap-x-4 gap-y-1 text-xs text-asphalt-400" aria-label="Event strip key">
          {MARK_KINDS.filter((k) => marks.some((m) => m.kind === k.kind)).map((k) => (
            <li key={k.kind} className="flex items-center gap-1.5">
              <span aria-hidden="true" className="h-3 w-1 rounded-full" style={{ backgroundColor: k.colour }} />
              {k.label}
            </li>
          ))}
          {notes.length > 0 && (
            <li className="flex items-center gap-1.5">
              <span aria-hidden="true" className="size-2 rotate-45 bg-signal-300" />
              Notes
            </li>
          )}
        </ul>
        <ul className="flex flex-wrap gap-x-4 gap-y-1 text-xs text-asphalt-400" aria-label="Keyboard shortcuts">
          {SHORTCUTS.map((s) => (
            <li key={s.what} className="flex items-center gap-1">
              {s.keys.map((k) => (
                <kbd key={k} className="rounded bg-asphalt-750 px-1.5 py-0.5 text-2xs text-asphalt-200 ring-1 ring-asphalt-600">
                  {k}
                </kbd>
              ))}
              <span className="ml-0.5">{s.what}</span>
            </li>
          ))}
        </ul>
      </div>
    </div>
  );
}

function CursorReadout({ durationS }: { durationS: number }) {
  const tS = useReplay((s) => s.tS);
  const { seconds, clock } = formatCursor(tS);
  return (
    <p className="flex items-baseline gap-3">
      <span className="num text-2xl font-semibold text-asphalt-100" data-testid="cursor-time" aria-label="Cursor time">
        {seconds}
      </span>
      <span className="num text-sm text-asphalt-400">
        {clock} / {formatCursor(durationS).clock}
      </span>
    </p>
  );
}

/** The whole recording as a bar: event marks below, notes above, a thumb at the cursor; drag or click to move it. */
function ScrubBar({ marks, notes }: { marks: readonly EventMark[]; notes: readonly Note[] }) {
  const store = useReplayStore();
  const trackRef = useRef<HTMLDivElement>(null);
  const thumbRef = useRef<HTMLDivElement>(null);
  const windowRef = useRef<HTMLDivElement>(null);
  const lastRef = useRef<HTMLParagraphElement>(null);
  const durationS = useReplay((s) => s.durationS) || 1;
  const pct = (tS: number) => `${(Math.min(Math.max(tS / durationS, 0), 1) * 100).toFixed(3)}%`;

  // The thumb, the window band and the "last event" line follow the cursor without re-rendering the bar.
  useEffect(() => {
    const place = () => {
      const { tS, window } = store.get();
      if (thumbRef.current) {
        thumbRef.current.style.left = pct(tS);
        trackRef.current?.setAttribute('aria-valuenow', tS.toFixed(2));
        trackRef.current?.setAttribute('aria-valuetext', formatCursor(tS).seconds);
      }
      if (windowRef.current) {
        windowRef.current.style.left = pct(window.fromS);
        windowRef.current.style.width = `${(((window.toS - window.fromS) / durationS) * 100).toFixed(3)}%`;
      }
      if (lastRef.current) {
        const last = markAtOrBefore(marks, tS);
        lastRef.current.textContent = last ? `${formatCursor(last.tS).seconds} · ${last.label}` : 'No event yet';
      }
    };
    place();
    return store.subscribe(place);
    // pct depends only on durationS
  }, [store, marks, durationS]);

  const seekAt = (clientX: number) => {
    const rect = trackRef.current!.getBoundingClientRect();
    store.seek(((clientX - rect.left) / rect.width) * durationS);
  };
  const onPointerDown = (e: PointerEvent<HTMLDivElement>) => {
    if ((e.target as HTMLElement).closest('button')) return;
    e.currentTarget.setPointerCapture(e.pointerId);
    store.pause();
    seekAt(e.clientX);
  };
  const onPointerMove = (e: PointerEvent<HTMLDivElement>) => {
    if (e.currentTarget.hasPointerCapture(e.pointerId)) seekAt(e.clientX);
  };

  return (
    <div>
      <div
        ref={trackRef}
        role="slider"
        tabIndex={-1}
        aria-label="Timeline"
        aria-valuemin={0}
        aria-valuemax={Number(durationS.toFixed(2))}
        className="relative h-16 cursor-pointer touch-none rounded-lg bg-asphalt-900 ring-1 ring-asphalt-750 select-none"
        onPointerDown={onPointerDown}
        onPointerMove={onPointerMove}
      >
        <div ref={windowRef} aria-hidden="true" className="pointer-events-none absolute inset-y-0 rounded-lg bg-asphalt-700/40" />
        <div aria-hidden="true" className="pointer-events-none absolute inset-x-0 top-1/2 h-px bg-asphalt-700" />
        {notes.map((n) => (
          <button
            key={n.id}
            type="button"
            title={`${formatCursor(n.tS).seconds} · ${n.authorName}: ${n.text}`}
            aria-label={`Note at ${formatCursor(n.tS).seconds} by ${n.authorName}`}
            onClick={() => store.seek(n.tS)}
            className="absolute top-1 size-3 -translate-x-1/2 rotate-45 rounded-[2px] bg-signal-300 ring-2 ring-asphalt-900 hover:bg-signal-200"
            style={{ left: pct(n.tS) }}
          />
        ))}
        {marks.map((m) => (
          <button
            key={`${m.seq}-${m.kind}`}
            type="button"
            title={`${formatCursor(m.tS).seconds} · ${m.label}`}
            aria-label={`${m.label} at ${formatCursor(m.tS).seconds}`}
            data-mark={m.kind}
            onClick={() => store.seek(m.tS)}
            className={cx('absolute bottom-1.5 w-1 -translate-x-1/2 rounded-full opacity-85 hover:opacity-100 hover:ring-2 hover:ring-asphalt-100', m.kind === 'mode' ? 'h-8' : 'h-5')}
            style={{ left: pct(m.tS), backgroundColor: MARK_COLOURS[m.kind] }}
          />
        ))}
        <div ref={thumbRef} aria-hidden="true" className="pointer-events-none absolute inset-y-[-4px] w-0.5 -translate-x-1/2 bg-signal-400 shadow-[0_0_0_3px_rgb(245_163_15/0.25)]">
          <span className="absolute -top-1 left-1/2 size-2.5 -translate-x-1/2 rounded-full bg-signal-400" />
        </div>
      </div>
      <p ref={lastRef} className="mt-1.5 truncate text-sm text-asphalt-300" aria-live="off" data-testid="last-event" />
    </div>
  );
}

function Glyph({ d, isFilled = false }: { d: string; isFilled?: boolean }) {
  return (
    <svg viewBox="0 0 24 24" aria-hidden="true" className="size-4" fill={isFilled ? 'currentColor' : 'none'} stroke="currentColor" strokeWidth={2} strokeLinejoin="round" strokeLinecap="round">
      <path d={d} />
    </svg>
  );
}
