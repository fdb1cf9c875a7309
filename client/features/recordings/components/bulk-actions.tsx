import { useState } from 'react';
import { can, type Role } from '../../../../shared/domain/roles';
import { RECORDING_KINDS, type RecordingSummary } from '../../../../shared/schemas/recording';
import { Button } from '../../../components/ui/button';
import { buttonClasses } from '../../../components/ui/button-styles';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { controlClasses } from '../../../components/ui/field';
import { Notice } from '../../../components/ui/notice';
import { SelectChevron } from '../../../components/ui/select-chevron';
import { errorMessage } from '../../../lib/form-errors';
import { deleteRecording, exportUrl, runInSequence, updateRecording, useInvalidateRecordings, type BulkProgress } from '../api/recordings';
import { KIND_LABELS, percentOf } from '../model/format';

type BulkActionsProps = {
  role: Role;
  /** The selected recordings (those on the current page; selection is cleared when the view changes). */
  selected: readonly RecordingSummary[];
  onClear: () => void;
};

type Job = { label: string; progress: BulkProgress };

const plural = (n: number) => `${n} recording${n === 1 ? '' : 's'}`;

/** What a member can do with the picked rows; what their role can't do stays visible, disabled, with why. */
export function BulkActions({ role, selected, onClear }: BulkActionsProps) {
  const invalidate = useInvalidateRecordings();
  const [kind, setKind] = useState<RecordingSummary['kind']>('match');
  const [tag, setTag] = useState('');
  const [job, setJob] = useState<Job | null>(null);
  const [isConfirming, setIsConfirming] = useState(false);
  const canManage = can(role, 'recordings.manage');
  const canDelete = can(role, 'recordings.delete');
  const isRunning = job !== null && job.progress.done < job.progress.total;
  const count = selected.length;
  const only = count === 1 ? selected[0] : undefined;
  const manageReason = canManage ? undefined : 'Programmers and leads change recordings.';
  const deleteReason = canDelete ? undefined : 'Only a lead deletes recordings.';
  const trimmedTag = tag.trim();

  async function run(label: string, step: (r: RecordingSummary) => Promise<unknown>) {
    const byId = new Map(selected.map((r) => [r.id, r]));
    const result = await runInSequence(
      selected.map((r) => r.id),
      (id) => step(byId.get(id)!),
      (progress) => setJob({ label, progress }),
      errorMessage,
    );
    await invalidate();
    if (result.failed.length === 0) onClear();
  }

  if (count === 0 && job === null) {
    return (
      <p className="mb-3 text-sm text-asphalt-400">
        Tick recordings to {canManage ? 'change their kind, tag them, ' : ''}export one{canDelete ? ' or delete them' : ''}.
        {!canManage && ' Programmers and leads change recordings.'}
      </p>
    );
  }

  return (
    <div role="region" aria-label="Selected recordings" className="mb-3 rounded-tile bg-asphalt-800 p-3 ring-1 ring-asphalt-600">
      <div className="flex flex-wrap items-end gap-x-4 gap-y-3">
        <p className="num self-center text-sm font-semibold text-asphalt-100">{count === 0 ? 'None selected' : `${plural(count)} selected`}</p>

        <fieldset className="flex items-end gap-2" disabled={!canManage || isRunning || count === 0} title={manageReason}>
          <legend className="sr-only">Set the kind</legend>
          <div className="relative w-36">
            <select aria-label="New kind" value={kind} onChange={(e) => setKind(RECORDING_KINDS.find((k) => k === e.target.value) ?? 'match')} className={`${controlClasses} appearance-none pr-10`}>
              {RECORDING_KINDS.map((k) => (
                <option key={k} value={k}>
                  {KIND_LABELS[k]}
                </option>
              ))}
            </select>
            <SelectChevron />
          </div>
          <Button size="sm" onClick={() => run(`Setting kind to ${KIND_LABELS[kind]}`, (r) => updateRecording(r.id, { kind }))}>
            Set kind
          </Button>
        </fieldset>

        <fieldset className="flex items-end gap-2" disabled={!canManage || isRunning || count === 0} title={manageReason}>
          <legend className="sr-only">Add a tag</legend>
          <input
            aria-label="Tag to add"
            placeholder="Tag to add"
            maxLength={32}
            value={tag}
            onChange={(e) => setTag(e.target.value)}
            className={`${controlClasses} w-40`}
          />
          <Button
            size="sm"
            className="whitespace-nowrap"
            disabled={trimmedTag === ''}
            onClick={() =>
              run(`Adding tag “${trimmedTag}”`, (r) =>
                r.metadata.tags.includes(trimmedTag)
                  ? Promise.resolve()
                  : updateRecording(r.id, { metadata: { tags: [...r.metadata.tags, trimmedTag] } }),
              ).then(() => setTag(''))
            }
          >
            Add tag
          </Button>
        </fieldset>

        <div className="flex items-end gap-2">
          {only ? (
            <>
              <a className={buttonClasses('secondary', 'sm')} href={exportUrl(only.id, 'pitwall')} download>
                Export Pitwall file
              </a>
              <a className={buttonClasses('secondary', 'sm')} href={exportUrl(only.id, 'csv')} download>
                Export CSV
              </a>
            </>
          ) : (
            <Button size="sm" disabled title="Export works on one recording at a time.">
              Export (pick one)
            </Button>
          )}
        </div>

        <div className="ml-auto flex items-end gap-2">
          <Button size="sm" variant="ghost" disabled={count === 0 || isRunning} onClick={onClear}>
            Clear selection
          </Button>
          <Button size="sm" variant="danger" disabled={!canDelete || count === 0 || isRunning} title={deleteReason} onClick={() => setIsConfirming(true)}>
            Delete…
          </Button>
        </div>
      </div>

      {(!canManage || !canDelete) && (
        <p className="mt-2 text-sm text-asphalt-400">
          {manageReason ?? ''} {deleteReason ?? ''} Anyone on the team can export.
        </p>
      )}

      {job && <JobProgress job={job} onDismiss={() => setJob(null)} />}

      <ConfirmDialog
        isOpen={isConfirming}
        title={`Delete ${plural(count)}?`}
        confirmLabel={`Delete ${plural(count)}`}
        isPending={isRunning}
        onCancel={() => setIsConfirming(false)}
        onConfirm={() => {
          setIsConfirming(false);
          void run(`Deleting ${plural(count)}`, (r) => deleteRecording(r.id));
        }}
      >
        Their telemetry, events and notes go with them, for everyone on the team. This can’t be undone; export first if you
        might want them back.
      </ConfirmDialog>
    </div>
  );
}

function JobProgress({ job, onDismiss }: { job: Job; onDismiss: () => void }) {
  const { done, total, failed } = job.progress;
  const isDone = done >= total;
  return (
    <div className="mt-3" aria-live="polite">
      {!isDone ? (
        <div>
          <p className="num mb-1.5 text-sm text-asphalt-200">
            {job.label}: {done} of {total}
          </p>
          <div role="progressbar" aria-label={job.label} aria-valuemin={0} aria-valuemax={total} aria-valuenow={done} className="h-2 overflow-hidden rounded-full bg-asphalt-700">
            <div className="h-full rounded-full bg-signal-500 transition-[width]" style={{ width: `${percentOf(done, total)}%` }} />
          </div>
        </div>
      ) : failed.length === 0 ? (
        <Notice tone="success" title={`${job.label}: done for ${plural(total)}`} action={<Button size="sm" variant="ghost" onClick={onDismiss}>Dismiss</Button>} />
      ) : (
        <Notice tone="error" title={`${job.label}: ${failed.length} of ${total} failed`} action={<Button size="sm" variant="ghost" onClick={onDismiss}>Dismiss</Button>}>
          {failed[0]!.message}
        </Notice>
      )}
    </div>
  );
}
