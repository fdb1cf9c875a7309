import { useState } from 'react';
import { DEVICE_PRESETS, type Panel } from '../../../../shared/schemas/panel';
import { starterPanelDocument } from '../../../../shared/domain/panels/starter-panel';
import { Notice } from '../../../components/ui/notice';
import { SegmentedControl } from '../../../components/ui/segmented-control';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { mapIssues } from '../../../lib/form-errors';
import { isApiError } from '../../../lib/api-error';
import { errorMessage } from '../../../lib/form-errors';
import { useCreatePanel } from '../api/panels';
import { DEFAULT_CREATE_FORM, readCreateForm, type CreatePanelForm, type PresetChoice } from '../model/library';
import { FormDialog } from './form-dialog';

type CreatePanelDialogProps = { isOpen: boolean; onClose: () => void; onCreated: (panel: Panel) => void };

const PRESET_CHOICES = [...(Object.keys(DEVICE_PRESETS) as (keyof typeof DEVICE_PRESETS)[]), 'custom'] as const;

/** Name, target tablet and orientation of a new panel; it starts as an empty grid fitted to the tablet. */
export function CreatePanelDialog({ isOpen, onClose, onCreated }: CreatePanelDialogProps) {
  const [form, setForm] = useState<CreatePanelForm>(DEFAULT_CREATE_FORM);
  const [errors, setErrors] = useState<Partial<Record<'name' | 'widthPx' | 'heightPx', string>>>({});
  const create = useCreatePanel();
  const set = (patch: Partial<CreatePanelForm>) => setForm((f) => ({ ...f, ...patch }));

  function close() {
    setForm(DEFAULT_CREATE_FORM);
    setErrors({});
    create.reset();
    onClose();
  }

  function submit() {
    const result = readCreateForm(form);
    if (!result.ok) {
      setErrors(result.errors);
      return;
    }
    setErrors({});
    create.mutate(
      { name: result.name, device: result.device, document: starterPanelDocument(result.device) },
      {
        onSuccess: (panel) => {
          close();
          onCreated(panel);
        },
        onError: (e) => {
          if (isApiError(e)) setErrors(mapIssues(e.issues, ['name', 'widthPx', 'heightPx'] as const).fields);
        },
      },
    );
  }

  return (
    <FormDialog
      isOpen={isOpen}
      title="New panel"
      description="It starts as an empty grid sized to the tablet; you can change the tablet later in the designer."
      submitLabel="Create and open"
      isPending={create.isPending}
      onSubmit={submit}
      onCancel={close}
      error={create.isError && <Notice tone="error" title="Couldn’t create the panel">{errorMessage(create.error)}</Notice>}
    >
      <TextField
        label="Name"
        name="name"
        autoComplete="off"
        placeholder="e.g. Gullwing match panel"
        value={form.name}
        error={errors.name}
        maxLength={80}
        onChange={(e) => set({ name: e.target.value })}
      />
      <SelectField label="Target tablet" name="preset" value={form.preset} onChange={(e) => set({ preset: e.target.value as PresetChoice })}>
        {PRESET_CHOICES.map((p) => (
          <option key={p} value={p}>
            {p === 'custom' ? 'Custom size…' : DEVICE_PRESETS[p].label}
          </option>
        ))}
      </SelectField>
      {form.preset === 'custom' && (
        <div className="grid grid-cols-2 gap-3">
          <TextField label="Width (landscape)" name="widthPx" unit="px" inputMode="numeric" isMono value={form.widthPx} error={errors.widthPx} onChange={(e) => set({ widthPx: e.target.value })} />
          <TextField label="Height (landscape)" name="heightPx" unit="px" inputMode="numeric" isMono value={form.heightPx} error={errors.heightPx} onChange={(e) => set({ heightPx: e.target.value })} />
        </div>
      )}
      <SegmentedControl
        legend="Orientation"
        name="orientation"
        value={form.orientation}
        options={[
          { value: 'landscape', label: 'Landscape' },
          { value: 'portrait', label: 'Portrait' },
        ]}
        onChange={(orientation) => set({ orientation })}
      />
    </FormDialog>
  );
}
