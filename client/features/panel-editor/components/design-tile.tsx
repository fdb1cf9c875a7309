import { memo, type CSSProperties, type KeyboardEvent, type PointerEvent } from 'react';
import type { ResizeHandle } from '../../../../shared/domain/panels/layout';
import { TILE_CATALOGUE } from '../../../../shared/domain/panels/tile-catalogue';
import type { Device, Grid, Theme, Tile } from '../../../../shared/schemas/panel';
import { TileView } from '../../../components/panel-tiles/tile-view';
import { cx } from '../../../lib/cx';

export type TileMark = { severity: 'error' | 'warning'; count: number } | null;

type DesignTileProps = {
  tile: Tile;
  theme: Theme;
  device: Device;
  grid: Grid;
  isSelected: boolean;
  /** Only the single selected tile shows resize handles. */
  hasHandles: boolean;
  mark: TileMark;
  /** Set only on the tiles being dragged: they follow the pointer by a transform, nothing else re-renders. */
  dragOffsetPx: { xPx: number; yPx: number } | null;
  canEdit: boolean;
  onTilePointerDown: (e: PointerEvent<HTMLElement>, tileId: string, handle: ResizeHandle | null) => void;
  onTileKeyDown: (e: KeyboardEvent<HTMLElement>, tileId: string) => void;
};

const HANDLES: { handle: ResizeHandle; className: string; cursor: string }[] = [
  { handle: 'nw', className: '-top-2 -left-2', cursor: 'nwse-resize' },
  { handle: 'n', className: '-top-2 left-1/2 -translate-x-1/2', cursor: 'ns-resize' },
  { handle: 'ne', className: '-top-2 -right-2', cursor: 'nesw-resize' },
  { handle: 'e', className: 'top-1/2 -right-2 -translate-y-1/2', cursor: 'ew-resize' },
  { handle: 'se', className: '-right-2 -bottom-2', cursor: 'nwse-resize' },
  { handle: 's', className: '-bottom-2 left-1/2 -translate-x-1/2', cursor: 'ns-resize' },
  { handle: 'sw', className: '-bottom-2 -left-2', cursor: 'nesw-resize' },
  { handle: 'w', className: 'top-1/2 -left-2 -translate-y-1/2', cursor: 'ew-resize' },
];

/**
 * One tile on the designer's canvas: the run-mode drawing (static, in design mode) under a focusable hit box
 * with the selection ring, resize handles and the panel check's mark. Memoised: a pointer move re-renders
 * only the tiles whose props change, which during a drag is the dragged ones.
 */
export const DesignTile = memo(function DesignTile({ dragOffsetPx, ...rest }: DesignTileProps) {
  const layer: CSSProperties | undefined = dragOffsetPx
    ? { transform: `translate3d(${dragOffsetPx.xPx}px, ${dragOffsetPx.yPx}px, 0)`, zIndex: 20, willChange: 'transform' }
    : undefined;
  // Only this wrapper's transform changes while the tile is dragged; its drawing is memoised below.
  return (
    <div className={cx('pointer-events-none absolute inset-0', dragOffsetPx && 'opacity-90')} style={layer}>
      <DesignTileBody {...rest} />
    </div>
  );
});

const DesignTileBody = memo(function DesignTileBody({
  tile,
  theme,
  device,
  grid,
  isSelected,
  hasHandles,
  mark,
  canEdit,
  onTilePointerDown,
  onTileKeyDown,
}: Omit<DesignTileProps, 'dragOffsetPx'>) {
  const box: CSSProperties = {
    left: `${(tile.x / grid.columns) * 100}%`,
    top: `${(tile.y / grid.rows) * 100}%`,
    width: `${(tile.w / grid.columns) * 100}%`,
    height: `${(tile.h / grid.rows) * 100}%`,
  };
  const kindLabel = TILE_CATALOGUE[tile.kind].label;
  const name = tile.label.trim() ? `${kindLabel} “${tile.label.trim()}”` : kindLabel;
  const where = `${tile.w} × ${tile.h} cells at column ${tile.x + 1}, row ${tile.y + 1}`;
  const problems = mark ? `, ${mark.count} ${mark.severity === 'error' ? 'problem' : 'warning'}${mark.count === 1 ? '' : 's'}` : '';
  return (
    <>
      <TileView tile={tile} theme={theme} device={device} grid={grid} mode="design" />
      <div
        role="button"
        tabIndex={0}
        aria-pressed={isSelected}
        aria-label={`${name}, ${where}${problems}`}
        data-design-tile={tile.id}
        data-selected={isSelected || undefined}
        data-issue={mark?.severity}
        className={cx(
          'pointer-events-auto absolute touch-none rounded-[10px] select-none',
          canEdit ? 'cursor-grab active:cursor-grabbing' : 'cursor-default',
          'focus-visible:outline-4 focus-visible:outline-offset-4 focus-visible:outline-sky',
          isSelected && 'ring-4 ring-signal-400',
          mark?.severity === 'error' && 'outline-3 outline-offset-2 outline-stop outline-dashed',
          mark?.severity === 'warning' && 'outline-3 outline-offset-2 outline-signal-600 outline-dashed',
        )}
        style={{ ...box, margin: grid.gapPx / 2, width: `calc(${box.width} - ${grid.gapPx}px)`, height: `calc(${box.height} - ${grid.gapPx}px)` }}
        onPointerDown={(e) => onTilePointerDown(e, tile.id, null)}
        onKeyDown={(e) => onTileKeyDown(e, tile.id)}
      >
        {mark && (
          <span
            aria-hidden="true"
            className={cx(
              'num absolute -top-3 -right-3 grid h-7 min-w-7 place-items-center rounded-full px-1.5 text-sm font-bold shadow-lg ring-2 ring-asphalt-950',
              mark.severity === 'error' ? 'bg-stop text-asphalt-950' : 'bg-signal-400 text-asphalt-950',
            )}
          >
            {mark.count}
          </span>
        )}
        {hasHandles &&
          canEdit &&
          HANDLES.map((h) => (
            <span
              key={h.handle}
              data-handle={h.handle}
              aria-hidden="true"
              className={cx('absolute size-4 rounded-[3px] bg-signal-400 ring-2 ring-asphalt-950', h.className)}
              style={{ cursor: h.cursor }}
              onPointerDown={(e) => {
                e.stopPropagation();
                onTilePointerDown(e, tile.id, h.handle);
              }}
            />
          ))}
      </div>
    </>
  );
});
