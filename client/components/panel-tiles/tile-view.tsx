import type { ChannelValue } from '../../../shared/protocol/messages';
import type { Device, Grid, Theme, Tile } from '../../../shared/schemas/panel';
import { OptionPickerTile } from './option-picker-tile';
import { LatchPadTile, PushPadTile } from './pad-tiles';
import { ReefPickerTile } from './reef-picker-tile';
import { LampTile, MatchClockTile, ReadoutTile } from './robot-value-tiles';
import { CaptionTile, TargetEchoTile } from './text-tiles';
import { TileFrame } from './tile-frame';
import type { ChannelLive, TileLive, TileSeat } from './tile-types';
import { useSeasonProfile } from './use-season-profile';

export type { ChannelLive, SelectionPhase, TileLive, TileSeat } from './tile-types';

export type TileViewProps = {
  tile: Tile;
  theme: Theme;
  device: Device;
  grid: Grid;
  /** `design`: drawn as it will look, static (no handlers, pointer-events none inside), channel names shown faintly. */
  mode: 'design' | 'run';
  /** Run mode's channel values and selection states. */
  live?: TileLive;
  /** Which alliance and driver station the reef picker is turned for; blue 1 when omitted. */
  seat?: TileSeat;
  /** Pointer-down (or Enter / Space) on a writing tile, with the value it writes. */
  onPress?(tile: Tile, value: ChannelValue): void;
  /** Release of a push pad, with `false`. */
  onRelease?(tile: Tile, value: ChannelValue): void;
};

const DEFAULT_SEAT: TileSeat = { alliance: 'blue', driverStation: 1 };
const NO_CHANNELS: Readonly<Record<string, ChannelLive | undefined>> = {};

/** The channels a tile writes or shows. */
export function tileChannels(tile: Tile): string[] {
  switch (tile.kind) {
    case 'caption':
      return [];
    case 'target-echo':
      return tile.channels;
    default:
      return [tile.channel];
  }
}

/** One tile of a panel, placed on its grid cells; the designer's canvas and run mode both draw tiles with it. */
export function TileView({ tile, theme, device, grid, mode, live, seat = DEFAULT_SEAT, onPress, onRelease }: TileViewProps) {
  const isDesign = mode === 'design';
  const channels = live?.channels ?? NO_CHANNELS;
  const canWrite = isDesign || (live?.canWrite ?? false);
  const channelLive = tile.kind === 'caption' || tile.kind === 'target-echo' ? undefined : channels[tile.channel];
  const deviceW = device.orientation === 'portrait' ? device.heightPx : device.widthPx;
  const deviceH = device.orientation === 'portrait' ? device.widthPx : device.heightPx;
  const aspect = (tile.w / grid.columns) * deviceW / ((tile.h / grid.rows) * deviceH);
  const press = (value: ChannelValue) => onPress?.(tile, value);
  const release = (value: ChannelValue) => onRelease?.(tile, value);
  return (
    <TileFrame
      tileId={tile.id}
      kind={tile.kind}
      x={tile.x}
      y={tile.y}
      w={tile.w}
      h={tile.h}
      grid={grid}
      theme={theme}
      fill={tile.fill}
      ink={tile.ink}
      isDesign={isDesign}
      channels={tileChannels(tile)}
      label={tile.label || tile.kind.replace('-', ' ')}
    >
      <TileBody tile={tile} theme={theme} isDesign={isDesign} canWrite={canWrite} aspect={aspect} live={channelLive} channels={channels} seat={seat} press={press} release={release} />
    </TileFrame>
  );
}

type TileBodyProps = {
  tile: Tile;
  theme: Theme;
  isDesign: boolean;
  canWrite: boolean;
  aspect: number;
  live: ChannelLive | undefined;
  channels: Readonly<Record<string, ChannelLive | undefined>>;
  seat: TileSeat;
  press: (value: ChannelValue) => void;
  release: (value: ChannelValue) => void;
};

function TileBody({ tile, theme, isDesign, canWrite, aspect, live, channels, seat, press, release }: TileBodyProps) {
  switch (tile.kind) {
    case 'reef-picker':
      return <ReefTile tile={tile} theme={theme} isDesign={isDesign} canWrite={canWrite} live={live} seat={seat} onChoose={press} />;
    case 'level-picker':
    case 'station-picker':
    case 'algae-picker':
    case 'cage-picker':
    case 'choice-pad':
      return <OptionPickerTile tile={tile} theme={theme} isDesign={isDesign} canWrite={canWrite} aspect={aspect} live={live} onChoose={press} />;
    case 'push-pad':
      return <PushPadTile tile={tile} theme={theme} isDesign={isDesign} canWrite={canWrite} live={live} onPress={press} onRelease={release} />;
    case 'latch-pad':
      return <LatchPadTile tile={tile} theme={theme} isDesign={isDesign} canWrite={canWrite} live={live} onPress={press} />;
    case 'lamp':
      return <LampTile tile={tile} theme={theme} isDesign={isDesign} live={live} />;
    case 'readout':
      return <ReadoutTile tile={tile} theme={theme} isDesign={isDesign} live={live} />;
    case 'match-clock':
      return <MatchClockTile tile={tile} theme={theme} isDesign={isDesign} live={live} />;
    case 'caption':
      return <CaptionTile tile={tile} />;
    case 'target-echo':
      return <TargetEchoTile tile={tile} theme={theme} isDesign={isDesign} channels={channels} />;
    default:
      return assertNever(tile);
  }
}

function ReefTile(props: Omit<Parameters<typeof ReefPickerTile>[0], 'season'>) {
  const season = useSeasonProfile();
  return <ReefPickerTile {...props} season={season.data} />;
}

function assertNever(value: never): never {
  throw new Error(`unknown tile kind ${JSON.stringify(value)}`);
}
