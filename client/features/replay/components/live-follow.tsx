import type { ComponentProps } from 'react';
import { useRelaySelector } from '../../../hooks/use-relay';
import { POSE_SIGNALS, type RelayState } from '../../../lib/relay-client';
import { Button } from '../../../components/ui/button';
import { useReplay, useReplayStore } from '../hooks/use-replay';
import { ReplayField, type LivePose } from './replay-field';

const STATUS_WORDS: Record<RelayState['status'], string> = {
  idle: 'relay starting',
  connecting: 'connecting to the relay',
  open: 'relay connected',
  stale: 'relay link stale',
  reconnecting: 'relay reconnecting',
  refused: 'the relay refused this session',
  stopped: 'relay stopped',
};

/** The banner of a recording still being made: what the page is doing and the way back to the newest moment. */
export function LiveBanner({ robot }: { robot: string }) {
  const store = useReplayStore();
  const isFollowing = useReplay((s) => s.isFollowing);
  const relayStatus = useRelaySelector((s) => s.status);
  const hasRobot = useRelaySelector((s) => s.robots[robot]?.latest !== undefined);
  return (
    <div
      role="status"
      data-live-banner={isFollowing ? 'following' : 'paused'}
      className="flex flex-wrap items-center gap-x-4 gap-y-2 rounded-xl bg-stop/10 px-4 py-3 ring-1 ring-stop/40 ring-inset"
    >
      <span className="inline-flex items-center gap-2 text-sm font-bold tracking-widest text-stop uppercase">
        <span aria-hidden="true" className="size-2.5 animate-pulse rounded-full bg-stop" />
        Live
      </span>
      <p className="min-w-0 flex-1 text-sm text-asphalt-200">
        {robot} is being recorded now. {isFollowing ? 'The timeline follows the newest moment' : 'You left the newest moment'}; the page
        becomes the finished recording when the match ends.{' '}
        <span className="text-asphalt-400">
          ({STATUS_WORDS[relayStatus]}
          {relayStatus === 'open' && !hasRobot ? ', no telemetry from the robot yet' : ''})
        </span>
      </p>
      <Button variant={isFollowing ? 'ghost' : 'primary'} size="sm" disabled={isFollowing} onClick={() => store.follow()}>
        {isFollowing ? 'Following live' : 'Back to live'}
      </Button>
    </div>
  );
}

type LiveFieldProps = Omit<ComponentProps<typeof ReplayField>, 'live'>;

/** The field map of a followed live recording: the robot's pose straight from the relay. */
export function LiveReplayField(props: LiveFieldProps) {
  const telemetry = useRelaySelector((s) => s.robots[props.robot]);
  const values = telemetry?.latest?.values;
  const x = values?.[POSE_SIGNALS.x];
  const y = values?.[POSE_SIGNALS.y];
  const live: LivePose | undefined =
    x !== undefined && y !== undefined
      ? { xM: x, yM: y, headingDeg: values?.[POSE_SIGNALS.heading] ?? 0, trail: telemetry!.trail.map((p) => ({ xM: p.xM, yM: p.yM })) }
      : undefined;
  return <ReplayField {...props} live={live} />;
}
