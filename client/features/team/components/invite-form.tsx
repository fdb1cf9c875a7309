import { useState, type ReactNode } from 'react';
import { ROLE_SUMMARIES, roleSchema, type Role } from '../../../../shared/domain/roles';
import { createInviteBodySchema } from '../../../../shared/schemas/team';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { useFormErrors } from '../../../hooks/use-form-errors';
import { useCreateInvite } from '../api/invites';
import { RoleOptions } from './role-options';

const FIELDS = ['email', 'role'] as const;

/** `afterSent` is extra guidance under the confirmation, e.g. where the dev inbox is. */
export function InviteForm({ afterSent }: { afterSent?: ReactNode }) {
  const create = useCreateInvite();
  const { errors, fail, submitWith, formRef } = useFormErrors(FIELDS);
  const [role, setRole] = useState<Role>('programmer');
  const [sentTo, setSentTo] = useState<string | null>(null);

  const submit = submitWith(createInviteBodySchema, (body, form) => {
    setSentTo(null);
    create.mutate(body, {
      onSuccess: (invite) => {
        setSentTo(invite.email);
        form.reset();
        setRole('programmer');
      },
      onError: fail,
    });
  });

  return (
    <form ref={formRef} onSubmit={submit} noValidate className="flex flex-col gap-4">
      <TextField label="E-mail" name="email" type="email" autoComplete="off" error={errors.fields.email} />
      <SelectField
        label="Role"
        name="role"
        value={role}
        onChange={(e) => setRole(roleSchema.parse(e.target.value))}
        hint={ROLE_SUMMARIES[role]}
        error={errors.fields.role}
      >
        <RoleOptions />
      </SelectField>
      {errors.form && <Notice tone="error">{errors.form}</Notice>}
      {sentTo && (
        <Notice tone="success" title={`Invite sent to ${sentTo}`}>
          The link in the e-mail works for 7 days. {afterSent}
        </Notice>
      )}
      <Button type="submit" variant="primary" isPending={create.isPending} className="self-start">
        Send invite
      </Button>
    </form>
  );
}
