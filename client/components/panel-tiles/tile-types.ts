import type { ChannelValue } from '../../../shared/protocol/messages';
import type { Alliance, DriverStation } from '../../../shared/domain/season/season-profile';

/** Where one of our selections stands: sent, the robot acknowledged it, no answer in time, the link went down, or refused. */
export type SelectionPhase = 'pending' | 'acked' | 'stale' | 'lost' | 'refused';

/** What run mode knows about one channel a tile shows or writes. */
export type ChannelLive = {
  /** The current value: our selection (shown at once, before the robot answers) or the robot's value. */
  value?: ChannelValue;
  /** Our selections only. */
  phase?: SelectionPhase;
  /** Our send → the robot's ack reaching us. */
  roundTripMs?: number;
  /** Robot values: false when the robot link is down, so the tile greys the value out. */
  isFresh?: boolean;
};

/** Live data handed to tiles in run mode, by channel name. */
export type TileLive = {
  channels: Readonly<Record<string, ChannelLive | undefined>>;
  /** False while the relay is not open: writing tiles look disabled and do nothing. */
  canWrite: boolean;
};

/** The operator's place at run time; the reef picker turns to it. */
export type TileSeat = { alliance: Alliance; driverStation: DriverStation };
