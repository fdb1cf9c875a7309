import { ForgotPasswordForm } from '../../features/auth/components/forgot-password-form';
import { AuthCard } from '../auth-card';
import { DevInboxHint } from '../dev-inbox-hint';
import { TextLink } from '../text-link';

export function Component() {
  return (
    <AuthCard
      title="Reset your password"
      subtitle="Enter the e-mail address you sign in with. We’ll send a link to choose a new password."
      footer={
        <>
          <p>
            Remembered it? <TextLink to="/sign-in">Sign in</TextLink>
          </p>
          <DevInboxHint>See the mail in the dev inbox</DevInboxHint>
        </>
      }
    >
      <ForgotPasswordForm />
    </AuthCard>
  );
}
