import { useCallback, useEffect, useMemo, useRef, useState, type ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { CALL_PART_CHANNELS, callParts, callSpeech, callText, seededRandom, type CallPart } from '../../../../shared/domain/drills/drill-calls';
import { DRILL_ANSWER_CHANNEL, drillCallValueSchema, type DrillAnswerValue } from '../../../../shared/domain/drills/drill-channels';
import { planCalls } from '../../../../shared/domain/drills/drill-plan';
import type { Drill, SubmittedDrillResult } from '../../../../shared/schemas/drill';
import type { PublishedPanel } from '../../../../shared/schemas/panel';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { useSubmitDrillResult } from '../api/drills';
import { pageNowMs, useDueTick } from '../hooks/use-due-tick';
import { useDrillCallEntry, usePublish, useRelayOffsetMs, useRelayStatus, useRobotPresence } from '../hooks/use-drill-relay';
import { useFullScreen } from '../hooks/use-full-screen';
import { useSpeech } from '../hooks/use-speech';
import { drillPage } from '../model/drill-panel';
import {
  coachCall,
  coachEnd,
  currentCall,
  dueAtMs,
  missingParts,
  readyRun,
  scoredSoFar,
  startRun,
  stopRun,
  tapRun,
  tickRun,
  windowOf,
  type RunnerState,
} from '../model/drill-runner';
import { formatReaction, tapPrompt } from '../model/format';
import { PanelAnswerCanvas } from './panel-answer-canvas';
import { RunResults } from './run-results';
import { StandardPickers } from './standard-pickers';
import { ToggleSwitch } from './toggle-switch';
import { WindowBar } from './window-bar';

type DrillRunViewProps = {
  /** `self`: the operator runs `drill` at its pace; `coached`: the view follows op/drill/call. */
  mode: 'self' | 'coached';
  drill?: Drill;
  /** The team's published panel; null when none is published or it could not be loaded. */
  panel: PublishedPanel | null;
  panelProblem: string | null;
  operatorName: string;
  /** Whether this member may publish the standard op/ channels (operators, programmers, leads). */
  canDriveSimulator: boolean;
  backHref: string;
  /** The safety caution, shown when answers go to the simulator's channels. */
  safety: ReactNode;
};

/** The operator's full-screen drill view: the call in large type, the panel to answer on, timing and the result. */
export function DrillRunView({ mode, drill, panel, panelProblem, operatorName, canDriveSimulator, backHref, safety }: DrillRunViewProps) {
  const [run, setRun] = useState<RunnerState>(() => readyRun(mode === 'coached' ? { mode: 'coached', windowMs: 5000 } : drill!.pace));
  const [seed, setSeed] = useState<number | null>(null);
  const [startedAt, setStartedAt] = useState<string>(() => new Date().toISOString());
  const [drivesSimulator, setDrivesSimulator] = useState(false);
  const [coach, setCoach] = useState<{ drillId: string; drillName: string; coachName: string; count: number } | null>(null);
  const speech = useSpeech();
  const fullScreen = useFullScreen();
  const publish = usePublish();
  const relayStatus = useRelayStatus();
  const robot = useRobotPresence();
  const submit = useSubmitDrillResult();
  const [saved, setSaved] = useState<SubmittedDrillResult | null>(null);

  const answerPage = panel ? drillPage(panel.version.document) : undefined;
  const plannedParts = useMemo<CallPart[]>(() => {
    if (drill?.plan.mode === 'scripted') return [...new Set(drill.plan.calls.flatMap(callParts))];
    if (drill?.plan.mode === 'random') {
      const t = drill.plan.targets;
      return [...(t.branches.length ? (['branch'] as const) : []), ...(t.levels.length ? (['level'] as const) : []), ...(t.stations.length ? (['station'] as const) : [])];
    }
    return ['branch', 'level', 'station'];
  }, [drill]);
  const lacking = answerPage ? plannedParts.filter((p) => !answerPage.parts.includes(p)) : plannedParts;
  const usesPanel = answerPage !== undefined && lacking.length === 0;

  // ---- the clock ------------------------------------------------------------------------------
  useDueTick(dueAtMs(run), (nowMs) => setRun((s) => tickRun(s, nowMs)));

  const begin = () => {
    const runSeed = Math.floor(Math.random() * 2 ** 32);
    setSeed(drill!.plan.mode === 'random' ? runSeed : null);
    setSaved(null);
    submit.reset();
    setStartedAt(new Date().toISOString());
    setRun(startRun(readyRun(drill!.pace, planCalls(drill!.plan, seededRandom(runSeed))), pageNowMs()));
  };

  // ---- coached: follow op/drill/call ------------------------------------------------------------
  const entry = useDrillCallEntry();
  const offsetMs = useRelayOffsetMs();
  const seenRev = useRef<number | null>(null);
  const runRef = useRef(run);
  runRef.current = run;
  useEffect(() => {
    if (mode !== 'coached' || !entry || seenRev.current === entry.rev) return;
    seenRev.current = entry.rev;
    const parsed = drillCallValueSchema.safeParse(entry.value);
    if (!parsed.success) return;
    const value = parsed.data;
    if (value.kind === 'call') {
      const s = runRef.current;
      // A call the relay kept from a session that went quiet long ago is not shown.
      const ageMs = entry.receivedAtMs + offsetMs - entry.tMs;
      if (s.phase === 'ready' && ageMs > value.windowMs) return;
      if (s.sessionId !== value.sessionId || s.phase === 'finished' || s.phase === 'ready') {
        setSaved(null);
        submit.reset();
        setStartedAt(new Date(entry.receivedAtMs).toISOString());
      }
      setRun(coachCall(s, value.sessionId, value.index, value.call, value.windowMs, entry.receivedAtMs));
      setCoach({ drillId: value.drillId, drillName: value.drillName, coachName: value.coachName, count: value.count });
    } else {
      setRun(coachEnd(runRef.current, value.sessionId, value.isStopped, entry.receivedAtMs));
    }
  }, [mode, entry, submit]);

  // ---- side effects of the run: speech, the coach's tally, the simulator, storing the result -----
  const shownCount = run.records.length;
  const call = currentCall(run);
  useEffect(() => {
    if (run.phase === 'open' && call) speech.speak(callSpeech(call));
    // Speak once per call shown.
  }, [shownCount]);

  const closedKey = run.phase === 'closed' || run.phase === 'finished' ? `${run.sessionId ?? 'self'}:${shownCount}:${run.closedAtMs}` : null;
  useEffect(() => {
    if (!closedKey || !run.outcome || run.closedAtMs === null) return;
    const outcome = run.outcome;
    if (mode === 'coached' && run.sessionId) {
      const answer: DrillAnswerValue = { sessionId: run.sessionId, index: shownCount - 1, reactionMs: outcome.reactionMs, errors: outcome.errors, operatorName };
      publish(DRILL_ANSWER_CHANNEL, answer);
    }
    if (drivesSimulator && canDriveSimulator && !outcome.isMiss) {
      for (const part of callParts(outcome.call)) publish(CALL_PART_CHANNELS[part], outcome.call[part]!);
    }
  }, [closedKey]);

  const drillId = mode === 'coached' ? coach?.drillId : drill?.id;
  const save = useCallback(() => {
    if (!drillId || run.records.length === 0) return;
    submit.mutate(
      {
        drillId,
        startedAt,
        mode,
        coachName: mode === 'coached' ? (coach?.coachName ?? null) : null,
        isSimulatorDriven: drivesSimulator && canDriveSimulator,
        seed,
        calls: run.records,
      },
      { onSuccess: setSaved },
    );
  }, [drillId, run.records, startedAt, mode, coach, drivesSimulator, canDriveSimulator, seed, submit]);
  const finishedKey = run.phase === 'finished' ? `${run.sessionId ?? 'self'}:${run.t0Ms}` : null;
  useEffect(() => {
    if (finishedKey) save();
  }, [finishedKey]);

  const stop = () => setRun((s) => stopRun(s, pageNowMs()));

  const onTap = useCallback((part: CallPart, value: string) => setRun((s) => tapRun(s, part, value, pageNowMs())), []);

  // ---- drawing ----------------------------------------------------------------------------------
  const name = mode === 'coached' ? (coach?.drillName ?? 'Coached drill') : drill!.name;
  const count = mode === 'coached' ? (coach?.count ?? 0) : run.calls.length;
  const scored = scoredSoFar(run);
  const isRunning = run.phase === 'open' || run.phase === 'closed' || run.phase === 'countdown';

  return (
    <div className="flex h-dvh flex-col gap-3 bg-asphalt-950 p-3 text-asphalt-100 sm:p-4">
      <header className="flex flex-wrap items-center gap-x-5 gap-y-2">
        <Link to={backHref} className="inline-flex min-h-11 items-center rounded-lg px-3 text-sm font-semibold text-asphalt-200 ring-1 ring-asphalt-700 hover:bg-asphalt-800">
          ← Drills
        </Link>
        <div className="min-w-0">
          <p className="text-2xs font-semibold tracking-widest text-asphalt-400 uppercase">{mode === 'coached' ? `Drill · calls from ${coach?.coachName ?? 'the coach'}` : 'Drill'}</p>
          <h1 className="truncate text-lg font-semibold">{name}</h1>
        </div>
        {count > 0 && run.phase !== 'ready' && (
          <p className="font-mono text-sm text-asphalt-300" aria-live="polite">
            Call {Math.min(shownCount, count)} of {count}
          </p>
        )}
        <div className="ml-auto flex flex-wrap items-center gap-x-5 gap-y-1">
          <ToggleSwitch
            label="Speak calls"
            hint={speech.isSupported ? undefined : 'This browser cannot speak'}
            isOn={speech.isOn}
            isDisabled={!speech.isSupported}
            onChange={speech.setOn}
          />
          <ToggleSwitch
            label="Drive the simulator"
            hint={canDriveSimulator ? robotHint(robot) : 'Operators, programmers and leads send targets'}
            isOn={drivesSimulator && canDriveSimulator}
            isDisabled={!canDriveSimulator}
            onChange={setDrivesSimulator}
          />
          {fullScreen.isSupported && (
            <Button variant="ghost" size="sm" onClick={fullScreen.toggle}>
              {fullScreen.isOn ? 'Leave full screen' : 'Full screen'}
            </Button>
          )}
          {isRunning && mode === 'self' && (
            <Button variant="danger" size="sm" onClick={stop}>
              Stop
            </Button>
          )}
        </div>
      </header>

      {drivesSimulator && canDriveSimulator && robot === 'robot' && (
        <Notice tone="caution" title="A robot that is not the simulator is connected">
          Each answer goes to op/reef/branch and op/reef/level, and that robot will act on them. Keep a hand near the driver station’s disable.
        </Notice>
      )}

      {run.phase === 'ready' && mode === 'self' && (
        <StartCard
          drill={drill!}
          usesPanel={usesPanel}
          panelName={panel?.name}
          panelProblem={panelProblem ?? (answerPage && lacking.length ? `The published panel has no picker for ${lacking.join(', ')}.` : null)}
          safety={drivesSimulator && canDriveSimulator ? safety : null}
          onStart={begin}
        />
      )}
      {run.phase === 'ready' && mode === 'coached' && (
        <WaitingCard relayStatus={relayStatus} usesPanel={usesPanel} panelName={panel?.name} panelProblem={panelProblem} safety={drivesSimulator && canDriveSimulator ? safety : null} />
      )}

      {run.phase === 'finished' ? (
        <RunResults
          scored={scored}
          count={count}
          isStopped={run.isStopped}
          saved={saved}
          isSaving={submit.isPending}
          saveError={submit.error}
          onRetrySave={save}
          onAgain={mode === 'self' ? begin : undefined}
          againHint={mode === 'coached' ? 'The next call from the coach starts a new run.' : undefined}
          backHref={backHref}
        />
      ) : (
        run.phase !== 'ready' && (
          <>
            <CallBanner run={run} />
            <div className="min-h-0 flex-1">
              {usesPanel && answerPage ? (
                <PanelAnswerCanvas document={panel!.version.document} page={answerPage.page} selection={run.selection} onTap={onTap} />
              ) : (
                <StandardPickers parts={plannedParts} selection={run.selection} isOpen={run.phase === 'open'} onTap={onTap} />
              )}
            </div>
          </>
        )
      )}
    </div>
  );
}

function robotHint(robot: 'none' | 'simulator' | 'robot'): string {
  if (robot === 'simulator') return 'Each answer becomes a simulated cycle';
  if (robot === 'robot') return 'A robot is connected — not the simulator';
  return 'No simulator is connected';
}

function CallBanner({ run }: { run: RunnerState }) {
  const call = currentCall(run);
  const outcome = run.outcome;
  const missing = missingParts(run);
  const wrongTaps = run.records.at(-1)?.taps.filter((t) => call && call[t.part] !== t.value).length ?? 0;
  let status: ReactNode;
  let tone = 'text-asphalt-300';
  if (run.phase === 'countdown') status = 'Get ready…';
  else if (run.phase === 'open') {
    status = tapPrompt(missing);
    if (wrongTaps > 0) {
      status = `${status} · ${wrongTaps} wrong tap${wrongTaps === 1 ? '' : 's'}`;
      tone = 'text-stop';
    }
  } else if (outcome?.isMiss) {
    status = 'Missed';
    tone = 'text-stop';
  } else if (outcome) {
    status = `Right in ${formatReaction(outcome.reactionMs)}${outcome.errors ? ` · ${outcome.errors} wrong tap${outcome.errors === 1 ? '' : 's'} first` : ''}`;
    tone = 'text-go';
  }
  return (
    <section aria-label="Call" className="flex flex-col items-center gap-2 rounded-xl bg-asphalt-900 px-4 py-4 ring-1 ring-asphalt-700">
      <p data-testid="drill-call" aria-live="assertive" className="text-center text-6xl leading-none font-bold tracking-tight text-asphalt-50 sm:text-8xl">
        {run.phase === 'countdown' ? '…' : call ? callText(call) : ''}
      </p>
      <p data-testid="drill-status" aria-live="polite" className={`min-h-7 text-lg font-semibold ${tone}`}>
        {status}
      </p>
      <div className="w-full max-w-xl">
        <WindowBar callKey={`${run.sessionId ?? ''}:${run.records.length}:${run.phase === 'countdown'}`} windowMs={run.phase === 'countdown' ? run.t0Ms - pageNowMs() : windowOf(run.timing)} isRunning={run.phase === 'open' || run.phase === 'countdown'} />
      </div>
    </section>
  );
}

type StartCardProps = { drill: Drill; usesPanel: boolean; panelName?: string; panelProblem: string | null; safety: ReactNode; onStart: () => void };

function StartCard({ drill, usesPanel, panelName, panelProblem, safety, onStart }: StartCardProps) {
  const startRef = useRef<HTMLButtonElement>(null);
  useEffect(() => startRef.current?.focus(), []);
  return (
    <section className="mx-auto flex w-full max-w-2xl flex-1 flex-col justify-center gap-4">
      <PanelLine usesPanel={usesPanel} panelName={panelName} panelProblem={panelProblem} />
      {safety}
      <p className="text-asphalt-300">
        Each call shows here in large type. Tap it on the panel as fast as you can: the time runs from the call to the moment the whole selection is right.
      </p>
      <button
        ref={startRef}
        type="button"
        onClick={onStart}
        className="min-h-20 rounded-xl bg-signal-500 text-3xl font-bold text-asphalt-950 hover:bg-signal-400 active:bg-signal-600 focus-visible:outline-4 focus-visible:outline-offset-2 focus-visible:outline-signal-300"
      >
        Start drill
      </button>
      <p className="text-center text-sm text-asphalt-400">
        {drill.plan.mode === 'random' ? `${drill.plan.count} calls` : `${drill.plan.calls.length} calls`} · a 3 s countdown first
      </p>
    </section>
  );
}

function PanelLine({ usesPanel, panelName, panelProblem }: { usesPanel: boolean; panelName?: string; panelProblem: string | null }) {
  if (usesPanel) return <Notice tone="info">Answer on the team’s published panel, “{panelName}”.</Notice>;
  return (
    <Notice tone="caution" title="Standard pickers instead of the published panel">
      {panelProblem ?? 'The team has no published panel yet.'} This drill uses plain branch, level and station pickers.
    </Notice>
  );
}

function WaitingCard({ relayStatus, usesPanel, panelName, panelProblem, safety }: { relayStatus: string; usesPanel: boolean; panelName?: string; panelProblem: string | null; safety: ReactNode }) {
  return (
    <section className="mx-auto flex w-full max-w-2xl flex-1 flex-col justify-center gap-4">
      <PanelLine usesPanel={usesPanel} panelName={panelName} panelProblem={panelProblem} />
      {safety}
      <div className="rounded-xl bg-asphalt-900 p-6 text-center ring-1 ring-asphalt-700">
        <p className="text-2xl font-semibold" data-testid="drill-waiting">
          Waiting for the coach’s first call
        </p>
        <p className="mt-2 text-asphalt-400">
          {relayStatus === 'open' ? 'Connected to the relay. Keep this screen open; calls appear here as the coach sends them.' : 'Connecting to the relay…'}
        </p>
      </div>
    </section>
  );
}
