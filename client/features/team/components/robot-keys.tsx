import { useState } from 'react';
import { createRobotKeyBodySchema, type CreatedRobotKey, type RobotKey } from '../../../../shared/schemas/team';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { EmptyState } from '../../../components/ui/empty-state';
import { Notice } from '../../../components/ui/notice';
import { QueryGate } from '../../../components/ui/query-gate';
import { TableFrame } from '../../../components/ui/table-frame';
import { TextField } from '../../../components/ui/text-field';
import { useFormErrors } from '../../../hooks/use-form-errors';
import { errorMessage } from '../../../lib/form-errors';
import { formatDate, formatRelative } from '../../../lib/format-time';
import { useCreateRobotKey, useRevokeRobotKey, useRobotKeys } from '../api/robot-keys';
import { robotKeyStatus, sortRobotKeys } from '../model/members';
import { RobotKeySecret } from './robot-key-secret';

const FIELDS = ['name'] as const;

const KEY_COLUMNS = [
  { label: 'Robot' },
  { label: 'Key starts with' },
  { label: 'Created' },
  { label: 'Last used' },
  { label: 'Status' },
  { label: 'Actions', isLabelHidden: true },
];

const STATUS_BADGES = {
  'in-use': <Badge tone="go">In use</Badge>,
  'never-used': <Badge tone="neutral">Not used yet</Badge>,
  revoked: <Badge tone="stop">Revoked</Badge>,
} as const;

export function RobotKeys() {
  const keys = useRobotKeys();
  const create = useCreateRobotKey();
  const revoke = useRevokeRobotKey();
  const { errors, fail, submitWith, formRef } = useFormErrors(FIELDS);
  const [created, setCreated] = useState<CreatedRobotKey | null>(null);
  const [revoking, setRevoking] = useState<RobotKey | null>(null);

  const submit = submitWith(createRobotKeyBodySchema, (body, form) =>
    create.mutate(body, {
      onSuccess: (answer) => {
        setCreated(answer);
        form.reset();
      },
      onError: fail,
    }),
  );

  const now = Date.now();
  return (
    <div className="flex flex-col gap-5">
      {created ? (
        <RobotKeySecret created={created} onDone={() => setCreated(null)} />
      ) : (
        <form ref={formRef} onSubmit={submit} noValidate className="flex flex-wrap items-start gap-3">
          <div className="min-w-64 flex-1">
            <TextField
              label="Robot name"
              name="name"
              autoComplete="off"
              placeholder="Gullwing"
              hint="One key per robot or practice bot, so you can revoke one without touching the others."
              error={errors.fields.name}
            />
          </div>
          <Button type="submit" variant="primary" isPending={create.isPending} className="mt-7">
            Create key
          </Button>
          {errors.form && (
            <Notice tone="error" className="basis-full">
              {errors.form}
            </Notice>
          )}
        </form>
      )}

      <QueryGate query={keys} loadingLabel="Loading robot keys…" errorTitle="Couldn’t load the robot keys">
        {(data) =>
          data.length === 0 ? (
            <EmptyState icon="key" title="No robot keys yet">
              A robot signs in to the relay with a key to send telemetry and read what the operator taps.
            </EmptyState>
          ) : (
            <TableFrame caption="Robot keys" columns={KEY_COLUMNS}>
              {sortRobotKeys(data).map((key) => (
                <tr key={key.id} className={key.revokedAt ? 'bg-asphalt-900 text-asphalt-400' : 'bg-asphalt-850'}>
                  <th scope="row" className="px-4 py-3 font-semibold text-asphalt-100">{key.name}</th>
                  <td className="num px-4 py-3 text-sm text-asphalt-200">{key.prefix}…</td>
                  <td className="px-4 py-3 text-asphalt-300">
                    {formatDate(key.createdAt)}
                    <span className="block text-sm text-asphalt-400">by {key.createdByName}</span>
                  </td>
                  <td className="px-4 py-3 text-asphalt-300">{key.lastUsedAt ? formatRelative(key.lastUsedAt, now) : '—'}</td>
                  <td className="px-4 py-3">{STATUS_BADGES[robotKeyStatus(key)]}</td>
                  <td className="px-4 py-3 text-right">
                    {!key.revokedAt && (
                      <Button
                        size="sm"
                        variant="ghost"
                        aria-label={`Revoke key ${key.name}`}
                        onClick={() => {
                          revoke.reset();
                          setRevoking(key);
                        }}
                      >
                        Revoke
                      </Button>
                    )}
                  </td>
                </tr>
              ))}
            </TableFrame>
          )
        }
      </QueryGate>

      <ConfirmDialog
        isOpen={revoking !== null}
        title={revoking ? `Revoke the key for ${revoking.name}?` : 'Revoke key?'}
        confirmLabel="Revoke key"
        isPending={revoke.isPending}
        error={revoke.isError && <Notice tone="error">{errorMessage(revoke.error)}</Notice>}
        onConfirm={() => revoking && revoke.mutate(revoking.id, { onSuccess: () => setRevoking(null) })}
        onCancel={() => setRevoking(null)}
      >
        A robot using this key can no longer connect to the relay with it. This can’t be undone; you
        can create a new key afterwards.
      </ConfirmDialog>
    </div>
  );
}
