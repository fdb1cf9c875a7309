import { useState } from 'react';
import { can, type Role } from '../../../../shared/domain/roles';
import type { Member } from '../../../../shared/schemas/team';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { Notice } from '../../../components/ui/notice';
import { QueryGate } from '../../../components/ui/query-gate';
import { TableFrame } from '../../../components/ui/table-frame';
import { errorMessage } from '../../../lib/form-errors';
import { useChangeMemberRole, useMembers, useRemoveMember } from '../api/members';
import { canChangeRole, canRemoveMember, sortMembers } from '../model/members';
import { MemberRow } from './member-row';

type MembersTableProps = { viewerRole: Role; viewerId: string };

export function MembersTable({ viewerRole, viewerId }: MembersTableProps) {
  const members = useMembers();
  const changeRole = useChangeMemberRole();
  const remove = useRemoveMember();
  const [removing, setRemoving] = useState<Member | null>(null);
  const isManager = can(viewerRole, 'members.manage');
  const columns = [
    { label: 'Member' },
    { label: 'Role' },
    { label: 'Joined' },
    ...(isManager ? [{ label: 'Actions', isLabelHidden: true, isEnd: true }] : []),
  ];

  return (
    <>
      <QueryGate query={members} loadingLabel="Loading members…" errorTitle="Couldn’t load the members">
        {(data) => {
          const rows = sortMembers(data);
          return (
            <>
              {changeRole.isError && (
                <Notice tone="error" className="mb-3" title="The role didn’t change">
                  {errorMessage(changeRole.error)}
                </Notice>
              )}
              <TableFrame caption="Team members and their roles" columns={columns}>
                {rows.map((member) => (
                  <MemberRow
                    key={member.userId}
                    member={member}
                    isYou={member.userId === viewerId}
                    isManager={isManager}
                    pendingRole={
                      changeRole.isPending && changeRole.variables.userId === member.userId ? changeRole.variables.role : null
                    }
                    isLastLead={member.role === 'lead' && !canChangeRole(rows, member.userId, 'programmer')}
                    canRemove={canRemoveMember(rows, member.userId)}
                    onChangeRole={(role) => changeRole.mutate({ userId: member.userId, role })}
                    onRemove={() => {
                      remove.reset();
                      setRemoving(member);
                    }}
                  />
                ))}
              </TableFrame>
            </>
          );
        }}
      </QueryGate>
      <ConfirmDialog
        isOpen={removing !== null}
        title={removing ? `Remove ${removing.name} from the team?` : 'Remove member?'}
        confirmLabel="Remove member"
        isPending={remove.isPending}
        error={remove.isError && <Notice tone="error">{errorMessage(remove.error)}</Notice>}
        onConfirm={() => removing && remove.mutate(removing.userId, { onSuccess: () => setRemoving(null) })}
        onCancel={() => setRemoving(null)}
      >
        {removing?.userId === viewerId
          ? 'You will lose access to this team straight away. Another lead can invite you back.'
          : 'They lose access straight away. Their notes and recordings stay with the team. You can invite them again later.'}
      </ConfirmDialog>
    </>
  );
}
