import type { Theme, TileOf } from '../../../shared/schemas/panel';
import { PhaseChip } from './phase-chip';
import { TileHeading } from './tile-frame';
import { channelTitle, formatValue } from './tile-values';
import type { ChannelLive } from './tile-types';

const CAPTION_SIZE = { s: 'text-[clamp(12px,min(30cqh,9cqw),22px)]', m: 'text-[clamp(14px,min(40cqh,12cqw),34px)]', l: 'text-[clamp(18px,min(55cqh,16cqw),56px)]' } as const;

/** Fixed words on the panel. */
export function CaptionTile({ tile }: { tile: TileOf<'caption'> }) {
  return (
    <div className={`flex h-full items-center px-[5cqmin] leading-tight font-semibold ${CAPTION_SIZE[tile.size]}`}>
      <span className="line-clamp-3">{tile.text || tile.label}</span>
    </div>
  );
}

type TargetEchoTileProps = {
  tile: TileOf<'target-echo'>;
  theme: Theme;
  isDesign: boolean;
  channels: Readonly<Record<string, ChannelLive | undefined>>;
};

/** The current selection in large type, one part per channel, and whether the robot has each part. */
export function TargetEchoTile({ tile, theme, isDesign, channels }: TargetEchoTileProps) {
  const parts = tile.channels.map((channel) => ({ channel, live: channels[channel] }));
  const chosen = parts.filter((p) => p.live?.value !== undefined);
  const allAcked = chosen.length > 0 && chosen.every((p) => p.live?.phase === 'acked');
  const worst = chosen.find((p) => p.live?.phase === 'lost' || p.live?.phase === 'refused') ?? chosen.find((p) => p.live?.phase === 'stale') ?? chosen.find((p) => p.live?.phase === 'pending');
  // All parts acknowledged: the slowest round trip among those measured here (a retained value has none).
  const tripsMs = chosen.map((p) => p.live?.roundTripMs).filter((ms): ms is number => ms !== undefined);
  const summary: ChannelLive | undefined = allAcked ? { phase: 'acked', ...(tripsMs.length > 0 ? { roundTripMs: Math.max(...tripsMs) } : {}) } : worst?.live;
  return (
    <>
      <TileHeading label={tile.label} ink={theme[tile.ink]} aside={isDesign || chosen.length === 0 ? undefined : <PhaseChip live={summary} theme={theme} size="large" />} />
      <div className="flex min-h-0 flex-1 items-center justify-around gap-[3cqmin] px-[4cqmin] pb-[3cqmin]" data-testid="target-echo">
        {parts.map(({ channel, live }) => (
          <div key={channel} className="flex min-w-0 flex-col items-center gap-[1.5cqh]" data-channel={channel} data-phase={live?.phase ?? 'none'}>
            <span className="truncate text-[clamp(10px,min(13cqh,5cqw),20px)] font-semibold tracking-wide uppercase opacity-75">{channelTitle(channel)}</span>
            <span
              className="num text-[clamp(20px,min(46cqh,18cqw),140px)] leading-none font-bold"
              style={{ color: live?.phase === 'acked' ? theme[tile.ink] : live?.value === undefined ? theme.muted : theme.warn }}
            >
              {isDesign ? '·' : formatValue(live?.value)}
            </span>
          </div>
        ))}
      </div>
    </>
  );
}
