import { useState } from 'react';
import { resetRequestBodySchema } from '../../../../shared/schemas/auth';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { TextField } from '../../../components/ui/text-field';
import { useFormErrors } from '../../../hooks/use-form-errors';
import { useRequestPasswordReset } from '../api/password-reset';

const FIELDS = ['email'] as const;

export function ForgotPasswordForm() {
  const request = useRequestPasswordReset();
  const { errors, fail, submitWith, formRef } = useFormErrors(FIELDS);
  const [sentTo, setSentTo] = useState<string | null>(null);
  const submit = submitWith(resetRequestBodySchema, (body) =>
    request.mutate(body, { onSuccess: () => setSentTo(body.email), onError: fail }),
  );

  if (sentTo) {
    return (
      <Notice tone="success" title="Check your e-mail">
        If <span className="font-medium text-asphalt-100">{sentTo}</span> has a Pitwall account, a reset link is on its
        way. The link works for one hour.
      </Notice>
    );
  }

  return (
    <form ref={formRef} onSubmit={submit} noValidate className="flex flex-col gap-4">
      <TextField label="E-mail" name="email" type="email" autoComplete="email" autoFocus error={errors.fields.email} />
      {errors.form && <Notice tone="error">{errors.form}</Notice>}
      <Button type="submit" variant="primary" isPending={request.isPending} className="w-full">
        Send reset link
      </Button>
    </form>
  );
}
