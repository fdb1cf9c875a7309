import type { ReactNode } from 'react';
import { can, type Role } from '../../../../shared/domain/roles';
import { Badge } from '../../../components/ui/badge';
import { EmptyState } from '../../../components/ui/empty-state';
import { PageHeader } from '../../../components/ui/page-header';
import { Section } from '../../../components/ui/section';
import { useRelay } from '../../../hooks/use-relay';
import { latencyStats } from '../../../lib/relay-client';
import { useNow } from '../hooks/use-now';
import {
  channelRows,
  followedRobot,
  isSimulated,
  isTelemetryPaused,
  readouts,
  relayNowMs,
  robotTarget,
  sendPermission,
} from '../model/live-view';
import { ChannelsTable } from './channels-table';
import { ClientsTable } from './clients-table';
import { EventsList } from './events-list';
import { LatencyCard } from './latency-card';
import { LinkPill, LinkStatus } from './link-status';
import { LiveField } from './live-field';
import { RecorderCard } from './recorder-card';
import { RobotReadouts } from './robot-readouts';
import { SimulatorBadge } from './simulator-badge';
import { TargetSender } from './target-sender';

type LivePageProps = {
  /** The member's team role, used until the relay's welcome confirms it. */
  memberRole: Role;
  /** The safety caution, shown above everything that can reach a robot. */
  safety: ReactNode;
};

/** The robot as the relay sees it right now, and a compact control to send it a target. */
export function LivePage({ memberRole, safety }: LivePageProps) {
  const { state, publish } = useRelay();
  const localNowMs = useNow(500);
  const nowOnRelayMs = relayNowMs(state, localNowMs);
  const ownSessionId = state.welcome?.sessionId;
  // Our own measure of the round trip, else the relay's of us.
  const ownRttMs = state.clock?.delayMs ?? state.clients?.find((c) => c.sessionId === ownSessionId)?.rttMs;
  const robot = followedRobot(state);
  const isPaused = isTelemetryPaused(robot?.telemetry, localNowMs);
  const target = robotTarget(state);
  const permission = sendPermission(state.welcome?.role ?? memberRole);
  const rows = channelRows(state, localNowMs);

  return (
    <>
      <PageHeader
        eyebrow="Relay"
        title="Live"
        actions={
          <div className="flex flex-wrap items-center gap-3">
            {state.status === 'open' && <LinkPill state={state} ownRttMs={ownRttMs} />}
            {robot && isSimulated(state) && <SimulatorBadge robot={robot.client.principal} />}
          </div>
        }
      />
      <div className="flex flex-col gap-5">
        {state.status !== 'open' && <LinkStatus state={state} ownRttMs={ownRttMs} localNowMs={localNowMs} />}
        {safety}
        {state.welcome && (
          <>
            <div className="grid items-start gap-5 lg:grid-cols-[minmax(0,1fr)_22rem]">
              <div className="flex min-w-0 flex-col gap-5">
                <Section
                  title={robot ? robot.client.principal : 'Robot'}
                  actions={
                    robot && (isPaused ? <Badge tone="signal">Telemetry paused</Badge> : <Badge tone="go">Telemetry live</Badge>)
                  }
                >
                  {robot ? (
                    <div className="flex flex-col gap-3">
                      <LiveField robot={robot.client.principal} telemetry={robot.telemetry} target={target} isPaused={isPaused} />
                      <RobotReadouts readouts={readouts(robot.telemetry)} target={target} />
                    </div>
                  ) : (
                    <EmptyState icon="robot" title="No robot is connected">
                      Start the simulator with <code className="text-signal-300">npm run sim</code>, or connect your robot with a
                      key from Team settings.
                    </EmptyState>
                  )}
                </Section>
                <Section title="Tap → ack" description="From this tab’s send to the robot’s acknowledgement, measured on this device.">
                  <LatencyCard stats={latencyStats(state.roundTripsMs, state.roundTripCount)} />
                </Section>
              </div>
              <div className="flex min-w-0 flex-col gap-5">
                <Section title="Send a target">
                  <TargetSender
                    permission={permission}
                    hasRobot={robot !== undefined}
                    current={(channel) => state.channels[channel]?.value}
                    track={(channel) => {
                      const id = state.latestPublish[channel];
                      return id === undefined ? undefined : state.publishes[id];
                    }}
                    onSend={(channel, value) => publish(channel, value)}
                  />
                </Section>
                <Section title="Recorder">
                  <RecorderCard canRecord={can(memberRole, 'recordings.manage')} />
                </Section>
              </div>
            </div>
            <div className="grid items-start gap-5 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
              <Section title="On the relay" description="The team’s panels, viewers and robots, with the relay’s round trip to each.">
                {state.clients ? (
                  <ClientsTable clients={state.clients} ownSessionId={ownSessionId} ownRttMs={ownRttMs} relayNowMs={nowOnRelayMs} />
                ) : (
                  <p className="text-[0.9375rem] text-asphalt-400">Waiting for the relay’s list…</p>
                )}
              </Section>
              <Section title="Robot events">
                <EventsList events={state.events} relayNowMs={nowOnRelayMs} />
              </Section>
            </div>
            <Section title="Channels" description="Every op/ and robot/ channel: its value, who set it, its age and whether a robot has it.">
              {rows.length > 0 ? (
                <ChannelsTable rows={rows} />
              ) : (
                <p className="text-[0.9375rem] text-asphalt-400">No channel has a value yet.</p>
              )}
            </Section>
          </>
        )}
      </div>
    </>
  );
}
