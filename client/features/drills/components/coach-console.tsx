import { useEffect, useRef, useState } from 'react';
import { callText, seededRandom } from '../../../../shared/domain/drills/drill-calls';
import { DRILL_CALL_CHANNEL, drillAnswerValueSchema } from '../../../../shared/domain/drills/drill-channels';
import { planCalls } from '../../../../shared/domain/drills/drill-plan';
import type { Drill } from '../../../../shared/schemas/drill';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { pageNowMs, useDueTick } from '../hooks/use-due-tick';
import { useDrillAnswerEntry, useOperatorCount, usePublish, useRelayStatus } from '../hooks/use-drill-relay';
import { coachAnswer, coachDueAtMs, coachTick, outbox, readyCoach, startCoach, stopCoach, type CoachState } from '../model/coach-session';
import { formatReaction, formatAccuracy } from '../model/format';

const newSessionId = () => `coach-${Math.random().toString(36).slice(2, 12)}`;

/** The coach's device: sends the drill's calls to the operator's tablet over the relay and shows each answer. */
export function CoachConsole({ drill, coachName }: { drill: Drill; coachName: string }) {
  const [session, setSession] = useState<CoachState>(() => readyCoach(newSessionId(), drill.pace, []));
  const publish = usePublish();
  const relayStatus = useRelayStatus();
  const operators = useOperatorCount();
  const sessionRef = useRef(session);
  sessionRef.current = session;

  useDueTick(coachDueAtMs(session), (nowMs) => setSession((s) => coachTick(s, nowMs)));

  const start = () => {
    const calls = planCalls(drill.plan, seededRandom(Math.floor(Math.random() * 2 ** 32)));
    setSession(startCoach(readyCoach(newSessionId(), drill.pace, calls), pageNowMs()));
  };

  // What op/drill/call should say changes with the call on screen and at the end.
  const outKey = session.phase === 'ready' ? null : `${session.sessionId}:${session.phase === 'finished' ? 'end' : session.index}`;
  useEffect(() => {
    const value = outbox(sessionRef.current, drill, coachName);
    if (outKey && value) publish(DRILL_CALL_CHANNEL, value);
  }, [outKey]);

  // Leaving the page mid-session tells the operator's tablet the session ended.
  useEffect(
    () => () => {
      const s = sessionRef.current;
      if (s.phase === 'open' || s.phase === 'closed') publish(DRILL_CALL_CHANNEL, outbox(stopCoach(s), drill, coachName)!);
    },
    [],
  );

  const answerEntry = useDrillAnswerEntry();
  const seenAnswer = useRef<number | null>(answerEntry?.rev ?? null);
  useEffect(() => {
    if (!answerEntry || seenAnswer.current === answerEntry.rev) return;
    seenAnswer.current = answerEntry.rev;
    const parsed = drillAnswerValueSchema.safeParse(answerEntry.value);
    if (parsed.success) setSession((s) => coachAnswer(s, parsed.data, answerEntry.receivedAtMs));
  }, [answerEntry]);

  const isLive = session.phase === 'open' || session.phase === 'closed';
  const call = session.calls[session.index];
  const answers = Object.values(session.answers);
  const answered = answers.filter((a) => a.reactionMs !== null);
  const clean = answered.filter((a) => a.errors === 0).length;
  const operatorName = answers[0]?.operatorName;

  return (
    <div className="flex flex-col gap-5">
      <div className="flex flex-wrap items-center gap-3">
        <Badge tone={relayStatus === 'open' ? 'go' : 'stop'}>{relayStatus === 'open' ? 'Relay connected' : 'Relay not connected'}</Badge>
        <Badge tone={operators > 0 ? 'sky' : 'neutral'}>
          {operators === 0 ? 'No operator device on the relay' : `${operators} operator device${operators === 1 ? '' : 's'} on the relay`}
        </Badge>
      </div>
      {operators === 0 && session.phase === 'ready' && (
        <Notice tone="info" title="Open the drill view on the operator’s tablet">
          On the tablet, sign in as the operator and open Drills → Follow the coach. Calls you send appear there in large type.
        </Notice>
      )}

      <section aria-label="Current call" className="flex flex-col items-center gap-3 rounded-xl bg-asphalt-900 px-4 py-8 ring-1 ring-asphalt-700">
        <p className="text-2xs font-semibold tracking-widest text-asphalt-400 uppercase">
          {session.phase === 'ready' ? 'Not started' : session.phase === 'finished' ? (session.isStopped ? 'Stopped' : 'Finished') : `Call ${session.index + 1} of ${session.calls.length}`}
        </p>
        <p data-testid="coach-call" className="text-center text-6xl font-bold tracking-tight">
          {isLive && call ? callText(call) : '—'}
        </p>
        <p aria-live="polite" className="min-h-6 text-lg text-asphalt-300">
          {isLive && (session.answers[session.index] ? answerLine(session.answers[session.index]!) : 'Waiting for the operator…')}
        </p>
        <div className="flex gap-3">
          {isLive ? (
            <Button variant="danger" onClick={() => setSession(stopCoach)}>
              Stop sending
            </Button>
          ) : (
            <Button variant="primary" onClick={start} disabled={relayStatus !== 'open'}>
              {session.phase === 'finished' ? 'Send the drill again' : 'Start sending calls'}
            </Button>
          )}
        </div>
      </section>

      {session.calls.length > 0 && (
        <section aria-label="Answers" className="flex flex-col gap-2">
          <h2 className="text-lg font-semibold">
            Answers{operatorName ? ` from ${operatorName}` : ''}{' '}
            {answered.length > 0 && (
              <span className="text-sm font-normal text-asphalt-400">
                · {answered.length} answered · {formatAccuracy(clean / Math.max(1, answers.length))} clean
              </span>
            )}
          </h2>
          <ol className="grid grid-cols-2 gap-2 sm:grid-cols-4 lg:grid-cols-6">
            {session.calls.map((c, i) => {
              const a = session.answers[i];
              const isCurrent = i === session.index && isLive;
              return (
                <li key={i} className={`rounded-lg px-3 py-2 ring-1 ${isCurrent ? 'bg-signal-950 ring-signal-500/60' : 'bg-asphalt-900 ring-asphalt-700'}`}>
                  <p className="text-2xs text-asphalt-400">#{i + 1}</p>
                  <p className="font-semibold">{callText(c)}</p>
                  <p className={`font-mono text-sm ${a?.reactionMs === null ? 'text-stop' : 'text-asphalt-300'}`}>
                    {a ? (a.reactionMs === null ? 'missed' : formatReaction(a.reactionMs)) : i <= session.index ? '…' : ''}
                  </p>
                </li>
              );
            })}
          </ol>
        </section>
      )}
    </div>
  );
}

function answerLine(a: { reactionMs: number | null; errors: number }): string {
  if (a.reactionMs === null) return 'Missed';
  return `Right in ${formatReaction(a.reactionMs)}${a.errors ? ` · ${a.errors} wrong tap${a.errors === 1 ? '' : 's'} first` : ''}`;
}
