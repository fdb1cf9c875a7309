import { signUpBodySchema, type Me } from '../../../../shared/schemas/auth';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { TextField } from '../../../components/ui/text-field';
import { useFormErrors } from '../../../hooks/use-form-errors';
import { useSignUp } from '../api/sign-up';

const FIELDS = ['name', 'email', 'password', 'teamNumber', 'teamName'] as const;

export function SignUpForm({ onSignedUp }: { onSignedUp: (me: Me) => void }) {
  const signUp = useSignUp();
  const { errors, fail, submitWith, formRef } = useFormErrors(FIELDS);
  const submit = submitWith(signUpBodySchema, (body) => signUp.mutate(body, { onSuccess: onSignedUp, onError: fail }));

  return (
    <form ref={formRef} onSubmit={submit} noValidate className="flex flex-col gap-4">
      <fieldset className="flex flex-col gap-4">
        <legend className="mb-3 text-xs font-semibold tracking-[0.16em] text-asphalt-400 uppercase">You</legend>
        <TextField label="Name" name="name" autoComplete="name" autoFocus error={errors.fields.name} />
        <TextField label="E-mail" name="email" type="email" autoComplete="email" error={errors.fields.email} />
        <TextField
          label="Password"
          name="password"
          type="password"
          autoComplete="new-password"
          hint="At least 10 characters. A short sentence works well."
          error={errors.fields.password}
        />
      </fieldset>
      <fieldset className="mt-2 flex flex-col gap-4 border-t border-asphalt-700 pt-5">
        <legend className="mb-3 text-xs font-semibold tracking-[0.16em] text-asphalt-400 uppercase">Your team</legend>
        <div className="grid grid-cols-[8.5rem_1fr] gap-3">
          <TextField
            label="Team number"
            name="teamNumber"
            inputMode="numeric"
            autoComplete="off"
            isMono
            error={errors.fields.teamNumber}
          />
          <TextField label="Team name" name="teamName" autoComplete="organization" error={errors.fields.teamName} />
        </div>
      </fieldset>
      <p className="text-sm text-asphalt-400">
        You become the team’s lead. Invite programmers, operators and coaches from Team settings afterwards.
      </p>
      {errors.form && <Notice tone="error">{errors.form}</Notice>}
      <Button type="submit" variant="primary" isPending={signUp.isPending} className="w-full">
        Create team
      </Button>
    </form>
  );
}
