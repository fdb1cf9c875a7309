import { Link } from 'react-router-dom';
import { signInBodySchema, type Me } from '../../../../shared/schemas/auth';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { TextField } from '../../../components/ui/text-field';
import { useFormErrors } from '../../../hooks/use-form-errors';
import { useSignIn } from '../api/sign-in';

const FIELDS = ['email', 'password'] as const;

export function SignInForm({ onSignedIn }: { onSignedIn: (me: Me) => void }) {
  const signIn = useSignIn();
  const { errors, fail, submitWith, formRef } = useFormErrors(FIELDS);
  const submit = submitWith(signInBodySchema, (body) => signIn.mutate(body, { onSuccess: onSignedIn, onError: fail }));

  return (
    <form ref={formRef} onSubmit={submit} noValidate className="flex flex-col gap-4">
      <TextField label="E-mail" name="email" type="email" autoComplete="email" autoFocus error={errors.fields.email} />
      <TextField
        label="Password"
        name="password"
        type="password"
        autoComplete="current-password"
        error={errors.fields.password}
      />
      {errors.form && <Notice tone="error">{errors.form}</Notice>}
      <Button type="submit" variant="primary" isPending={signIn.isPending} className="mt-1 w-full">
        Sign in
      </Button>
      <p className="text-center text-sm">
        <Link to="/forgot" className="inline-flex min-h-11 items-center font-medium text-signal-300 underline-offset-4 hover:underline">
          Forgot your password?
        </Link>
      </p>
    </form>
  );
}
