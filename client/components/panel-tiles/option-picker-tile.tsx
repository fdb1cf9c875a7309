import type { CSSProperties } from 'react';
import type { Theme, TileOf, TileOption } from '../../../shared/schemas/panel';
import { PhaseChip } from './phase-chip';
import { PressTarget } from './press-target';
import { TileHeading } from './tile-frame';
import type { ChannelLive } from './tile-types';
import { optionColumns } from './tile-values';

type OptionTile = TileOf<'level-picker' | 'station-picker' | 'algae-picker' | 'cage-picker' | 'choice-pad'>;

type OptionPickerTileProps = {
  tile: OptionTile;
  theme: Theme;
  isDesign: boolean;
  canWrite: boolean;
  /** Tile width ÷ height in pixels: a tall tile stacks its options, a wide one lines them up. */
  aspect: number;
  live: ChannelLive | undefined;
  onChoose?: (value: string) => void;
};

/** Level, station, algae and cage pickers and the choice pad: one big segment per option. */
export function OptionPickerTile({ tile, theme, isDesign, canWrite, aspect, live, onChoose }: OptionPickerTileProps) {
  const columns = optionColumns(tile.options.length, aspect);
  const chosen = live?.value;
  return (
    <>
      <TileHeading label={tile.label} ink={theme[tile.ink]} aside={isDesign || chosen === undefined ? undefined : <PhaseChip live={live} theme={theme} />} />
      <div
        role="group"
        aria-label={tile.label || tile.channel}
        className="grid min-h-0 flex-1 gap-[2.5cqmin] p-[3cqmin]"
        style={{ gridTemplateColumns: `repeat(${columns}, minmax(0, 1fr))` }}
      >
        {tile.options.map((o: TileOption) => {
          const isActive = chosen === o.value;
          const style: CSSProperties = isActive
            ? { background: theme.accent, color: theme.accentText, boxShadow: `0 0 0 3px ${theme.text} inset` }
            : { background: theme.canvas, color: theme.text, boxShadow: `inset 0 0 0 1.5px ${theme.muted}` };
          return (
            <PressTarget
              key={o.value}
              label={`${tile.label ? `${tile.label} ` : ''}${o.label}`}
              isActive={isActive}
              isStatic={isDesign}
              isDisabled={!isDesign && !canWrite}
              onPress={() => onChoose?.(o.value)}
              className="flex min-h-0 min-w-0 touch-none items-center justify-center rounded-[clamp(4px,4cqmin,12px)] px-1 text-[clamp(14px,11cqmin,56px)] leading-none font-bold select-none disabled:opacity-45 data-pressed:scale-[0.96] data-pressed:brightness-125"
              style={style}
            >
              <span className="truncate">{o.label}</span>
            </PressTarget>
          );
        })}
      </div>
    </>
  );
}
