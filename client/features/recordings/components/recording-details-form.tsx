import { useState, type ReactNode } from 'react';
import { ROLE_LABELS, type Role } from '../../../../shared/domain/roles';
import { ALLIANCES } from '../../../../shared/domain/season/season-profile';
import { MATCH_TYPES, RECORDING_KINDS, type RecordingDetail } from '../../../../shared/schemas/recording';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { controlClasses, Field } from '../../../components/ui/field';
import { Notice } from '../../../components/ui/notice';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { useFormErrors } from '../../../hooks/use-form-errors';
import { ApiError, isApiError } from '../../../lib/api-error';
import { useUpdateRecording } from '../api/recordings';
import {
  DETAILS_FIELDS,
  detailsFormSchema,
  formFromRecording,
  hasDetailChanges,
  issuesOnFields,
  parseTags,
  type DetailsField,
  type DetailsValues,
} from '../model/details-form';
import { ALLIANCE_LABELS, KIND_LABELS, MATCH_TYPE_LABELS } from '../model/format';

type RecordingDetailsFormProps = { recording: RecordingDetail; role: Role; canEdit: boolean };

/** Kind and metadata of one recording: a form for leads and programmers, plain text for everyone else. */
export function RecordingDetailsForm({ recording, role, canEdit }: RecordingDetailsFormProps) {
  if (!canEdit) return <ReadOnlyDetails recording={recording} role={role} />;
  return <EditableDetails recording={recording} />;
}

function EditableDetails({ recording }: { recording: RecordingDetail }) {
  const save = useUpdateRecording(recording.id);
  const { errors, fail, submitWith, formRef } = useFormErrors(DETAILS_FIELDS);
  const [values, setValues] = useState<DetailsValues>(() => formFromRecording(recording));
  const [isJustSaved, setIsJustSaved] = useState(false);
  const isDirty = hasDetailChanges(values, recording);
  const tags = parseTags(values['metadata.tags']);

  const set = (field: DetailsField) => (e: { target: { value: string } }) => {
    setValues((v) => ({ ...v, [field]: e.target.value }));
    setIsJustSaved(false);
  };
  const text = (field: DetailsField, label: string, extra: { hint?: ReactNode; inputMode?: 'numeric'; isMono?: boolean } = {}) => (
    <TextField label={label} name={field} autoComplete="off" value={values[field]} onChange={set(field)} error={errors.fields[field]} {...extra} />
  );
  const select = (field: DetailsField, label: string, options: readonly { value: string; label: string }[], blank?: string) => (
    <SelectField label={label} name={field} value={values[field]} onChange={set(field)} error={errors.fields[field]}>
      {blank !== undefined && <option value="">{blank}</option>}
      {options.map((o) => (
        <option key={o.value} value={o.value}>
          {o.label}
        </option>
      ))}
    </SelectField>
  );

  const submit = submitWith(detailsFormSchema, (patch) => {
    setIsJustSaved(false);
    save.mutate(patch, {
      onSuccess: (saved) => {
        setValues(formFromRecording(saved));
        setIsJustSaved(true);
      },
      // Issues about one tag (`metadata.tags.2`) land on the tags field.
      onError: (error) => fail(isApiError(error) ? new ApiError(error.status, error.code, error.message, issuesOnFields(error.issues)) : error),
    });
  });

  return (
    <form ref={formRef} onSubmit={submit} noValidate aria-label="Recording details" className="flex flex-col gap-4">
      <fieldset disabled={save.isPending} className="grid gap-4 sm:grid-cols-2">
        {select('kind', 'Kind', RECORDING_KINDS.map((k) => ({ value: k, label: KIND_LABELS[k] })))}
        {text('metadata.event', 'Event')}
        {select('metadata.matchType', 'Match type', MATCH_TYPES.map((t) => ({ value: t, label: MATCH_TYPE_LABELS[t].long })), 'Not set')}
        {text('metadata.matchNumber', 'Match number', { inputMode: 'numeric', isMono: true })}
        {select('metadata.alliance', 'Alliance', ALLIANCES.map((a) => ({ value: a, label: ALLIANCE_LABELS[a] })), 'Not set')}
        {select('metadata.station', 'Station', ['1', '2', '3'].map((s) => ({ value: s, label: `Station ${s}` })), 'Not set')}
        <div className="sm:col-span-2">{text('metadata.operatorName', 'Operator')}</div>
        <div className="sm:col-span-2">
          {text('metadata.tags', 'Tags', {
            hint:
              tags.length > 0 ? (
                <span className="flex flex-wrap gap-1.5" aria-label="Tags to save">
                  {tags.map((t) => (
                    <Badge key={t}>{t}</Badge>
                  ))}
                </span>
              ) : (
                'Separate tags with commas.'
              ),
          })}
        </div>
        <div className="sm:col-span-2">
          <Field label="Notes" error={errors.fields['metadata.notes']}>
            {(control) => (
              <textarea
                {...control}
                name="metadata.notes"
                rows={3}
                value={values['metadata.notes']}
                onChange={set('metadata.notes')}
                className={`${controlClasses} py-2`}
              />
            )}
          </Field>
        </div>
      </fieldset>

      {errors.form && <Notice tone="error">{errors.form}</Notice>}
      {isJustSaved && !isDirty && <Notice tone="success" title="Details saved" />}

      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" variant="primary" isPending={save.isPending}>
          Save details
        </Button>
        <Button
          variant="ghost"
          disabled={!isDirty || save.isPending}
          onClick={() => {
            setValues(formFromRecording(recording));
            setIsJustSaved(false);
          }}
        >
          Discard changes
        </Button>
        {isDirty && <Badge tone="signal">Unsaved changes</Badge>}
      </div>
    </form>
  );
}

function ReadOnlyDetails({ recording: r, role }: { recording: RecordingDetail; role: Role }) {
  const m = r.metadata;
  const facts: [string, string][] = [
    ['Kind', KIND_LABELS[r.kind]],
    ['Event', m.event ?? '—'],
    ['Match type', m.matchType ? MATCH_TYPE_LABELS[m.matchType].long : '—'],
    ['Match number', m.matchNumber === null ? '—' : String(m.matchNumber)],
    ['Alliance', m.alliance ? ALLIANCE_LABELS[m.alliance] : '—'],
    ['Station', m.station === null ? '—' : String(m.station)],
    ['Operator', m.operatorName ?? '—'],
    ['Tags', m.tags.length > 0 ? m.tags.join(', ') : '—'],
  ];
  return (
    <div className="flex flex-col gap-4">
      <Notice tone="info" title="Read only for your role">
        You’re signed in as {ROLE_LABELS[role].toLowerCase()}. Leads and programmers change a recording’s details, because the
        recordings list filters and sorts by them.
      </Notice>
      <dl className="grid gap-x-6 gap-y-3 sm:grid-cols-2" aria-label="Recording details">
        {facts.map(([label, value]) => (
          <div key={label}>
            <dt className="text-xs font-semibold tracking-[0.14em] text-asphalt-400 uppercase">{label}</dt>
            <dd className="mt-1 text-asphalt-100">{value}</dd>
          </div>
        ))}
        <div className="sm:col-span-2">
          <dt className="text-xs font-semibold tracking-[0.14em] text-asphalt-400 uppercase">Notes</dt>
          <dd className="mt-1 whitespace-pre-wrap text-asphalt-200">{m.notes || '—'}</dd>
        </div>
      </dl>
    </div>
  );
}
