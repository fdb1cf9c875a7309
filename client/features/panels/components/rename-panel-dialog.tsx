import { useState } from 'react';
import { panelNameSchema, type PanelSummary } from '../../../../shared/schemas/panel';
import { Notice } from '../../../components/ui/notice';
import { TextField } from '../../../components/ui/text-field';
import { errorMessage } from '../../../lib/form-errors';
import { useRenamePanel } from '../api/panels';
import { FormDialog } from './form-dialog';

type RenamePanelDialogProps = { panel: PanelSummary | null; onClose: () => void };

/** Renaming saves a new version with the same document, based on the newest one. */
export function RenamePanelDialog({ panel, onClose }: RenamePanelDialogProps) {
  // A fresh form for each panel chosen.
  return <RenameForm key={panel?.id ?? 'none'} panel={panel} onClose={onClose} />;
}

function RenameForm({ panel, onClose }: RenamePanelDialogProps) {
  const [name, setName] = useState(panel?.name ?? '');
  const [error, setError] = useState<string | undefined>();
  const rename = useRenamePanel();

  function submit() {
    if (!panel) return;
    const parsed = panelNameSchema.safeParse(name);
    if (!parsed.success) {
      setError(parsed.error.issues[0]!.message);
      return;
    }
    if (parsed.data === panel.name) {
      onClose();
      return;
    }
    rename.mutate({ id: panel.id, name: parsed.data, baseVersionId: panel.latestVersion.id }, { onSuccess: onClose });
  }

  return (
    <FormDialog
      isOpen={panel !== null}
      title="Rename panel"
      submitLabel="Rename"
      isPending={rename.isPending}
      onSubmit={submit}
      onCancel={onClose}
      error={rename.isError && <Notice tone="error" title="Couldn’t rename the panel">{errorMessage(rename.error)}</Notice>}
    >
      <TextField label="Name" name="name" autoComplete="off" value={name} maxLength={80} error={error} onChange={(e) => setName(e.target.value)} />
    </FormDialog>
  );
}
