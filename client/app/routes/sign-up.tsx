import { useNavigate } from 'react-router-dom';
import { SignUpForm } from '../../features/auth/components/sign-up-form';
import { AuthCard } from '../auth-card';
import { TextLink } from '../text-link';

export function Component() {
  const navigate = useNavigate();
  return (
    <AuthCard
      title="Create your team"
      subtitle="Set up Pitwall for your subteam. Joining an existing team? Ask its lead for an invite instead."
      footer={
        <p>
          Already have an account? <TextLink to="/sign-in">Sign in</TextLink>
        </p>
      }
    >
      <SignUpForm onSignedUp={() => navigate('/', { replace: true })} />
    </AuthCard>
  );
}
