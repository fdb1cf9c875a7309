import { useRef } from 'react';
import type { Panel } from '../../../../shared/schemas/panel';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { isApiError } from '../../../lib/api-error';
import { errorMessage } from '../../../lib/form-errors';
import { useImportPanel } from '../api/panels';
import { importIssueLines, readImportText } from '../model/library';

export type ImportRefusal = { fileName: string; message: string; lines: string[] };

type ImportPanelButtonProps = { onImported: (panel: Panel) => void; onRefused: (refusal: ImportRefusal | null) => void };

/** Choose a Pitwall panel file; the server checks it whole and either adds the panel or lists what is wrong. */
export function ImportPanelButton({ onImported, onRefused }: ImportPanelButtonProps) {
  const inputRef = useRef<HTMLInputElement>(null);
  const importPanel = useImportPanel();
  const setState = (s: { step: 'refused' } & ImportRefusal) => onRefused({ fileName: s.fileName, message: s.message, lines: s.lines });

  async function choose(file: File) {
    onRefused(null);
    const read = readImportText(await file.text(), file.name);
    if (inputRef.current) inputRef.current.value = '';
    if (!read.ok) {
      setState({ step: 'refused', fileName: file.name, message: read.message, lines: [] });
      return;
    }
    importPanel.mutate(read.json, {
      onSuccess: (panel) => onImported(panel),
      onError: (e) =>
        setState({
          step: 'refused',
          fileName: file.name,
          // With issues, the server's one-line message repeats the first of them; say what to do instead.
          message: isApiError(e) && e.issues.length > 0 ? 'Nothing was stored. Fix these in the file and import it again:' : errorMessage(e),
          lines: isApiError(e) ? importIssueLines(e.issues) : [],
        }),
    });
  }

  return (
      <label className="relative">
        <input
          ref={inputRef}
          type="file"
          name="panel-file"
          accept=".json,application/json"
          aria-label="Import a panel file"
          disabled={importPanel.isPending}
          className="peer sr-only"
          onChange={(e) => {
            const file = e.target.files?.[0];
            if (file) void choose(file);
          }}
        />
        <span className="inline-flex min-h-11 cursor-pointer items-center gap-2 rounded-lg bg-asphalt-750 px-4 text-[0.9375rem] font-semibold tracking-wide text-asphalt-100 ring-1 ring-asphalt-600 ring-inset peer-focus-visible:outline-2 peer-focus-visible:outline-offset-2 peer-focus-visible:outline-signal-400 peer-disabled:opacity-60 hover:bg-asphalt-700">
          {importPanel.isPending ? 'Importing…' : 'Import a file…'}
        </span>
      </label>
  );
}

/** What the server (or the file reader) said about a refused file, one line per problem. */
export function ImportRefusalNotice({ refusal, onDismiss }: { refusal: ImportRefusal; onDismiss: () => void }) {
  return (
    <Notice
      tone="error"
      title={`${refusal.fileName} wasn’t imported`}
      action={
        <Button size="sm" variant="ghost" onClick={onDismiss}>
          Dismiss
        </Button>
      }
    >
      <p>{refusal.message}</p>
      {refusal.lines.length > 0 && (
        <ul className="mt-2 list-disc space-y-0.5 pl-5 text-sm" aria-label="What is wrong with the file">
          {refusal.lines.slice(0, 12).map((line, i) => (
            <li key={i}>{line}</li>
          ))}
          {refusal.lines.length > 12 && <li>…and {refusal.lines.length - 12} more</li>}
        </ul>
      )}
    </Notice>
  );
}
