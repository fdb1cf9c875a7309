import { useNavigate, useParams } from 'react-router-dom';
import { ButtonLink } from '../../components/ui/button-link';
import { Loading } from '../../components/ui/loading';
import { Notice } from '../../components/ui/notice';
import { QueryError } from '../../components/ui/query-error';
import { useInvitePreview } from '../../features/auth/api/invite';
import { AcceptInviteForm } from '../../features/auth/components/accept-invite-form';
import { InviteSummary } from '../../features/auth/components/invite-summary';
import { isApiError } from '../../lib/api-error';
import { AuthCard } from '../auth-card';

export function Component() {
  const { token = '' } = useParams();
  const navigate = useNavigate();
  const invite = useInvitePreview(token);

  if (invite.isPending) {
    return (
      <AuthCard title="Join a team">
        <Loading label="Checking the invite…" />
      </AuthCard>
    );
  }

  if (invite.isError) {
    const isGone = isApiError(invite.error) && (invite.error.status === 404 || invite.error.status === 400);
    return (
      <AuthCard title="Join a team">
        {isGone ? (
          <div className="flex flex-col gap-4">
            <Notice tone="error" title="This invite can’t be used">
              It may have expired, been revoked, or been accepted already. Ask your team’s lead to send a new one.
            </Notice>
            <ButtonLink to="/sign-in">Go to sign in</ButtonLink>
          </div>
        ) : (
          <QueryError title="Couldn’t check the invite" error={invite.error} onRetry={() => invite.refetch()} isRetrying={invite.isFetching} />
        )}
      </AuthCard>
    );
  }

  return (
    <AuthCard
      title={`Join ${invite.data.teamName}`}
      subtitle="Choose your name as the team will see it, and a password for this e-mail address."
    >
      <div className="flex flex-col gap-6">
        <InviteSummary invite={invite.data} />
        <AcceptInviteForm token={token} onAccepted={() => navigate('/', { replace: true })} />
      </div>
    </AuthCard>
  );
}
