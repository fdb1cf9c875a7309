import { useSearchParams } from 'react-router-dom';
import { ButtonLink } from '../../components/ui/button-link';
import { Notice } from '../../components/ui/notice';
import { ResetPasswordForm } from '../../features/auth/components/reset-password-form';
import { AuthCard } from '../auth-card';

export function Component() {
  const [params] = useSearchParams();
  const token = params.get('token');
  return (
    <AuthCard title="Choose a new password" subtitle="After this, every device signed in with the old one is signed out.">
      {token ? (
        <ResetPasswordForm token={token} />
      ) : (
        <div className="flex flex-col gap-4">
          <Notice tone="error" title="This reset link is incomplete">
            Open the link from the e-mail exactly as it arrived, or ask for a new one.
          </Notice>
          <ButtonLink to="/forgot" variant="primary">
            Ask for a new link
          </ButtonLink>
        </div>
      )}
    </AuthCard>
  );
}
