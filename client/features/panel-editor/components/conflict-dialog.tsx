import { diffDocuments, isEmptyDiff, summarizeDiff } from '../../../../shared/domain/panels/diff';
import type { Panel, PanelDocument } from '../../../../shared/schemas/panel';
import { Button } from '../../../components/ui/button';
import { formatDateTime } from '../../../lib/format-time';
import { EditorDialog } from './editor-dialog';

export type Conflict = { theirs: Panel; base: PanelDocument; mine: PanelDocument };

type ConflictDialogProps = {
  conflict: Conflict | null;
  isSaving: boolean;
  onKeepMine: () => void;
  onLoadTheirs: () => void;
  onClose: () => void;
};

/** Someone saved first. Shows their version and both sets of changes; the working copy stays until the person decides. */
export function ConflictDialog({ conflict, isSaving, onKeepMine, onLoadTheirs, onClose }: ConflictDialogProps) {
  const theirs = conflict?.theirs.latestVersion;
  const theirChanges = conflict ? summarizeDiff(diffDocuments(conflict.base, conflict.theirs.document)) : [];
  const myDiff = conflict ? diffDocuments(conflict.base, conflict.mine) : null;
  const myChanges = myDiff && !isEmptyDiff(myDiff) ? summarizeDiff(myDiff) : [];
  return (
    <EditorDialog
      isOpen={conflict !== null}
      title="Someone else saved this panel first"
      description="Nothing you changed is lost: your working copy stays here until you choose."
      onClose={onClose}
      canClose={!isSaving}
      width="lg"
      footer={
        <>
          <Button onClick={onClose} disabled={isSaving}>
            Decide later
          </Button>
          <Button onClick={onLoadTheirs} disabled={isSaving}>
            Load theirs
          </Button>
          <Button variant="primary" onClick={onKeepMine} isPending={isSaving}>
            Keep mine (save on top)
          </Button>
        </>
      }
    >
      {conflict && theirs && (
        <div className="grid gap-4 md:grid-cols-2">
          <section aria-label="Their version" className="rounded-lg bg-asphalt-900 p-4 ring-1 ring-asphalt-700">
            <h3 className="text-sm font-semibold tracking-wide text-signal-300">
              Their version <span className="num">v{theirs.number}</span>
            </h3>
            <p className="mt-1 text-[0.9375rem] text-asphalt-100">
              {theirs.author.name} · <time dateTime={theirs.createdAt}>{formatDateTime(theirs.createdAt)}</time>
            </p>
            {theirs.message && <p className="mt-1 text-sm text-asphalt-300 italic">“{theirs.message}”</p>}
            <ChangeList lines={theirChanges} empty="No change to the document (a rename or a re-save)." />
          </section>
          <section aria-label="Your changes" className="rounded-lg bg-asphalt-900 p-4 ring-1 ring-asphalt-700">
            <h3 className="text-sm font-semibold tracking-wide text-go">Your unsaved changes</h3>
            <p className="mt-1 text-[0.9375rem] text-asphalt-300">Since the version you opened.</p>
            <ChangeList lines={myChanges} empty="None." />
          </section>
          <p className="text-sm text-asphalt-400 md:col-span-2">
            <strong className="text-asphalt-200">Keep mine</strong> saves your working copy as the next version; their version stays in the history.{' '}
            <strong className="text-asphalt-200">Load theirs</strong> opens their version here; Undo (Ctrl+Z) brings yours back.
          </p>
        </div>
      )}
    </EditorDialog>
  );
}

export function ChangeList({ lines, empty }: { lines: readonly string[]; empty: string }) {
  if (lines.length === 0) return <p className="mt-3 text-sm text-asphalt-400">{empty}</p>;
  return (
    <ul className="mt-3 flex flex-col gap-1 text-sm text-asphalt-200">
      {lines.map((l, i) => (
        <li key={i} className="flex gap-2">
          <span aria-hidden="true" className="mt-1.5 size-1.5 shrink-0 rounded-full bg-asphalt-400" />
          {l}
        </li>
      ))}
    </ul>
  );
}
