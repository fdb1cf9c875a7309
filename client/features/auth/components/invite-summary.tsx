import { ROLE_LABELS, ROLE_SUMMARIES } from '../../../../shared/domain/roles';
import type { InvitePreview } from '../../../../shared/schemas/team';
import { Badge } from '../../../components/ui/badge';
import { formatDate } from '../../../lib/format-time';

/** Who is asking whom to join what, before the invitee commits to anything. */
export function InviteSummary({ invite }: { invite: InvitePreview }) {
  return (
    <div className="rounded-tile bg-asphalt-900 p-4 ring-1 ring-asphalt-700">
      <p className="text-[0.9375rem] text-asphalt-300">
        <span className="font-semibold text-asphalt-100">{invite.invitedByName}</span> invited{' '}
        <span className="font-medium text-asphalt-100">{invite.email}</span> to join
      </p>
      <p className="mt-2 flex items-baseline gap-2">
        <span className="num text-lg font-semibold text-signal-300">{invite.teamNumber}</span>
        <span className="text-lg font-semibold text-asphalt-100">{invite.teamName}</span>
      </p>
      <dl className="mt-3 flex flex-col gap-2 border-t border-asphalt-700 pt-3 text-sm">
        <div className="grid grid-cols-[auto_1fr] items-center gap-x-2 gap-y-1">
          <dt className="text-asphalt-400">Role</dt>
          <dd>
            <Badge tone="signal">{ROLE_LABELS[invite.role]}</Badge>
          </dd>
          <dd className="col-span-2 text-asphalt-300">{ROLE_SUMMARIES[invite.role]}</dd>
        </div>
        <div className="flex gap-2">
          <dt className="text-asphalt-400">Link valid until</dt>
          <dd className="text-asphalt-200">{formatDate(invite.expiresAt)}</dd>
        </div>
      </dl>
    </div>
  );
}
