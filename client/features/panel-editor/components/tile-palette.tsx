import { useDraggable } from '@dnd-kit/core';
import { PALETTE_GROUPS, TILE_CATALOGUE } from '../../../../shared/domain/panels/tile-catalogue';
import type { TileKind } from '../../../../shared/schemas/panel';
import { cx } from '../../../lib/cx';
import { KindGlyph } from './kind-glyph';

export const PALETTE_PREFIX = 'palette:';

/** Every tile kind, grouped as the catalogue orders them. Drag one onto the canvas, or press it to place it in the first free spot. */
export function TilePalette({ onAdd, isDisabled }: { onAdd: (kind: TileKind) => void; isDisabled: boolean }) {
  return (
    <nav aria-label="Tile palette" className="flex flex-col gap-4">
      {PALETTE_GROUPS.map((group) => (
        <section key={group.name} aria-label={group.name}>
          <h3 className="mb-1.5 px-1 text-2xs font-semibold tracking-[0.16em] text-asphalt-400 uppercase">{group.name}</h3>
          <ul className="flex flex-col gap-1">
            {group.kinds.map((kind) => (
              <li key={kind}>
                <PaletteItem kind={kind} onAdd={onAdd} isDisabled={isDisabled} />
              </li>
            ))}
          </ul>
        </section>
      ))}
    </nav>
  );
}

function PaletteItem({ kind, onAdd, isDisabled }: { kind: TileKind; onAdd: (kind: TileKind) => void; isDisabled: boolean }) {
  const entry = TILE_CATALOGUE[kind];
  const { attributes, listeners, setNodeRef, isDragging } = useDraggable({ id: `${PALETTE_PREFIX}${kind}`, data: { kind }, disabled: isDisabled });
  return (
    <button
      ref={setNodeRef}
      type="button"
      {...attributes}
      {...listeners}
      // dnd-kit's role="button" and description are for its keyboard sensor, which this palette does not use:
      // a press (Enter, Space or a tap) places the tile instead.
      role={undefined}
      aria-roledescription={undefined}
      aria-describedby={undefined}
      aria-label={`${entry.label}: ${entry.description} Press to place it, or drag it onto the canvas.`}
      data-palette-kind={kind}
      disabled={isDisabled}
      onClick={() => onAdd(kind)}
      title={entry.description}
      className={cx(
        'group flex min-h-11 w-full touch-manipulation items-center gap-2.5 rounded-lg px-2 py-1.5 text-left text-sm font-semibold text-asphalt-200 ring-1 ring-transparent transition-colors select-none ring-inset',
        'hover:bg-asphalt-750 hover:text-asphalt-100 hover:ring-asphalt-600 disabled:cursor-not-allowed disabled:opacity-50',
        isDragging ? 'cursor-grabbing bg-asphalt-750 opacity-50' : 'cursor-grab',
      )}
    >
      <KindGlyph kind={kind} />
      <span className="min-w-0 flex-1 truncate">{entry.label}</span>
      <span className="num text-2xs text-asphalt-500 group-hover:text-asphalt-400">
        {entry.defaultSize.w}×{entry.defaultSize.h}
      </span>
    </button>
  );
}

/** What follows the pointer while a palette item is dragged. */
export function PaletteDragChip({ kind }: { kind: TileKind }) {
  const entry = TILE_CATALOGUE[kind];
  return (
    <div className="pointer-events-none flex min-h-11 w-52 items-center gap-2.5 rounded-lg bg-asphalt-700 px-2.5 text-sm font-semibold text-asphalt-100 shadow-2xl ring-2 ring-signal-400">
      <KindGlyph kind={kind} />
      {entry.label}
      <span className="num ml-auto text-2xs text-signal-300">
        {entry.defaultSize.w}×{entry.defaultSize.h}
      </span>
    </div>
  );
}
