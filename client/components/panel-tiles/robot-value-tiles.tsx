import type { Theme, TileOf } from '../../../shared/schemas/panel';
import { TileHeading } from './tile-frame';
import { formatClock, formatValue, isOn, readoutLevel, readoutWord } from './tile-values';
import type { ChannelLive } from './tile-types';

type RobotTileProps<K extends 'lamp' | 'readout' | 'match-clock'> = {
  tile: TileOf<K>;
  theme: Theme;
  isDesign: boolean;
  live: ChannelLive | undefined;
};

const hasValue = (live: ChannelLive | undefined) => live?.value !== undefined && live.value !== null;

/** A robot boolean as a light with its word beside it. */
export function LampTile({ tile, theme, isDesign, live }: RobotTileProps<'lamp'>) {
  const known = hasValue(live);
  const on = known && isOn(live?.value);
  const colour = known ? theme[on ? tile.onColour : tile.offColour] : theme.muted;
  const isDim = !isDesign && live?.isFresh === false;
  return (
    <div className="flex h-full items-center gap-[6cqmin] px-[6cqmin]" style={{ opacity: isDim ? 0.55 : 1 }} data-lamp={known ? (on ? 'on' : 'off') : 'unknown'}>
      <span
        aria-hidden="true"
        className="aspect-square h-[min(60cqh,40cqw)] shrink-0 rounded-full"
        style={{ background: colour, boxShadow: on ? `0 0 24px ${colour}, inset 0 0 0 3px ${theme.text}55` : `inset 0 0 0 3px ${theme.text}33` }}
      />
      <span className="flex min-w-0 flex-col gap-[2cqh]">
        <span className="truncate text-[clamp(12px,22cqh,28px)] leading-tight font-semibold">{tile.label || tile.channel}</span>
        <span className="text-[clamp(12px,26cqh,40px)] leading-none font-bold tracking-wider">{isDesign ? 'ON / OFF' : known ? (on ? 'ON' : 'OFF') : 'NO DATA'}</span>
      </span>
    </div>
  );
}

/** A robot number or text with its unit; past a threshold it turns warn / danger and says LOW or HIGH. */
export function ReadoutTile({ tile, theme, isDesign, live }: RobotTileProps<'readout'>) {
  const value = live?.value;
  const isNumber = typeof value === 'number' && Number.isFinite(value);
  const level = isNumber && tile.thresholds ? readoutLevel(value, tile.thresholds) : 'ok';
  const word = tile.thresholds ? readoutWord(level, tile.thresholds.direction) : null;
  const colour = level === 'ok' ? theme[tile.ink] : theme[level];
  const isDim = !isDesign && live?.isFresh === false;
  const text = isDesign ? (0).toFixed(tile.decimals) : formatValue(value, tile.decimals);
  return (
    <>
      <TileHeading label={tile.label} ink={theme[tile.ink]} aside={word ? <span className="rounded px-[0.4em] font-bold" style={{ background: colour, color: theme.canvas }}>{word}</span> : undefined} />
      <div className="flex min-h-0 flex-1 items-baseline justify-center gap-[2cqmin] px-[4cqmin] pb-[3cqmin]" style={{ opacity: isDim ? 0.55 : 1 }} data-level={level}>
        <span className="num self-center text-[clamp(18px,min(42cqh,24cqw),120px)] leading-none font-bold" style={{ color: colour }}>
          {text}
        </span>
        {tile.unit ? <span className="self-center text-[clamp(12px,min(18cqh,10cqw),40px)] font-semibold opacity-80">{tile.unit}</span> : null}
      </div>
    </>
  );
}

/** Seconds left in the match as m:ss. */
export function MatchClockTile({ tile, theme, isDesign, live }: RobotTileProps<'match-clock'>) {
  const value = live?.value;
  const seconds = typeof value === 'number' && Number.isFinite(value) ? value : undefined;
  const isDim = !isDesign && live?.isFresh === false;
  const isEnding = seconds !== undefined && seconds <= 20;
  return (
    <>
      <TileHeading label={tile.label} ink={theme[tile.ink]} />
      <div className="flex min-h-0 flex-1 items-center justify-center pb-[3cqmin]" style={{ opacity: isDim ? 0.55 : 1 }}>
        <span
          className="num text-[clamp(20px,min(55cqh,30cqw),160px)] leading-none font-bold"
          style={{ color: isEnding ? theme.warn : theme[tile.ink] }}
          aria-label={seconds === undefined ? 'Match clock: no data' : `${Math.ceil(seconds)} seconds left`}
        >
          {isDesign ? '2:15' : seconds === undefined ? '–:––' : formatClock(seconds)}
        </span>
      </div>
    </>
  );
}
