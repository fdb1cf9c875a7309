import { useQuery, type QueryKey, type UseQueryResult } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { diffDocuments, isEmptyDiff, summarizeDiff, type PanelDiff } from '../../../../shared/domain/panels/diff';
import type { PanelVersion, PanelVersionSummary } from '../../../../shared/schemas/panel';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { Loading } from '../../../components/ui/loading';
import { Notice } from '../../../components/ui/notice';
import { QueryError } from '../../../components/ui/query-error';
import { cx } from '../../../lib/cx';
import { errorMessage } from '../../../lib/form-errors';
import { formatDateTime } from '../../../lib/format-time';
import { ChoiceField } from './property-fields';
import { EditorDialog } from './editor-dialog';

/** Query options for one version (the route supplies the panels API's key and fetcher). */
export type VersionQuery = (versionId: string) => { queryKey: QueryKey; queryFn: () => Promise<PanelVersion>; staleTime?: number };

type VersionsDialogProps = {
  isOpen: boolean;
  onClose: () => void;
  versions: UseQueryResult<PanelVersionSummary[]>;
  versionQuery: VersionQuery;
  publishedVersionId: string | null;
  baseVersionId: string;
  canEdit: boolean;
  isDirty: boolean;
  onRestore: (version: PanelVersion) => void;
  onPublish: (version: PanelVersionSummary) => void;
  publishingId: string | null;
  publishError: unknown;
};

const EMPTY: PanelDiff = { added: [], removed: [], moved: [], resized: [], changed: [], pagesAdded: [], pagesRemoved: [], pagesRenamed: [], pagesReordered: false, device: null, grid: null, theme: [] };

/** The diff's lines by kind of change, so each kind gets its own colour. */
function groupedLines(diff: PanelDiff) {
  return [
    { key: 'added', label: 'Added', tone: 'text-go', dot: 'bg-go', lines: summarizeDiff({ ...EMPTY, added: diff.added }, { showPages: true }) },
    { key: 'removed', label: 'Removed', tone: 'text-stop', dot: 'bg-stop', lines: summarizeDiff({ ...EMPTY, removed: diff.removed }, { showPages: true }) },
    { key: 'moved', label: 'Moved or resized', tone: 'text-sky', dot: 'bg-sky', lines: summarizeDiff({ ...EMPTY, moved: diff.moved, resized: diff.resized }, { showPages: true }) },
    { key: 'changed', label: 'Changed', tone: 'text-signal-300', dot: 'bg-signal-400', lines: summarizeDiff({ ...EMPTY, changed: diff.changed }, { showPages: true }) },
    {
      key: 'panel',
      label: 'Pages, tablet and theme',
      tone: 'text-asphalt-200',
      dot: 'bg-asphalt-300',
      lines: summarizeDiff({ ...EMPTY, pagesAdded: diff.pagesAdded, pagesRemoved: diff.pagesRemoved, pagesRenamed: diff.pagesRenamed, pagesReordered: diff.pagesReordered, device: diff.device, grid: diff.grid, theme: diff.theme }),
    },
  ].filter((g) => g.lines.length > 0);
}

/** Every saved version: compare two, restore one into the designer, publish one for the driver station. */
export function VersionsDialog(props: VersionsDialogProps) {
  const { isOpen, onClose, versions } = props;
  return (
    <EditorDialog isOpen={isOpen} onClose={onClose} width="xl" title="Versions" description="Every save is a version. The published one is what the driver station runs.">
      {versions.isPending ? (
        <Loading label="Loading versions…" />
      ) : versions.isError ? (
        <QueryError title="Couldn’t load the versions" error={versions.error} onRetry={() => versions.refetch()} isRetrying={versions.isFetching} />
      ) : (
        <VersionsBody {...props} list={versions.data} />
      )}
    </EditorDialog>
  );
}

function VersionsBody({ list, versionQuery, publishedVersionId, baseVersionId, canEdit, isDirty, onRestore, onPublish, publishingId, publishError }: VersionsDialogProps & { list: PanelVersionSummary[] }) {
  const newestFirst = [...list].sort((a, b) => b.number - a.number);
  const [fromId, setFromId] = useState(newestFirst[1]?.id ?? newestFirst[0]?.id ?? '');
  const [toId, setToId] = useState(newestFirst[0]?.id ?? '');
  const [restoringId, setRestoringId] = useState<string | null>(null);
  const from = useQuery({ ...versionQuery(fromId), enabled: fromId !== '' });
  const to = useQuery({ ...versionQuery(toId), enabled: toId !== '' });
  const restoring = useQuery({ ...versionQuery(restoringId ?? ''), enabled: restoringId !== null });

  useEffect(() => {
    if (restoringId && restoring.data) {
      onRestore(restoring.data);
      setRestoringId(null);
    }
  }, [restoringId, restoring.data, onRestore]);

  const diff = from.data && to.data ? diffDocuments(from.data.document, to.data.document) : null;
  const options = newestFirst.map((v) => ({ value: v.id, label: `v${v.number} · ${v.author.name}` }));

  return (
    <div className="grid gap-5 lg:grid-cols-[minmax(0,1.1fr)_minmax(0,1fr)]">
      <section aria-label="Version history">
        {publishError != null && (
          <Notice tone="error" title="Couldn’t publish" className="mb-3">
            {errorMessage(publishError)}
          </Notice>
        )}
        {restoring.isError && (
          <Notice tone="error" title="Couldn’t load that version" className="mb-3">
            {errorMessage(restoring.error)}
          </Notice>
        )}
        <ol className="flex flex-col divide-y divide-asphalt-750 overflow-hidden rounded-lg ring-1 ring-asphalt-700" aria-label="Versions, newest first">
          {newestFirst.map((v) => {
            const isPublished = v.id === publishedVersionId;
            return (
              <li key={v.id} data-version-number={v.number} className={cx('flex flex-wrap items-start justify-between gap-2 bg-asphalt-900 px-3 py-2.5', (v.id === fromId || v.id === toId) && 'bg-asphalt-800')}>
                <div className="min-w-0">
                  <p className="flex flex-wrap items-center gap-2">
                    <span className="num font-semibold text-asphalt-100">v{v.number}</span>
                    {isPublished && <Badge tone="go">Published</Badge>}
                    {v.id === baseVersionId && <Badge tone="neutral">{isDirty ? 'Opened · edited' : 'Open here'}</Badge>}
                  </p>
                  <p className="text-sm text-asphalt-300">
                    {v.author.name} · <time dateTime={v.createdAt}>{formatDateTime(v.createdAt)}</time>
                  </p>
                  {v.message && <p className="mt-0.5 text-sm text-asphalt-400 italic">“{v.message}”</p>}
                </div>
                {canEdit && (
                  <div className="flex gap-1">
                    <Button size="sm" variant="ghost" isPending={restoringId === v.id} onClick={() => setRestoringId(v.id)} aria-label={`Restore v${v.number} into the designer`}>
                      Restore
                    </Button>
                    {!isPublished && (
                      <Button size="sm" variant="secondary" isPending={publishingId === v.id} disabled={publishingId !== null} onClick={() => onPublish(v)} aria-label={`Publish v${v.number}`}>
                        Publish
                      </Button>
                    )}
                  </div>
                )}
              </li>
            );
          })}
        </ol>
        {canEdit && <p className="mt-2 text-sm text-asphalt-400">Restore opens that version as your working copy; save to make it the newest version.</p>}
      </section>

      <section aria-label="What changed" className="flex flex-col gap-3">
        <h3 className="text-sm font-semibold tracking-wide text-asphalt-100">What changed</h3>
        <div className="grid grid-cols-2 gap-2">
          <ChoiceField name="compare-from" label="From" value={fromId} options={options} onChange={setFromId} />
          <ChoiceField name="compare-to" label="To" value={toId} options={options} onChange={setToId} />
        </div>
        {from.isPending || to.isPending ? (
          <Loading label="Loading both versions…" />
        ) : from.isError || to.isError ? (
          <Notice tone="error" title="Couldn’t load a version">
            {errorMessage(from.error ?? to.error)}
          </Notice>
        ) : diff && isEmptyDiff(diff) ? (
          <p className="rounded-lg bg-asphalt-900 p-3 text-sm text-asphalt-300 ring-1 ring-asphalt-700">{fromId === toId ? 'Pick two different versions.' : 'The two versions hold the same panel.'}</p>
        ) : diff ? (
          <div className="flex flex-col gap-3" data-testid="version-diff">
            {groupedLines(diff).map((g) => (
              <div key={g.key}>
                <p className={cx('text-2xs font-semibold tracking-[0.14em] uppercase', g.tone)}>
                  {g.label} · {g.lines.length}
                </p>
                <ul className="mt-1 flex flex-col gap-1 text-sm text-asphalt-200">
                  {g.lines.map((l, i) => (
                    <li key={i} className="flex gap-2">
                      <span aria-hidden="true" className={cx('mt-1.5 size-1.5 shrink-0 rounded-full', g.dot)} />
                      {l}
                    </li>
                  ))}
                </ul>
              </div>
            ))}
          </div>
        ) : null}
      </section>
    </div>
  );
}
