import { useId, useRef, useState } from 'react';
import { RECORDING_KINDS, type RecordingSummary } from '../../../../shared/schemas/recording';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { SelectField } from '../../../components/ui/select-field';
import { cx } from '../../../lib/cx';
import { uploadRecording, type UploadProgress } from '../api/upload';
import { formatBytes, KIND_LABELS, percentOf } from '../model/format';
import type { UploadOutcome } from '../model/upload-outcome';

type UploadState =
  | { step: 'idle' }
  | { step: 'sending'; fileName: string; progress: UploadProgress }
  | { step: 'done'; fileName: string; outcome: UploadOutcome };

type UploadPanelProps = { onStored: (id: string) => void };

/** Drop a Pitwall recording file or a long-form CSV here; the server recognises the format by content. */
export function UploadPanel({ onStored }: UploadPanelProps) {
  const [state, setState] = useState<UploadState>({ step: 'idle' });
  const [kind, setKind] = useState<RecordingSummary['kind'] | ''>('');
  const [isOver, setIsOver] = useState(false);
  const inputRef = useRef<HTMLInputElement>(null);
  const hintId = useId();
  const isSending = state.step === 'sending';

  async function upload(file: File) {
    setState({ step: 'sending', fileName: file.name, progress: { sentBytes: 0, totalBytes: file.size } });
    const outcome = await uploadRecording({
      file,
      kind,
      onProgress: (progress) => setState({ step: 'sending', fileName: file.name, progress }),
    });
    setState({ step: 'done', fileName: file.name, outcome });
    if (outcome.type === 'stored') onStored(outcome.id);
    if (inputRef.current) inputRef.current.value = '';
  }

  return (
    <div className="grid gap-4 lg:grid-cols-[minmax(0,1fr)_14rem]">
      <div
        onDragOver={(e) => {
          e.preventDefault();
          if (!isSending) setIsOver(true);
        }}
        onDragLeave={() => setIsOver(false)}
        onDrop={(e) => {
          e.preventDefault();
          setIsOver(false);
          const file = e.dataTransfer.files[0];
          if (file && !isSending) void upload(file);
        }}
        className={cx(
          'flex flex-col items-center justify-center gap-3 rounded-tile border-2 border-dashed px-6 py-7 text-center transition-colors',
          isOver ? 'border-signal-400 bg-signal-950/60' : 'border-asphalt-600 bg-asphalt-900/60',
        )}
      >
        <svg viewBox="0 0 24 24" aria-hidden="true" className="size-7 text-signal-400" fill="none" stroke="currentColor" strokeWidth="1.75" strokeLinecap="round" strokeLinejoin="round">
          <path d="M12 15V4M7.5 8.5 12 4l4.5 4.5M4 15v4h16v-4" />
        </svg>
        <p className="font-semibold text-asphalt-100">Drop a recording file here</p>
        <p id={hintId} className="max-w-md text-sm text-asphalt-400">
          A Pitwall recording file or a CSV with <code className="text-asphalt-300">time_s,signal,value</code> lines, up to 200 MB.
          The server checks the whole file before storing any of it.
        </p>
        <label className={cx('relative', isSending && 'pointer-events-none opacity-60')}>
          <input
            ref={inputRef}
            type="file"
            name="file"
            aria-describedby={hintId}
            disabled={isSending}
            className="peer sr-only"
            onChange={(e) => {
              const file = e.target.files?.[0];
              if (file) void upload(file);
            }}
          />
          <span className="inline-flex min-h-11 cursor-pointer items-center rounded-lg bg-signal-500 px-4 text-[0.9375rem] font-semibold tracking-wide text-asphalt-950 peer-focus-visible:outline-2 peer-focus-visible:outline-offset-2 peer-focus-visible:outline-signal-400 hover:bg-signal-400">
            Choose a file…
          </span>
        </label>
      </div>

      <div className="flex flex-col gap-3">
        <SelectField
          label="Store as"
          name="upload-kind"
          hint="Practice unless you say otherwise."
          value={kind}
          disabled={isSending}
          onChange={(e) => setKind(RECORDING_KINDS.find((k) => k === e.target.value) ?? '')}
        >
          <option value="">Practice (default)</option>
          {RECORDING_KINDS.map((k) => (
            <option key={k} value={k}>
              {KIND_LABELS[k]}
            </option>
          ))}
        </SelectField>
      </div>

      <div className="lg:col-span-2" aria-live="polite">
        {state.step === 'sending' && <ProgressBar fileName={state.fileName} progress={state.progress} />}
        {state.step === 'done' && <OutcomeNotice fileName={state.fileName} outcome={state.outcome} onDismiss={() => setState({ step: 'idle' })} />}
      </div>
    </div>
  );
}

function ProgressBar({ fileName, progress }: { fileName: string; progress: UploadProgress }) {
  const percent = percentOf(progress.sentBytes, progress.totalBytes);
  const isChecking = progress.totalBytes > 0 && progress.sentBytes >= progress.totalBytes;
  return (
    <div className="rounded-tile bg-asphalt-900 p-3.5 ring-1 ring-asphalt-700">
      <div className="mb-2 flex flex-wrap items-baseline justify-between gap-2 text-sm">
        <span className="font-semibold text-asphalt-100">
          {isChecking ? 'Checking' : 'Uploading'} <span className="text-asphalt-300">{fileName}</span>
        </span>
        <span className="num text-asphalt-300">
          {formatBytes(progress.sentBytes)} of {formatBytes(progress.totalBytes)} · {percent}%
        </span>
      </div>
      <div
        role="progressbar"
        aria-label={`Uploading ${fileName}`}
        aria-valuemin={0}
        aria-valuemax={progress.totalBytes}
        aria-valuenow={progress.sentBytes}
        aria-valuetext={`${percent}%`}
        className="h-2.5 overflow-hidden rounded-full bg-asphalt-750"
      >
        <div className="h-full rounded-full bg-signal-500 transition-[width]" style={{ width: `${percent}%` }} />
      </div>
      {isChecking && <p className="mt-2 text-sm text-asphalt-400">Sent. The server is checking the file before it stores it…</p>}
    </div>
  );
}

function OutcomeNotice({ fileName, outcome, onDismiss }: { fileName: string; outcome: UploadOutcome; onDismiss: () => void }) {
  const dismiss = (
    <Button size="sm" variant="ghost" onClick={onDismiss}>
      Dismiss
    </Button>
  );
  switch (outcome.type) {
    case 'stored':
      return (
        <Notice tone="success" title={`Stored ${fileName}`} action={dismiss}>
          It is highlighted in the list below.
        </Notice>
      );
    case 'rejected':
      return (
        <Notice tone="error" title={`${fileName} wasn’t stored`} action={dismiss}>
          <span className="num text-sm">{outcome.message}</span>
        </Notice>
      );
    case 'too-large':
      return (
        <Notice tone="error" title="File too large" action={dismiss}>
          {fileName} is over the server’s upload limit (200 MB). Export a shorter part of the match, or split the CSV.
        </Notice>
      );
    case 'failed':
      return (
        <Notice tone="error" title="The upload didn’t finish" action={dismiss}>
          {outcome.message}
        </Notice>
      );
  }
}
