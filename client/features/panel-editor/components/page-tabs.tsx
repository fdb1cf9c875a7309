import { useState } from 'react';
import { MAX_PAGES } from '../../../../shared/domain/panels/layout';
import type { PanelDocument } from '../../../../shared/schemas/panel';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { cx } from '../../../lib/cx';
import type { EditorAction } from '../model/editor-state';
import { IconButton } from './options-editor';

type PageTabsProps = { doc: PanelDocument; pageId: string; canEdit: boolean; dispatch: (a: EditorAction) => void; newPageId: () => string };

/** The panel's pages: switch, add, rename and delete (a panel keeps at least one). */
export function PageTabs({ doc, pageId, canEdit, dispatch, newPageId }: PageTabsProps) {
  const [renaming, setRenaming] = useState<{ id: string; name: string } | null>(null);
  const [deleting, setDeleting] = useState<string | null>(null);
  const current = doc.pages.find((p) => p.id === pageId);
  const toDelete = doc.pages.find((p) => p.id === deleting);

  function finishRename() {
    if (renaming && renaming.name.trim() !== '') dispatch({ type: 'rename-page', pageId: renaming.id, name: renaming.name });
    setRenaming(null);
  }

  return (
    <div className="flex min-w-0 items-center gap-1">
      <div role="tablist" aria-label="Pages" className="flex min-w-0 items-center gap-1 overflow-x-auto">
        {doc.pages.map((p) =>
          renaming?.id === p.id ? (
            <input
              key={p.id}
              autoFocus
              aria-label="Page name"
              value={renaming.name}
              maxLength={40}
              onChange={(e) => setRenaming({ id: p.id, name: e.target.value })}
              onBlur={finishRename}
              onKeyDown={(e) => {
                if (e.key === 'Enter') finishRename();
                if (e.key === 'Escape') setRenaming(null);
              }}
              className="min-h-10 w-36 rounded-md bg-asphalt-900 px-2 text-sm text-asphalt-100 ring-2 ring-signal-500"
            />
          ) : (
            <button
              key={p.id}
              type="button"
              role="tab"
              aria-selected={p.id === pageId}
              onClick={() => dispatch({ type: 'set-page', pageId: p.id })}
              onDoubleClick={() => canEdit && setRenaming({ id: p.id, name: p.name })}
              className={cx(
                'min-h-10 shrink-0 rounded-md px-3 text-sm font-semibold whitespace-nowrap',
                p.id === pageId ? 'bg-asphalt-700 text-asphalt-100 ring-1 ring-signal-500/60' : 'text-asphalt-300 hover:bg-asphalt-800 hover:text-asphalt-100',
              )}
            >
              {p.name}
              <span className="num ml-2 rounded bg-asphalt-800 px-1.5 py-0.5 text-2xs font-normal text-asphalt-400" title={`${p.tiles.length} tiles`}>
                <span className="sr-only">, </span>
                {p.tiles.length}
                <span className="sr-only"> tiles</span>
              </span>
            </button>
          ),
        )}
      </div>
      {canEdit && (
        <>
          {current && !renaming && (
            <IconButton label={`Rename page “${current.name}”`} onClick={() => setRenaming({ id: current.id, name: current.name })} path="M3 13l1-3.5L11 2.5l2.5 2.5L6.5 12 3 13ZM9.5 4l2.5 2.5" />
          )}
          {current && doc.pages.length > 1 && (
            <>
              <IconButton
                label={`Move page “${current.name}” left`}
                isDisabled={doc.pages[0]!.id === current.id}
                onClick={() => dispatch({ type: 'move-page', pageId: current.id, toIndex: doc.pages.indexOf(current) - 1 })}
                path="M10 3 5 8l5 5"
              />
              <IconButton
                label={`Move page “${current.name}” right`}
                isDisabled={doc.pages[doc.pages.length - 1]!.id === current.id}
                onClick={() => dispatch({ type: 'move-page', pageId: current.id, toIndex: doc.pages.indexOf(current) + 1 })}
                path="M6 3l5 5-5 5"
              />
            </>
          )}
          {current && doc.pages.length > 1 && (
            <IconButton
              label={`Delete page “${current.name}”`}
              onClick={() => (current.tiles.length === 0 ? dispatch({ type: 'delete-page', pageId: current.id }) : setDeleting(current.id))}
              path="M3.5 4.5h9M6.5 4.5V3h3v1.5M5 4.5l.5 8.5h5l.5-8.5"
            />
          )}
          <button
            type="button"
            disabled={doc.pages.length >= MAX_PAGES}
            title={doc.pages.length >= MAX_PAGES ? `A panel has at most ${MAX_PAGES} pages` : undefined}
            onClick={() => dispatch({ type: 'add-page', id: newPageId(), name: `Page ${doc.pages.length + 1}` })}
            className="min-h-10 shrink-0 rounded-md px-2.5 text-sm font-semibold text-asphalt-300 hover:bg-asphalt-800 hover:text-asphalt-100 disabled:opacity-40"
          >
            + Page
          </button>
        </>
      )}
      <ConfirmDialog
        isOpen={toDelete !== undefined}
        title={`Delete page “${toDelete?.name ?? ''}”?`}
        confirmLabel="Delete page"
        onCancel={() => setDeleting(null)}
        onConfirm={() => {
          if (toDelete) dispatch({ type: 'delete-page', pageId: toDelete.id });
          setDeleting(null);
        }}
      >
        Its {toDelete?.tiles.length} tiles go with it. Undo (Ctrl+Z) brings the page back until you leave the designer.
      </ConfirmDialog>
    </div>
  );
}
