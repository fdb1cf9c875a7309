import { useQueries, useQuery } from '@tanstack/react-query';
import { useEffect, useMemo, useRef, useState, type ReactNode } from 'react';
import type { Role } from '../../../../shared/domain/roles';
import { adjacentMark, formatMoment, nextSpeed, parseMoment, stepTicks } from '../../../../shared/domain/timeline';
import type { Signal } from '../../../../shared/protocol/messages';
import type { RecordingDetail } from '../../../../shared/schemas/recording';
import { EmptyState } from '../../../components/ui/empty-state';
import { Loading } from '../../../components/ui/loading';
import { QueryError } from '../../../components/ui/query-error';
import { Section } from '../../../components/ui/section';
// The one component this feature takes from recordings: the details form saves with the recordings PATCH mutation.
import { samplesQuery, useEvents, useNotes, useRefreshReplay, useSignals } from '../api/replay';
import { ReplayContext, useReplay } from '../hooks/use-replay';
import { createReplayStore, type ReplayStore } from '../model/replay-store';
import { eventMarks } from '../model/replay-view';
import { LiveBanner, LiveReplayField } from './live-follow';
import { NotesPanel } from './notes-panel';
import { ReplayField } from './replay-field';
import { TimelineBar } from './timeline-bar';
import { TracePane } from './trace-pane';
import { ValuesTable } from './values-table';

const POSE = { x: 'drive/pose/x', y: 'drive/pose/y', heading: 'drive/pose/heading' };
const DEFAULT_PANES = [['drive/speed', 'drive/velocity/vx', 'drive/velocity/vy'], ['elevator/height', 'elevator/setpoint'], ['battery/voltage']];
const FIXED_VALUES = ['match/mode', 'state/machine', 'game/piece', 'target/branch', POSE.x, POSE.y, POSE.heading, 'battery/voltage'];
const URL_WRITE_MS = 300;

type ReplayPageProps = {
  recording: RecordingDetail;
  me: { name: string; role: Role };
  initialMoment: string | null;
  /** The recording's details, composed in by the route (they belong to the recordings feature). */
  details?: ReactNode;
  /** The cycles view, composed in by the route, given the timeline cursor to follow and move. */
  cycles?: (timeline: ReplayTimeline) => ReactNode;
};

export type ReplayTimeline = { now: () => number; subscribe: (listener: () => void) => () => void; seek: (tS: number) => void };

/** The replay of one recording: one timeline cursor drives the traces, the field map, the values and the notes. */
export function ReplayPage({ recording, me, initialMoment, details, cycles }: ReplayPageProps) {
  const isLive = recording.status === 'recording';
  const signals = useSignals(recording.id, isLive);
  const events = useEvents(recording.id, isLive);
  const [store] = useState(() =>
    createReplayStore(recording.durationS, parseMoment(initialMoment, recording.durationS) ?? 0, { isFollowing: isLive && initialMoment === null }),
  );
  useEffect(() => () => store.dispose(), [store]);
  useEffect(() => store.setDuration(recording.durationS), [store, recording.durationS]);
  // A live recording that ends becomes the finished recording in place: the cursor stays, the data is read again whole.
  const refresh = useRefreshReplay(recording.id);
  const wasLive = useRef(isLive);
  useEffect(() => {
    if (wasLive.current && !isLive) {
      store.stopFollowing();
      void refresh();
    }
    wasLive.current = isLive;
  }, [isLive, store, refresh]);

  if (signals.isPending || events.isPending) return <Loading label="Loading the signals and events…" />;
  if (signals.isError) return <QueryError title="Couldn’t load the signals" error={signals.error} onRetry={() => signals.refetch()} isRetrying={signals.isFetching} />;
  if (events.isError) return <QueryError title="Couldn’t load the events" error={events.error} onRetry={() => events.refetch()} isRetrying={events.isFetching} />;
  if (isLive && (signals.data.signals.length === 0 || recording.durationS <= 0)) {
    return (
      <div className="flex flex-col gap-5">
        <LiveBanner robot={recording.robot} />
        <Loading label={`Waiting for the first telemetry from ${recording.robot}…`} />
      </div>
    );
  }
  if (signals.data.signals.length === 0 || recording.durationS <= 0) {
    return (
      <EmptyState icon="recordings" title="Nothing to replay in this recording">
        It has no signals or lasts no time at all. A recording still being made fills in as the robot sends telemetry.
      </EmptyState>
    );
  }
  return (
    <ReplayContext value={store}>
      <ReplayBody
        recording={recording}
        isLive={isLive}
        me={me}
        signals={signals.data.signals}
        events={events.data.events}
        store={store}
        details={details}
        cycles={cycles}
      />
    </ReplayContext>
  );
}

type ReplayBodyProps = {
  details?: ReactNode;
  cycles?: ReplayPageProps['cycles'];
  recording: RecordingDetail;
  isLive: boolean;
  me: { name: string; role: Role };
  signals: Signal[];
  events: NonNullable<ReturnType<typeof useEvents>['data']>['events'];
  store: ReplayStore;
};

function ReplayBody({ recording, isLive, me, signals, events, store, details, cycles }: ReplayBodyProps) {
  const byName = useMemo(() => new Map(signals.map((s) => [s.name, s])), [signals]);
  const [panes, setPanes] = useState<string[][]>(() => {
    const chosen = DEFAULT_PANES.map((names) => names.filter((n) => byName.has(n)));
    if (chosen.some((p) => p.length > 0)) return chosen;
    const numeric = signals.filter((s) => s.type === 'number').map((s) => s.name);
    return [numeric.slice(0, 2), numeric.slice(2, 4)];
  });
  const marks = useMemo(() => eventMarks(events), [events]);
  const markTimes = useMemo(() => marks.map((m) => m.tS), [marks]);
  const notes = useNotes(recording.id);
  const poseX = useQuery({ ...samplesQuery(recording.id, POSE.x, isLive), enabled: byName.has(POSE.x) });
  const poseY = useQuery({ ...samplesQuery(recording.id, POSE.y, isLive), enabled: byName.has(POSE.y) });
  const poseHeading = useQuery({ ...samplesQuery(recording.id, POSE.heading, isLive), enabled: byName.has(POSE.heading) });
  const isFollowing = useReplay((s) => s.isFollowing);

  const valueNames = [...new Set([...FIXED_VALUES.filter((n) => byName.has(n)), ...panes.flat()])];
  const valueQueries = useSamplesOf(recording.id, valueNames, isLive);

  const step = (ticks: number) => {
    store.pause();
    store.seek(stepTicks(store.get().tS, ticks, store.durationS));
  };
  const jump = (direction: 1 | -1) => {
    const t = adjacentMark(markTimes, store.get().tS, direction);
    if (t !== null) store.seek(t);
  };
  const momentUrl = () => {
    const url = new URL(window.location.href);
    url.searchParams.set('t', formatMoment(store.get().tS));
    return url.toString();
  };

  // Keyboard shortcuts, except while typing.
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      const target = e.target as HTMLElement;
      if (target.closest('input, textarea, select, [contenteditable]') || e.altKey || e.ctrlKey || e.metaKey) return;
      const keys: Record<string, () => void> = {
        ' ': () => store.toggle(),
        ArrowLeft: () => step(e.shiftKey ? -50 : -1),
        ArrowRight: () => step(e.shiftKey ? 50 : 1),
        '[': () => jump(-1),
        ']': () => jump(1),
        ',': () => store.setSpeed(nextSpeed(store.get().speed, -1)),
        '.': () => store.setSpeed(nextSpeed(store.get().speed, 1)),
      };
      const action = keys[e.key];
      if (!action) return;
      if (e.key === ' ' && target.closest('button')) target.blur();
      e.preventDefault();
      action();
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  });

  // The address keeps the moment while scrubbing or paused, written at most every URL_WRITE_MS.
  useEffect(() => {
    let timer: ReturnType<typeof setTimeout> | undefined;
    let written = '';
    const write = () => {
      timer = undefined;
      const { tS, isPlaying } = store.get();
      if (isPlaying) return;
      const moment = formatMoment(tS);
      if (moment === written) return;
      written = moment;
      const url = new URL(window.location.href);
      url.searchParams.set('t', moment);
      window.history.replaceState(window.history.state, '', url);
    };
    const unsubscribe = store.subscribe(() => {
      if (!store.get().isPlaying && timer === undefined) timer = setTimeout(write, URL_WRITE_MS);
    });
    return () => {
      unsubscribe();
      if (timer) clearTimeout(timer);
    };
  }, [store]);

  let colourOffset = 0;
  return (
    <div className="flex flex-col gap-5">
      {isLive && <LiveBanner robot={recording.robot} />}
      <Section title="Timeline" className="p-4">
        <TimelineBar
          marks={marks}
          notes={notes.data?.notes ?? []}
          onStep={step}
          onJump={jump}
          onCopyLink={async () => {
            try {
              await navigator.clipboard.writeText(momentUrl());
              return true;
            } catch {
              return false;
            }
          }}
        />
      </Section>
      <div className="grid items-start gap-5 xl:grid-cols-[minmax(0,1fr)_26rem]">
        <Section
          title="Traces"
          description="Drag across a chart to zoom in, double-click for the whole match, shift + wheel to pan; click to move the cursor."
          className="p-4"
        >
          <div className="flex flex-col gap-3">
            {panes.map((names, i) => {
              const paneSignals = names.map((n) => byName.get(n)).filter((s): s is Signal => s !== undefined);
              const offset = colourOffset;
              colourOffset += paneSignals.length;
              return (
                <TracePane
                  key={i}
                  index={i}
                  recordingId={recording.id}
                  isLive={isLive}
                  signals={paneSignals}
                  allSignals={signals}
                  colourOffset={offset}
                  onChange={(next) => setPanes((p) => p.map((old, j) => (j === i ? next : old)))}
                />
              );
            })}
          </div>
        </Section>
        <div className="flex flex-col gap-5">
          <Section title="Field map" className="p-4">
            {isLive && isFollowing ? (
              <LiveReplayField
                robot={recording.robot}
                alliance={recording.metadata.alliance ?? 'blue'}
                pose={{ x: poseX.data, y: poseY.data, heading: poseHeading.data }}
                events={events}
              />
            ) : (
              <ReplayField
                robot={recording.robot}
                alliance={recording.metadata.alliance ?? 'blue'}
                pose={{ x: poseX.data, y: poseY.data, heading: poseHeading.data }}
                events={events}
              />
            )}
          </Section>
          <Section title="Values at cursor" className="p-4">
            <ValuesTable
              rows={valueNames.map((n, i) => ({ signal: byName.get(n)!, series: valueQueries[i], isFixed: FIXED_VALUES.includes(n) }))}
            />
          </Section>
          <Section title="Notes" className="p-4">
            <NotesPanel recordingId={recording.id} me={me} />
          </Section>
          {details && (
            <Section title="Details" className="p-4">
              {details}
            </Section>
          )}
        </div>
      </div>
      {cycles && (
        <Section title="Cycles" description="Pick a cycle in the chart or the table to move the cursor to its start." className="p-4">
          {cycles({ now: () => store.get().tS, subscribe: store.subscribe, seek: (tS) => (store.pause(), store.seek(tS)) })}
        </Section>
      )}
    </div>
  );
}

/** The samples of several signals, undefined until each arrives. */
function useSamplesOf(recordingId: string, names: readonly string[], isLive: boolean) {
  return useQueries({ queries: names.map((n) => samplesQuery(recordingId, n, isLive)), combine: (results) => results.map((r) => r.data) });
}
