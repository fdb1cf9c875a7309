import { useMemo } from 'react';
import type { SeasonProfile } from '../../../shared/domain/season/season-profile';
import type { Theme, TileOf } from '../../../shared/schemas/panel';
import { PhaseChip } from './phase-chip';
import { pressHandlers } from './press-target';
import { reefPickerLayout, ringSectorPath } from './reef-picker-layout';
import { TileHeading } from './tile-frame';
import type { ChannelLive, TileSeat } from './tile-types';

type ReefPickerTileProps = {
  tile: TileOf<'reef-picker'>;
  theme: Theme;
  season: SeasonProfile | undefined;
  seat: TileSeat;
  isDesign: boolean;
  canWrite: boolean;
  live: ChannelLive | undefined;
  onChoose?: (letter: string) => void;
};

const RING_OUTER_M = 2.05;
const RING_GAP_M = 0.14;
const SECTOR_GAP_DEG = 1.6;
const LETTER_M = 0.4;
const FACE_LABEL_M = 0.17;
/** Long labels ("10 o'clock", "near right") shrink to about this width so they stay clear of the branches. */
const FACE_LABEL_WIDTH_M = 0.72;

/**
 * The alliance's real reef (hexagon and branch positions from the season profile), turned to the operator's
 * view, ringed by twelve big branch buttons: each owns the ring sector on its side of its face.
 */
export function ReefPickerTile({ tile, theme, season, seat, isDesign, canWrite, live, onChoose }: ReefPickerTileProps) {
  const layout = useMemo(
    () => (season ? reefPickerLayout(season, seat.alliance, seat.driverStation, tile.orientation, tile.labelScheme) : undefined),
    [season, seat.alliance, seat.driverStation, tile.orientation, tile.labelScheme],
  );
  const chosen = live?.value;
  const isLive = !isDesign && canWrite;
  const seatText = `${seat.alliance === 'red' ? 'Red' : 'Blue'} ${seat.driverStation}`;
  return (
    <>
      <TileHeading
        label={tile.label}
        ink={theme[tile.ink]}
        aside={isDesign || chosen === undefined ? <span className="normal-case opacity-70">{seatText} view</span> : <PhaseChip live={live} theme={theme} />}
      />
      <div className="flex min-h-0 flex-1 items-center justify-center p-[2cqmin]">
        {layout ? (
          <svg
            role="group"
            aria-label={`${tile.label || 'Reef'}: branches as seen from ${seatText}`}
            viewBox={`${-RING_OUTER_M} ${-RING_OUTER_M} ${2 * RING_OUTER_M} ${2 * RING_OUTER_M}`}
            className="block h-full max-h-full w-full max-w-full touch-none select-none"
            data-alliance={layout.alliance}
          >
            <polygon
              points={layout.outline.map((p) => `${p.xM},${-p.yM}`).join(' ')}
              fill={theme.surface}
              stroke={theme.muted}
              strokeWidth={0.035}
              strokeLinejoin="round"
            />
            {layout.faces.map((f) => {
              const rad = (f.normalDeg * Math.PI) / 180;
              const r = season!.reefs[layout.alliance].centreToFaceM.value * (f.label.length > 4 ? 0.56 : 0.62);
              return (
                <text
                  key={f.faceIndex}
                  x={r * Math.cos(rad)}
                  y={-r * Math.sin(rad)}
                  fontSize={Math.min(FACE_LABEL_M, FACE_LABEL_WIDTH_M / (0.55 * f.label.length))}
                  textAnchor="middle"
                  dominantBaseline="central"
                  fill={f.isNear ? theme.text : theme.muted}
                  fontWeight={f.isNear ? 700 : 500}
                  data-near-face={f.isNear || undefined}
                  className="pointer-events-none"
                >
                  {f.label}
                </text>
              );
            })}
            {layout.branches.map((b) => {
              const isActive = chosen === b.letter;
              const innerR = layout.circumradiusM + RING_GAP_M;
              const mid = (b.fromDeg + b.toDeg) / 2;
              const labelR = (innerR + RING_OUTER_M) / 2;
              const rad = (mid * Math.PI) / 180;
              return (
                <g
                  key={b.letter}
                  role="button"
                  aria-label={`Branch ${b.letter}`}
                  aria-pressed={isActive}
                  aria-disabled={!isDesign && !canWrite ? true : undefined}
                  tabIndex={isLive ? 0 : -1}
                  data-branch={b.letter}
                  data-active={isActive || undefined}
                  className={`cursor-pointer outline-none data-pressed:brightness-150 ${!isDesign && !canWrite ? 'opacity-45' : ''} [&:focus-visible>path]:stroke-[0.06]`}
                  {...pressHandlers(isLive, () => onChoose?.(b.letter))}
                >
                  <path
                    d={ringSectorPath(b.fromDeg + SECTOR_GAP_DEG / 2, b.toDeg - SECTOR_GAP_DEG / 2, innerR, RING_OUTER_M - 0.02)}
                    fill={isActive ? theme.accent : theme.canvas}
                    stroke={isActive ? theme.text : theme.muted}
                    strokeWidth={isActive ? 0.05 : 0.02}
                  />
                  <text
                    x={labelR * Math.cos(rad)}
                    y={-labelR * Math.sin(rad)}
                    fontSize={LETTER_M}
                    fontWeight={700}
                    textAnchor="middle"
                    dominantBaseline="central"
                    fill={isActive ? theme.accentText : theme.text}
                    className="pointer-events-none"
                  >
                    {b.letter}
                  </text>
                  <line
                    x1={b.atM.xM}
                    y1={-b.atM.yM}
                    x2={innerR * Math.cos((b.angleDeg * Math.PI) / 180)}
                    y2={-innerR * Math.sin((b.angleDeg * Math.PI) / 180)}
                    stroke={isActive ? theme.accent : theme.muted}
                    strokeWidth={isActive ? 0.05 : 0.02}
                    className="pointer-events-none"
                  />
                  <circle cx={b.atM.xM} cy={-b.atM.yM} r={0.07} fill={isActive ? theme.accent : theme.muted} className="pointer-events-none" />
                </g>
              );
            })}
          </svg>
        ) : (
          <span className="text-[clamp(12px,5cqmin,18px)] opacity-70">Loading the reef…</span>
        )}
      </div>
    </>
  );
}
