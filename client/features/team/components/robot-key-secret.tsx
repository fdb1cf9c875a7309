import type { CreatedRobotKey } from '../../../../shared/schemas/team';
import { Button } from '../../../components/ui/button';
import { CopyButton } from '../../../components/ui/copy-button';

/** The one and only showing of a new key's secret. */
export function RobotKeySecret({ created, onDone }: { created: CreatedRobotKey; onDone: () => void }) {
  return (
    <div role="status" className="rounded-tile bg-signal-950 p-4 ring-1 ring-signal-500/60">
      <p className="font-semibold text-signal-200">Key for “{created.key.name}” created. Copy the secret now: you won’t see it again.</p>
      <p className="mt-1 text-sm text-asphalt-300">
        Pitwall keeps only a hash of it. Put it in the robot code’s configuration, not in a public repository. If it
        gets lost, revoke this key and create a new one.
      </p>
      <div className="mt-3 flex flex-wrap items-center gap-3">
        <code
          aria-label="Robot key secret"
          className="num min-w-0 flex-1 rounded-lg bg-asphalt-950 px-3 py-2.5 text-sm break-all text-asphalt-100 ring-1 ring-asphalt-600 select-all"
        >
          {created.secret}
        </code>
        <CopyButton text={created.secret} label="Copy secret" />
      </div>
      <Button size="sm" className="mt-3" onClick={onDone}>
        I’ve stored it
      </Button>
    </div>
  );
}
