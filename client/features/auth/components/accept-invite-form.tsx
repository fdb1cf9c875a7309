import { acceptInviteBodySchema } from '../../../../shared/schemas/team';
import type { Me } from '../../../../shared/schemas/auth';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { TextField } from '../../../components/ui/text-field';
import { useFormErrors } from '../../../hooks/use-form-errors';
import { useAcceptInvite } from '../api/invite';

const FIELDS = ['name', 'password'] as const;

export function AcceptInviteForm({ token, onAccepted }: { token: string; onAccepted: (me: Me) => void }) {
  const accept = useAcceptInvite(token);
  const { errors, fail, submitWith, formRef } = useFormErrors(FIELDS);
  const submit = submitWith(acceptInviteBodySchema, (body) => accept.mutate(body, { onSuccess: onAccepted, onError: fail }));

  return (
    <form ref={formRef} onSubmit={submit} noValidate className="flex flex-col gap-4">
      <TextField label="Name" name="name" autoComplete="name" autoFocus error={errors.fields.name} />
      <TextField
        label="Password"
        name="password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
        error={errors.fields.password}
      />
      {errors.form && <Notice tone="error">{errors.form}</Notice>}
      <Button type="submit" variant="primary" isPending={accept.isPending} className="w-full">
        Accept invite
      </Button>
    </form>
  );
}
