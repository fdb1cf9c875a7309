import type { CSSProperties, ReactNode } from 'react';
import type { Grid, Theme, ThemeColour } from '../../../shared/schemas/panel';

type TileFrameProps = {
  tileId: string;
  kind: string;
  x: number;
  y: number;
  w: number;
  h: number;
  grid: Grid;
  theme: Theme;
  fill: ThemeColour;
  ink: ThemeColour;
  isDesign: boolean;
  /** Channel names shown faintly in design mode. */
  channels: readonly string[];
  /** Accessible name of the tile's region. */
  label: string;
  children: ReactNode;
};

/**
 * A tile's box: placed on its grid cells as percentages of the canvas (so it fills any canvas size), inset by
 * half the gap on each side, and a size container so the renderers scale their type with the tile.
 */
export function TileFrame({ tileId, kind, x, y, w, h, grid, theme, fill, ink, isDesign, channels, label, children }: TileFrameProps) {
  const style: CSSProperties = {
    left: `${(x / grid.columns) * 100}%`,
    top: `${(y / grid.rows) * 100}%`,
    width: `${(w / grid.columns) * 100}%`,
    height: `${(h / grid.rows) * 100}%`,
    padding: grid.gapPx / 2,
  };
  return (
    <section
      aria-label={label}
      data-tile-id={tileId}
      data-tile-kind={kind}
      className="absolute box-border"
      style={style}
    >
      <div
        className={`relative flex h-full w-full flex-col overflow-hidden rounded-[clamp(6px,6cqmin,16px)] [container-type:size] ${isDesign ? 'pointer-events-none' : ''}`}
        style={{ background: theme[fill], color: theme[ink], boxShadow: `inset 0 0 0 1px ${theme.muted}33` }}
      >
        {children}
        {isDesign && channels.length > 0 ? (
          <span
            className="pointer-events-none absolute right-1.5 bottom-1 max-w-[90%] truncate font-mono text-[10px] leading-none opacity-60"
            style={{ color: theme[ink] }}
          >
            {channels.join(' · ')}
          </span>
        ) : null}
      </div>
    </section>
  );
}

/** The small heading line of a tile: its label and, in run mode, where its selection stands. */
export function TileHeading({ label, ink, aside }: { label: string; ink: string; aside?: ReactNode }) {
  if (!label && !aside) return null;
  return (
    <div className="flex min-h-0 shrink-0 items-center justify-between gap-2 px-[4cqmin] pt-[3cqmin] text-[clamp(11px,7cqmin,20px)] leading-tight font-semibold tracking-wide uppercase">
      <span className="truncate" style={{ color: ink }}>
        {label}
      </span>
      {aside}
    </div>
  );
}
