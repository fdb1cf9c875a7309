import type { Theme } from '../../../shared/schemas/panel';
import { phaseColour, phaseText } from './tile-values';
import type { ChannelLive } from './tile-types';

/** Where a selection stands, in words with a shaped mark (not colour alone). */
export function PhaseChip({ live, theme, size = 'small' }: { live: ChannelLive | undefined; theme: Theme; size?: 'small' | 'large' }) {
  const colour = theme[phaseColour(live?.phase)];
  const mark = live?.phase === 'acked' ? '✓' : live?.phase === 'pending' ? '…' : live?.phase ? '!' : '·';
  return (
    <span
      data-phase={live?.phase ?? 'none'}
      className={`inline-flex shrink-0 items-center gap-[0.4em] rounded-full font-semibold tracking-normal whitespace-nowrap normal-case ${size === 'large' ? 'px-[0.7em] py-[0.25em]' : 'px-[0.55em] py-[0.1em] text-[0.8em]'}`}
      style={{ color: colour, boxShadow: `inset 0 0 0 1.5px ${colour}` }}
    >
      <span aria-hidden="true" className="font-bold">
        {mark}
      </span>
      {phaseText(live)}
    </span>
  );
}
