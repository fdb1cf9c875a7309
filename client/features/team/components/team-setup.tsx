import { Link } from 'react-router-dom';
import { Icon, type IconName } from '../../../components/ui/icon';
import { Spinner } from '../../../components/ui/spinner';
import { cx } from '../../../lib/cx';
import { useInvites } from '../api/invites';
import { useMembers } from '../api/members';
import { useRobotKeys } from '../api/robot-keys';

type StepProps = { icon: IconName; title: string; status: string | null; isDone: boolean; isLoading: boolean; to: string };

function Step({ icon, title, status, isDone, isLoading, to }: StepProps) {
  return (
    <li>
      <Link
        to={to}
        className="flex min-h-16 items-center gap-3 rounded-lg bg-asphalt-900 px-4 py-3 ring-1 ring-asphalt-700 hover:ring-asphalt-500"
      >
        <span
          className={cx(
            'grid size-9 shrink-0 place-items-center rounded-full ring-1',
            isDone ? 'bg-go-950 text-go ring-go/40' : 'bg-asphalt-800 text-asphalt-300 ring-asphalt-600',
          )}
        >
          {isDone ? (
            <svg viewBox="0 0 16 16" aria-hidden="true" className="size-4">
              <path d="m3.5 8.5 3 3 6-7" fill="none" stroke="currentColor" strokeWidth="2" strokeLinecap="round" strokeLinejoin="round" />
            </svg>
          ) : (
            <Icon name={icon} className="size-4" />
          )}
        </span>
        <span className="min-w-0 flex-1">
          <span className="block font-semibold text-asphalt-100">{title}</span>
          <span className="block text-sm text-asphalt-400">
            {isLoading ? <Spinner className="inline size-3" /> : status}
            {isDone && <span className="sr-only"> (done)</span>}
          </span>
        </span>
        <span aria-hidden="true" className="text-asphalt-500">→</span>
      </Link>
    </li>
  );
}

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** A lead's first steps, with live counts. Only rendered for members who may manage the team. */
export function TeamSetup() {
  const members = useMembers();
  const invites = useInvites();
  const keys = useRobotKeys();
  const activeKeys = keys.data?.filter((k) => !k.revokedAt).length ?? 0;
  const memberCount = members.data?.length ?? 0;
  const inviteCount = invites.data?.length ?? 0;

  return (
    <ol className="flex flex-col gap-2">
      <Step
        icon="team"
        title="Invite the subteam"
        to="/settings/team"
        isLoading={members.isPending || invites.isPending}
        isDone={memberCount > 1}
        status={
          members.isError || invites.isError
            ? 'Couldn’t count members right now'
            : `${plural(memberCount, 'member', 'members')}, ${plural(inviteCount, 'invite', 'invites')} waiting`
        }
      />
      <Step
        icon="key"
        title="Create a key for the robot"
        to="/settings/team#robot-keys"
        isLoading={keys.isPending}
        isDone={activeKeys > 0}
        status={keys.isError ? 'Couldn’t count keys right now' : activeKeys > 0 ? plural(activeKeys, 'working key', 'working keys') : 'No key yet — the robot needs one to reach the relay'}
      />
    </ol>
  );
}
