import type { Theme, TileOf } from '../../../shared/schemas/panel';
import { PhaseChip } from './phase-chip';
import { PressTarget } from './press-target';
import { isOn } from './tile-values';
import type { ChannelLive } from './tile-types';

type PadProps<K extends 'push-pad' | 'latch-pad'> = {
  tile: TileOf<K>;
  theme: Theme;
  isDesign: boolean;
  canWrite: boolean;
  live: ChannelLive | undefined;
  onPress?: (value: boolean) => void;
  onRelease?: (value: boolean) => void;
};

const padClass =
  'm-[3cqmin] flex min-h-0 flex-1 touch-none flex-col items-center justify-center gap-[3cqmin] rounded-[clamp(4px,5cqmin,14px)] px-2 text-center leading-none font-bold select-none disabled:opacity-45 data-pressed:scale-[0.97] data-pressed:brightness-125';

/** Momentary: `true` while held, `false` on release. */
export function PushPadTile({ tile, theme, isDesign, canWrite, live, onPress, onRelease }: PadProps<'push-pad'>) {
  const isHeld = isOn(live?.value);
  return (
    <PressTarget
      label={tile.label || tile.channel}
      isActive={isHeld}
      isStatic={isDesign}
      isDisabled={!isDesign && !canWrite}
      onPress={() => onPress?.(true)}
      onRelease={() => onRelease?.(false)}
      className={padClass}
      style={{ background: isHeld ? theme.accent : theme.canvas, color: isHeld ? theme.accentText : theme.text, boxShadow: `inset 0 0 0 2px ${theme.muted}` }}
    >
      <span className="text-[clamp(14px,14cqmin,48px)]">{tile.label || 'Hold'}</span>
      <span className="text-[clamp(10px,6cqmin,16px)] font-semibold tracking-wide uppercase opacity-75">{isHeld ? 'held' : 'hold to send'}</span>
    </PressTarget>
  );
}

/** On/off: each tap flips the value. */
export function LatchPadTile({ tile, theme, isDesign, canWrite, live, onPress }: PadProps<'latch-pad'>) {
  const isLatched = isOn(live?.value);
  return (
    <PressTarget
      label={tile.label || tile.channel}
      isActive={isLatched}
      isStatic={isDesign}
      isDisabled={!isDesign && !canWrite}
      onPress={() => onPress?.(!isLatched)}
      className={padClass}
      style={{ background: isLatched ? theme.accent : theme.canvas, color: isLatched ? theme.accentText : theme.text, boxShadow: `inset 0 0 0 2px ${theme.muted}` }}
    >
      <span className="text-[clamp(14px,14cqmin,48px)]">{tile.label || 'Latch'}</span>
      <span className="text-[clamp(11px,8cqmin,22px)] tracking-wider">{isLatched ? 'ON' : 'OFF'}</span>
      {!isDesign && live?.phase ? <PhaseChip live={live} theme={theme} /> : null}
    </PressTarget>
  );
}
