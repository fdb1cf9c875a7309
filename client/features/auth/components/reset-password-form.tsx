import { useState } from 'react';
import { resetConfirmBodySchema } from '../../../../shared/schemas/auth';
import { Button } from '../../../components/ui/button';
import { ButtonLink } from '../../../components/ui/button-link';
import { Notice } from '../../../components/ui/notice';
import { TextField } from '../../../components/ui/text-field';
import { useFormErrors } from '../../../hooks/use-form-errors';
import { useConfirmPasswordReset } from '../api/password-reset';

const FIELDS = ['password'] as const;

export function ResetPasswordForm({ token }: { token: string }) {
  const confirm = useConfirmPasswordReset();
  const { errors, fail, submitWith, formRef } = useFormErrors(FIELDS);
  const [isDone, setIsDone] = useState(false);
  const submit = submitWith(
    resetConfirmBodySchema,
    (body) => confirm.mutate(body, { onSuccess: () => setIsDone(true), onError: fail }),
    { token },
  );

  if (isDone) {
    return (
      <div className="flex flex-col gap-4">
        <Notice tone="success" title="Password changed">
          Every device that was signed in with the old password has been signed out.
        </Notice>
        <ButtonLink to="/sign-in" variant="primary" className="w-full">
          Sign in
        </ButtonLink>
      </div>
    );
  }

  return (
    <form ref={formRef} onSubmit={submit} noValidate className="flex flex-col gap-4">
      <TextField
        label="New password"
        name="password"
        type="password"
        autoComplete="new-password"
        autoFocus
        hint="At least 10 characters."
        error={errors.fields.password}
      />
      {errors.form && <Notice tone="error">{errors.form}</Notice>}
      <Button type="submit" variant="primary" isPending={confirm.isPending} className="w-full">
        Set new password
      </Button>
    </form>
  );
}
