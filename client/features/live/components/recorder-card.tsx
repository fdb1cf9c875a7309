import type { RecorderRobot } from '../../../../shared/schemas/recorder';
import { Button } from '../../../components/ui/button';
import { ButtonLink } from '../../../components/ui/button-link';
import { Spinner } from '../../../components/ui/spinner';
import { useRecorderStatus, useStartRecording, useStopRecording } from '../api/recorder';

const KIND_WORDS = { match: 'match', practice: 'practice run', drill: 'drill', simulated: 'simulated run' } as const;

/**
 * What the recorder is doing with each connected robot: matches record themselves from the robot's mode;
 * leads and programmers can also start and stop a recording by hand. Each recording being made opens live.
 */
export function RecorderCard({ canRecord }: { canRecord: boolean }) {
  const status = useRecorderStatus();
  const start = useStartRecording();
  const stop = useStopRecording();
  if (status.isPending) return <p className="flex items-center gap-2 text-[0.9375rem] text-asphalt-400"><Spinner className="size-4" /> Asking the recorder…</p>;
  if (status.isError) return <p className="text-[0.9375rem] text-stop">Couldn’t reach the recorder: {status.error.message}</p>;
  const robots = status.data.robots;
  const failure = start.error ?? stop.error;
  return (
    <div className="flex flex-col gap-3">
      {robots.length === 0 && <p className="text-[0.9375rem] text-asphalt-400">Nothing to record until a robot connects.</p>}
      <ul className="flex flex-col gap-2">
        {robots.map((r) => (
          <li key={r.robot} className="flex flex-col gap-2.5 rounded-lg bg-asphalt-900 px-3 py-2.5 ring-1 ring-asphalt-750">
            <div className="min-w-0">
              <p className="truncate font-semibold text-asphalt-100">{r.robot}</p>
              <RobotLine robot={r} />
            </div>
            {(r.recording?.recordingId || canRecord) && (
              <div className="flex flex-wrap gap-2">
                {r.recording?.recordingId && (
                  <ButtonLink size="sm" variant="primary" to={`/recordings/${r.recording.recordingId}`}>
                    Watch live
                  </ButtonLink>
                )}
                {canRecord &&
                  (r.recording ? (
                    <Button size="sm" isPending={stop.isPending && stop.variables === r.robot} onClick={() => stop.mutate(r.robot)}>
                      Stop recording
                    </Button>
                  ) : (
                    <Button size="sm" isPending={start.isPending && start.variables === r.robot} onClick={() => start.mutate(r.robot)}>
                      Record now
                    </Button>
                  ))}
              </div>
            )}
          </li>
        ))}
      </ul>
      {failure && <p role="alert" className="text-sm text-stop">{failure.message}</p>}
      <p className="text-sm text-asphalt-500">
        Matches record themselves from the robot’s mode (auto to the end of teleop).
        {canRecord ? ' Record now keeps everything until you stop it.' : ' Leads and programmers can also record by hand.'}
      </p>
    </div>
  );
}

function RobotLine({ robot }: { robot: RecorderRobot }) {
  if (!robot.recording) return <p className="text-sm text-asphalt-400">Not recording · mode {robot.mode ?? 'unknown'}</p>;
  return (
    <p className="flex items-center gap-1.5 text-sm font-medium text-stop">
      <span aria-hidden="true" className="size-2 animate-pulse rounded-full bg-stop" />
      Recording a {KIND_WORDS[robot.recording.kind]}
      {robot.recording.isManual ? ' (by hand)' : ''} · mode {robot.mode ?? 'unknown'}
    </p>
  );
}
