import { ROLE_LABELS, roleSchema, type Role } from '../../../../shared/domain/roles';
import type { Member } from '../../../../shared/schemas/team';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { controlClasses } from '../../../components/ui/field';
import { SelectChevron } from '../../../components/ui/select-chevron';
import { formatDate } from '../../../lib/format-time';
import { RoleOptions } from './role-options';

type MemberRowProps = {
  member: Member;
  isYou: boolean;
  isManager: boolean;
  /** The role being saved for this member, shown in the select until the server answers. */
  pendingRole: Role | null;
  isLastLead: boolean;
  canRemove: boolean;
  onChangeRole: (role: Role) => void;
  onRemove: () => void;
};

export function MemberRow({ member, isYou, isManager, pendingRole, isLastLead, canRemove, onChangeRole, onRemove }: MemberRowProps) {
  const noteId = `last-lead-${member.userId}`;
  return (
    <tr className="bg-asphalt-850 hover:bg-asphalt-800/60">
      <th scope="row" className="px-4 py-3 font-normal">
        <span className="flex items-center gap-2 font-semibold text-asphalt-100">
          {member.name}
          {isYou && <Badge tone="sky">You</Badge>}
        </span>
        <span className="block text-sm text-asphalt-400">{member.email}</span>
      </th>
      <td className="px-4 py-3">
        {isManager ? (
          <div className="relative w-44">
            <select
              // Named by the member alone: the column header already says "Role", and the invite
              // form's "Role" select must stay the only control of that name on the page.
              aria-label={member.name}
              aria-describedby={isLastLead ? noteId : undefined}
              value={pendingRole ?? member.role}
              disabled={pendingRole !== null || isLastLead}
              onChange={(e) => {
                const role = roleSchema.parse(e.target.value);
                if (role !== member.role) onChangeRole(role);
              }}
              className={`${controlClasses} appearance-none pr-10`}
            >
              <RoleOptions />
            </select>
            <SelectChevron />
            {isLastLead && (
              <span id={noteId} className="mt-1 block text-xs text-asphalt-400">
                The only lead keeps this role.
              </span>
            )}
          </div>
        ) : (
          <Badge tone={member.role === 'lead' ? 'signal' : 'neutral'}>{ROLE_LABELS[member.role]}</Badge>
        )}
      </td>
      <td className="px-4 py-3 text-asphalt-300">{formatDate(member.joinedAt)}</td>
      {isManager && (
        <td className="px-4 py-3 text-right">
          <Button
            size="sm"
            variant="ghost"
            aria-label={`Remove ${member.name}`}
            disabled={!canRemove}
            title={canRemove ? undefined : 'The team needs at least one lead'}
            onClick={onRemove}
          >
            Remove
          </Button>
        </td>
      )}
    </tr>
  );
}
