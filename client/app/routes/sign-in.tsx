import { useQuery } from '@tanstack/react-query';
import { Navigate, useNavigate, useSearchParams } from 'react-router-dom';
import { Notice } from '../../components/ui/notice';
import { meQuery } from '../../features/auth/api/me';
import { SignInForm } from '../../features/auth/components/sign-in-form';
import { safeNextPath } from '../../features/auth/model/safe-next-path';
import { AuthCard } from '../auth-card';
import { DevInboxHint } from '../dev-inbox-hint';
import { TextLink } from '../text-link';

export function Component() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const next = safeNextPath(params.get('next'));
  const me = useQuery({ ...meQuery(), retry: false });

  if (me.isSuccess) return <Navigate to={next} replace />;

  return (
    <AuthCard
      title="Sign in"
      subtitle="Welcome back to the pit."
      footer={
        <>
          <p>
            New team? <TextLink to="/sign-up">Create one</TextLink>
          </p>
          <DevInboxHint />
        </>
      }
    >
      {params.has('next') && (
        <Notice tone="info" className="mb-4">
          Sign in to continue. You’ll go straight back to the page you were on.
        </Notice>
      )}
      <SignInForm onSignedIn={() => navigate(next, { replace: true })} />
    </AuthCard>
  );
}
