import type { TileKind } from '../../../../shared/schemas/panel';

/** A small drawn mark per tile kind, for the palette and lists (24 px viewBox, stroked). */
const GLYPHS: Record<TileKind, string> = {
  'reef-picker': 'M12 3 19.8 7.5v9L12 21l-7.8-4.5v-9zM12 8.5l3 1.75v3.5L12 15.5l-3-1.75v-3.5z',
  'level-picker': 'M6 4h12v3.5H6zM6 8.5h12V12H6zM6 13h12v3.5H6zM6 17.5h12V21H6z',
  'station-picker': 'M3 6h7v12H3zM14 6h7v12h-7z',
  'algae-picker': 'M12 4a8 8 0 1 0 0 16 8 8 0 0 0 0-16ZM8 12h8',
  'cage-picker': 'M5 4h14M7 4v16M12 4v16M17 4v16',
  'push-pad': 'M4 8h16v9H4zM8 12.5h8',
  'latch-pad': 'M3 9h18v6H3zM15 12a2 2 0 1 0 0 .01',
  'choice-pad': 'M4 5h7v6H4zM13 5h7v6h-7zM4 13h7v6H4zM13 13h7v6h-7z',
  lamp: 'M12 4a6 6 0 0 1 3.5 10.9V18h-7v-3.1A6 6 0 0 1 12 4ZM9.5 21h5',
  readout: 'M3 6h18v12H3zM7 15V9l-1.5 1.5M11 9h3v3h-3v3h3',
  'match-clock': 'M12 5a8 8 0 1 0 0 16 8 8 0 0 0 0-16ZM12 9v4l3 2M10 2h4',
  caption: 'M5 6h14M12 6v13M9 19h6',
  'target-echo': 'M12 3a9 9 0 1 0 0 18 9 9 0 0 0 0-18ZM12 8a4 4 0 1 0 0 8 4 4 0 0 0 0-8ZM12 12h.01',
};

export function KindGlyph({ kind }: { kind: TileKind }) {
  return (
    <span className="grid size-8 shrink-0 place-items-center rounded-md bg-asphalt-800 text-signal-400 ring-1 ring-asphalt-600">
      <svg viewBox="0 0 24 24" aria-hidden="true" className="size-5" fill="none" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" strokeLinejoin="round">
        <path d={GLYPHS[kind]} />
      </svg>
    </span>
  );
}
