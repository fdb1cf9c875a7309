import { ROLE_LABELS } from '../../../../shared/domain/roles';
import { QueryGate } from '../../../components/ui/query-gate';
import { useMembers } from '../api/members';
import { sortMembers } from '../model/members';

/** Who is on the team, at a glance. */
export function MemberRoster() {
  const members = useMembers();
  return (
    <QueryGate query={members} loadingLabel="Loading members…" errorTitle="Couldn’t load the members">
      {(data) => (
        <ul aria-label="Team members" className="flex flex-col divide-y divide-asphalt-750">
          {sortMembers(data).map((m) => (
            <li key={m.userId} className="flex items-center justify-between gap-3 py-2">
              <span className="truncate font-medium text-asphalt-100">{m.name}</span>
              <span className="text-sm text-asphalt-400">{ROLE_LABELS[m.role]}</span>
            </li>
          ))}
        </ul>
      )}
    </QueryGate>
  );
}
