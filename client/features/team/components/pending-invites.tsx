import { ROLE_LABELS } from '../../../../shared/domain/roles';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { Notice } from '../../../components/ui/notice';
import { QueryGate } from '../../../components/ui/query-gate';
import { errorMessage } from '../../../lib/form-errors';
import { formatRelative } from '../../../lib/format-time';
import { useInvites, useRevokeInvite } from '../api/invites';

export function PendingInvites() {
  const invites = useInvites();
  const revoke = useRevokeInvite();

  const now = Date.now();
  return (
    <QueryGate query={invites} loadingLabel="Loading invites…" errorTitle="Couldn’t load the invites">
      {(data) =>
        data.length === 0 ? (
          <EmptyState icon="mail" title="No invites waiting">
            Invites you send appear here until they’re accepted, revoked or expire.
          </EmptyState>
        ) : (
          <div className="flex flex-col gap-3">
            {revoke.isError && <Notice tone="error">{errorMessage(revoke.error)}</Notice>}
            <ul aria-label="Pending invites" className="divide-y divide-asphalt-750 rounded-tile ring-1 ring-asphalt-700">
              {data.map((invite) => {
                const isRevoking = revoke.isPending && revoke.variables === invite.id;
                return (
                  <li key={invite.id} className="flex items-center gap-3 bg-asphalt-850 px-4 py-3 first:rounded-t-tile last:rounded-b-tile">
                    <div className="min-w-0 flex-1">
                      <p className="flex flex-wrap items-center gap-2">
                        <span className="truncate font-semibold text-asphalt-100">{invite.email}</span>
                        <Badge>{ROLE_LABELS[invite.role]}</Badge>
                      </p>
                      <p className="text-sm text-asphalt-400">
                        Invited by {invite.invitedByName} {formatRelative(invite.createdAt, now)} · link expires{' '}
                        {formatRelative(invite.expiresAt, now)}
                      </p>
                    </div>
                    <Button
                      size="sm"
                      variant="ghost"
                      aria-label={`Revoke invite for ${invite.email}`}
                      isPending={isRevoking}
                      onClick={() => revoke.mutate(invite.id)}
                    >
                      Revoke
                    </Button>
                  </li>
                );
              })}
            </ul>
          </div>
        )
      }
    </QueryGate>
  );
}
