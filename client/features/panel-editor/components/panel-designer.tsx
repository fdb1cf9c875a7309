import { DndContext, DragOverlay, MouseSensor, TouchSensor, useSensor, useSensors, type DragEndEvent, type DragStartEvent } from '@dnd-kit/core';
import type { UseQueryResult } from '@tanstack/react-query';
import { useCallback, useEffect, useMemo, useReducer, useRef, useState } from 'react';
import { Link, useBlocker } from 'react-router-dom';
import { checkPanel, type PanelIssue } from '../../../../shared/domain/panels/check';
import { pxToCell } from '../../../../shared/domain/panels/grid';
import { canRedo, canUndo } from '../../../../shared/domain/panels/history';
import type { AlignEdge } from '../../../../shared/domain/panels/layout';
import type { Panel, PanelSummary, PanelVersion, PanelVersionSummary, TileKind, UpdatePanelBody } from '../../../../shared/schemas/panel';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { Notice } from '../../../components/ui/notice';
import { isApiError } from '../../../lib/api-error';
import { cx } from '../../../lib/cx';
import { errorMessage } from '../../../lib/form-errors';
import { currentDocument, currentPage, editorReducer, initialEditorState, isDirty, selectedTiles, type EditorAction } from '../model/editor-state';
import { CheckList } from './check-list';
import { ConflictDialog, type Conflict } from './conflict-dialog';
import { ContractDialog } from './contract-dialog';
import { CANVAS_DROP_ID, DesignCanvas, type CanvasGeometry } from './design-canvas';
import { IconButton } from './options-editor';
import { PageTabs } from './page-tabs';
import { PanelSettings } from './panel-settings';
import { ThemeEditor } from './theme-editor';
import { PALETTE_PREFIX, PaletteDragChip, TilePalette } from './tile-palette';
import { TileProperties } from './tile-properties';
import { VersionsDialog, type VersionQuery } from './versions-dialog';

/** What the designer needs from the server; the route wires it to the panels API. */
export type DesignerApi = {
  save: (body: UpdatePanelBody) => Promise<Panel>;
  /** The panel as it is now on the server (after a 409). */
  loadCurrent: () => Promise<Panel>;
  publish: (versionId: string) => Promise<PanelSummary>;
};

type PanelDesignerProps = {
  panel: Panel;
  canEdit: boolean;
  /** The `reads` of the connected robot; undefined when none is connected. */
  robotReads: readonly string[] | undefined;
  /** One line on where the robot's reads came from, or why there are none. */
  robotNote: string;
  versions: UseQueryResult<PanelVersionSummary[]>;
  versionQuery: VersionQuery;
  api: DesignerApi;
  /** A fresh id for a tile or page. */
  newId: () => string;
};

type SaveState = { step: 'idle' } | { step: 'saving' } | { step: 'saved'; number: number } | { step: 'failed'; error: unknown };

const ALIGN: { edge: AlignEdge; label: string; path: string }[] = [
  { edge: 'left', label: 'Align left edges', path: 'M2.5 2v12M5 4.5h8M5 8h5M5 11.5h7' },
  { edge: 'centre-x', label: 'Align horizontal centres', path: 'M8 2v12M3.5 4.5h9M5 8h6M4 11.5h8' },
  { edge: 'right', label: 'Align right edges', path: 'M13.5 2v12M3 4.5h8M6 8h5M4 11.5h7' },
  { edge: 'top', label: 'Align top edges', path: 'M2 2.5h12M4.5 5v8M8 5v5M11.5 5v7' },
  { edge: 'centre-y', label: 'Align vertical centres', path: 'M2 8h12M4.5 3.5v9M8 5v6M11.5 4v8' },
  { edge: 'bottom', label: 'Align bottom edges', path: 'M2 13.5h12M4.5 3v8M8 6v5M11.5 4v7' },
];

/** The panel designer: palette, canvas, properties, the live panel check, save with conflicts, versions and the contract. */
export function PanelDesigner({ panel, canEdit, robotReads, robotNote, versions, versionQuery, api, newId }: PanelDesignerProps) {
  const [state, dispatch] = useReducer(editorReducer, undefined, () => initialEditorState(panel.document, panel.latestVersion.id));
  const [saveState, setSaveState] = useState<SaveState>({ step: 'idle' });
  const [message, setMessage] = useState('');
  const [conflict, setConflict] = useState<Conflict | null>(null);
  const [dialog, setDialog] = useState<'versions' | 'contract' | 'publish' | null>(null);
  const [publishing, setPublishing] = useState<{ id: string; number: number } | null>(null);
  const [publishError, setPublishError] = useState<unknown>(null);
  const [publishedId, setPublishedId] = useState(panel.publishedVersion?.id ?? null);
  const [dragKind, setDragKind] = useState<TileKind | null>(null);
  const geometryRef = useRef<CanvasGeometry>({ element: null, scale: 1 });

  const doc = currentDocument(state);
  const page = currentPage(state);
  const dirty = isDirty(state);
  const selected = selectedTiles(state);
  const issues = useMemo(() => checkPanel(doc, { robotReads }), [doc, robotReads]);
  const editable = canEdit && saveState.step !== 'saving';

  const act = useCallback((a: EditorAction) => dispatch(a), []);
  const selectionRef = useRef(state.selection);
  selectionRef.current = state.selection;
  const duplicate = useCallback(() => dispatch({ type: 'duplicate', ids: selectionRef.current.map(() => newId()) }), [newId]);

  // Leaving with unsaved changes: the browser asks on reload or close, the router asks on in-app links.
  useEffect(() => {
    if (!dirty) return;
    const warn = (e: BeforeUnloadEvent) => e.preventDefault();
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [dirty]);
  const blocker = useBlocker(({ currentLocation, nextLocation }) => dirty && currentLocation.pathname !== nextLocation.pathname);

  // Undo and redo work anywhere in the designer except while typing in a field.
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      const target = e.target as HTMLElement | null;
      if (target && (target.closest('input, textarea, select, [contenteditable="true"]') || target.closest('dialog'))) return;
      const mod = e.ctrlKey || e.metaKey;
      if (!mod || e.altKey) return;
      const key = e.key.toLowerCase();
      if (key === 'z' || (key === 'y' && e.ctrlKey)) {
        if (!canEdit) return;
        e.preventDefault();
        dispatch({ type: key === 'y' || e.shiftKey ? 'redo' : 'undo' });
      } else if (key === 'd' && canEdit && state.selection.length > 0) {
        e.preventDefault();
        duplicate();
      } else if (key === 's' && canEdit) {
        e.preventDefault();
        void save();
      }
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  });

  async function save(baseVersionId = state.baseVersionId) {
    if (saveState.step === 'saving') return;
    const document = doc;
    setSaveState({ step: 'saving' });
    try {
      const saved = await api.save({ baseVersionId, document, message: message.trim() || undefined });
      dispatch({ type: 'saved', versionId: saved.latestVersion.id, document });
      setConflict(null);
      setMessage('');
      setSaveState({ step: 'saved', number: saved.latestVersion.number });
    } catch (e) {
      if (isApiError(e) && e.status === 409) {
        try {
          const theirs = await api.loadCurrent();
          setConflict({ theirs, base: state.savedDocument, mine: document });
          setSaveState({ step: 'idle' });
        } catch (loadError) {
          setSaveState({ step: 'failed', error: loadError });
        }
      } else {
        setSaveState({ step: 'failed', error: e });
      }
    }
  }

  function keepMine() {
    if (!conflict) return;
    const theirs = conflict.theirs;
    dispatch({ type: 'rebase', versionId: theirs.latestVersion.id, document: theirs.document });
    void save(theirs.latestVersion.id);
  }

  function loadTheirs() {
    if (!conflict) return;
    const theirs = conflict.theirs;
    dispatch({ type: 'rebase', versionId: theirs.latestVersion.id, document: theirs.document });
    dispatch({ type: 'replace-document', document: theirs.document });
    setConflict(null);
  }

  async function publish(versionId: string, number: number) {
    setPublishing({ id: versionId, number });
    setPublishError(null);
    try {
      const summary = await api.publish(versionId);
      setPublishedId(summary.publishedVersion?.id ?? versionId);
      setDialog((d) => (d === 'publish' ? null : d));
    } catch (e) {
      setPublishError(e);
    } finally {
      setPublishing(null);
    }
  }

  // A mouse drags after 6 px; a finger after a 200 ms press, so a swipe still scrolls the palette and a tap places the tile.
  const sensors = useSensors(
    useSensor(MouseSensor, { activationConstraint: { distance: 6 } }),
    useSensor(TouchSensor, { activationConstraint: { delay: 200, tolerance: 8 } }),
  );
  function onDragStart(e: DragStartEvent) {
    const kind = (e.active.data.current as { kind?: TileKind } | undefined)?.kind;
    setDragKind(kind ?? null);
  }
  function onDragEnd(e: DragEndEvent) {
    setDragKind(null);
    const kind = (e.active.data.current as { kind?: TileKind } | undefined)?.kind;
    const { element, scale } = geometryRef.current;
    if (!kind || e.over?.id !== CANVAS_DROP_ID || !element || !String(e.active.id).startsWith(PALETTE_PREFIX)) return;
    const activator = e.activatorEvent;
    const start = typeof TouchEvent !== 'undefined' && activator instanceof TouchEvent ? (activator.touches[0] ?? activator.changedTouches[0]) : (activator as MouseEvent | null);
    if (!start) return;
    const rect = element.getBoundingClientRect();
    // The pointer now: where it went down plus how far it moved; into the canvas's own CSS px.
    const xPx = (start.clientX + e.delta.x - rect.left) / scale;
    const yPx = (start.clientY + e.delta.y - rect.top) / scale;
    dispatch({ type: 'add-tile', kind, id: newId(), at: pxToCell({ xPx, yPx }, doc.device, doc.grid) });
  }

  const latestSavedNumber = saveState.step === 'saved' ? saveState.number : panel.latestVersion.number;
  const isBaseLatestPublished = publishedId === state.baseVersionId;

  return (
    <DndContext sensors={sensors} onDragStart={onDragStart} onDragEnd={onDragEnd} onDragCancel={() => setDragKind(null)} autoScroll={false}>
      <div className="flex h-dvh flex-col bg-asphalt-950">
        <header className="flex flex-wrap items-center gap-x-4 gap-y-2 border-b border-asphalt-800 bg-asphalt-900 px-4 py-2">
          <Link to="/panels" className="inline-flex min-h-11 items-center gap-1.5 rounded-lg px-2 text-sm font-semibold text-asphalt-300 hover:bg-asphalt-800 hover:text-asphalt-100">
            <svg viewBox="0 0 16 16" aria-hidden="true" className="size-4" fill="none" stroke="currentColor" strokeWidth="1.75" strokeLinecap="round" strokeLinejoin="round">
              <path d="M10 3 5 8l5 5" />
            </svg>
            Panels
          </Link>
          <div className="min-w-0">
            <h1 className="truncate text-lg leading-tight font-bold text-asphalt-100">{panel.name}</h1>
            <p className="text-xs text-asphalt-400" data-testid="save-status" aria-live="polite">
              {saveState.step === 'saving'
                ? 'Saving…'
                : dirty
                  ? <span className="font-semibold text-signal-300">Unsaved changes · based on v{latestSavedNumber}</span>
                  : saveState.step === 'saved'
                    ? <span className="text-go">Saved as v{saveState.number}</span>
                    : `v${latestSavedNumber}, saved`}
              {isBaseLatestPublished && !dirty && <span className="text-go"> · published</span>}
            </p>
          </div>
          {!canEdit && <Badge tone="sky">Read only</Badge>}
          <div className="ml-auto flex flex-wrap items-center gap-2">
            <Button size="sm" variant="ghost" onClick={() => setDialog('contract')}>
              Channel contract
            </Button>
            <Button size="sm" variant="ghost" onClick={() => setDialog('versions')}>
              Versions
            </Button>
            {canEdit && (
              <>
                <Button
                  size="sm"
                  variant="secondary"
                  disabled={dirty || isBaseLatestPublished || publishing !== null}
                  title={dirty ? 'Save first: publishing takes a saved version' : isBaseLatestPublished ? 'This version is already published' : undefined}
                  onClick={() => {
                    setPublishError(null);
                    setDialog('publish');
                  }}
                >
                  Publish v{latestSavedNumber}
                </Button>
                <label className="sr-only" htmlFor="version-note">
                  Note for this version (optional)
                </label>
                <input
                  id="version-note"
                  value={message}
                  maxLength={200}
                  placeholder="Note for this version (optional)"
                  onChange={(e) => setMessage(e.target.value)}
                  className="min-h-11 w-60 rounded-lg bg-asphalt-850 px-3 text-sm text-asphalt-100 ring-1 ring-asphalt-600 ring-inset placeholder:text-asphalt-500"
                />
                <Button variant="primary" onClick={() => void save()} isPending={saveState.step === 'saving'} disabled={!dirty && saveState.step !== 'failed'}>
                  Save
                </Button>
              </>
            )}
          </div>
        </header>

        <div className="flex flex-wrap items-center gap-2 border-b border-asphalt-800 bg-asphalt-900/70 px-4 py-1.5">
          <PageTabs doc={doc} pageId={page.id} canEdit={editable} dispatch={act} newPageId={newId} />
          {canEdit && (
            <div role="toolbar" aria-label="Arrange tiles" className="ml-auto flex flex-wrap items-center gap-0.5">
              <IconButton label="Undo (Ctrl+Z)" isDisabled={!canUndo(state.history)} onClick={() => dispatch({ type: 'undo' })} path="M5.5 3.5 2.5 6.5l3 3M3 6.5h6.5a4 4 0 0 1 0 8H7" />
              <IconButton label="Redo (Shift+Ctrl+Z)" isDisabled={!canRedo(state.history)} onClick={() => dispatch({ type: 'redo' })} path="M10.5 3.5l3 3-3 3M13 6.5H6.5a4 4 0 0 0 0 8H9" />
              <span aria-hidden="true" className="mx-1.5 h-6 w-px bg-asphalt-700" />
              {ALIGN.map((a) => (
                <IconButton key={a.edge} label={a.label} isDisabled={selected.length < 2} onClick={() => dispatch({ type: 'align', edge: a.edge })} path={a.path} />
              ))}
              <IconButton label="Distribute horizontally" isDisabled={selected.length < 3} onClick={() => dispatch({ type: 'distribute', axis: 'horizontal' })} path="M2 2.5v11M14 2.5v11M6 5h4v6H6z" />
              <IconButton label="Distribute vertically" isDisabled={selected.length < 3} onClick={() => dispatch({ type: 'distribute', axis: 'vertical' })} path="M2.5 2h11M2.5 14h11M5 6h6v4H5z" />
              <span aria-hidden="true" className="mx-1.5 h-6 w-px bg-asphalt-700" />
              <IconButton label="Duplicate (Ctrl+D)" isDisabled={selected.length === 0} onClick={duplicate} path="M5.5 5.5h8v8h-8zM3 10.5H2.5v-8h8V3" />
              <IconButton label="Delete (Delete)" isDisabled={selected.length === 0} onClick={() => dispatch({ type: 'delete-selection' })} path="M3.5 4.5h9M6.5 4.5V3h3v1.5M5 4.5l.5 8.5h5l.5-8.5" />
            </div>
          )}
        </div>

        {saveState.step === 'failed' && (
          <Notice tone="error" title="Couldn’t save" className="mx-4 mt-2" action={<Button size="sm" onClick={() => void save()}>Try again</Button>}>
            {errorMessage(saveState.error)} Your changes are still here.
          </Notice>
        )}

        <div className="flex min-h-0 flex-1">
          {canEdit && (
            <aside aria-label="Tiles to add" className="w-56 shrink-0 overflow-y-auto border-r border-asphalt-800 bg-asphalt-900/50 p-3">
              <TilePalette isDisabled={!editable} onAdd={(kind) => dispatch({ type: 'add-tile', kind, id: newId() })} />
            </aside>
          )}
          <DesignCanvas doc={doc} page={page} selection={state.selection} issues={issues} canEdit={editable} dispatch={act} onDuplicate={duplicate} geometryRef={geometryRef} />
          <aside aria-label="Properties and check" className="flex w-[22rem] shrink-0 flex-col gap-5 overflow-y-auto border-l border-asphalt-800 bg-asphalt-900/50 p-4">
            <CheckList
              issues={issues}
              doc={doc}
              robotNote={robotNote}
              onPick={(issue: PanelIssue) => {
                dispatch({ type: 'set-page', pageId: issue.pageId });
                dispatch({ type: 'select', ids: issue.tileIds, mode: 'replace' });
              }}
            />
            <div className="h-px bg-asphalt-750" />
            {selected.length === 1 ? (
              <TileProperties key={selected[0]!.id} tile={selected[0]!} theme={doc.theme} grid={doc.grid} canEdit={editable} dispatch={act} />
            ) : selected.length > 1 ? (
              <div className="flex flex-col gap-2 text-[0.9375rem] text-asphalt-300">
                <p className="font-semibold text-asphalt-100">{selected.length} tiles selected</p>
                <p>Drag any of them to move them together, use the align and distribute buttons above, or press Delete.</p>
                <p className="text-sm text-asphalt-400">Shift-click a tile to add it to the selection or take it out.</p>
              </div>
            ) : (
              <>
                <PanelSettings key={`${doc.device.preset}:${doc.device.widthPx}`} doc={doc} canEdit={editable} dispatch={act} />
                <details className="group rounded-lg bg-asphalt-900 ring-1 ring-asphalt-700">
                  <summary className="flex min-h-11 cursor-pointer items-center px-3 text-sm font-semibold text-asphalt-200">Theme colours</summary>
                  <div className="px-3 pb-3">
                    <ThemeEditor theme={doc.theme} canEdit={editable} dispatch={act} />
                  </div>
                </details>
                <p className="text-sm text-asphalt-400">
                  {canEdit
                    ? 'Select a tile to edit it. Keys on the canvas: arrows nudge a cell (Shift: four), Delete removes, Ctrl+D duplicates, Ctrl+Z undoes, Shift+Ctrl+Z redoes.'
                    : 'You can look at this panel, its versions and its channel contract. Programmers and leads edit and publish panels.'}
                </p>
              </>
            )}
          </aside>
        </div>
      </div>

      <DragOverlay dropAnimation={null}>{dragKind ? <PaletteDragChip kind={dragKind} /> : null}</DragOverlay>

      <ConflictDialog conflict={conflict} isSaving={saveState.step === 'saving'} onKeepMine={keepMine} onLoadTheirs={loadTheirs} onClose={() => setConflict(null)} />
      <ContractDialog isOpen={dialog === 'contract'} onClose={() => setDialog(null)} doc={doc} panelName={panel.name} />
      <VersionsDialog
        isOpen={dialog === 'versions'}
        onClose={() => setDialog(null)}
        versions={versions}
        versionQuery={versionQuery}
        publishedVersionId={publishedId}
        baseVersionId={state.baseVersionId}
        canEdit={canEdit}
        isDirty={dirty}
        onRestore={(v: PanelVersion) => {
          dispatch({ type: 'replace-document', document: v.document });
          setDialog(null);
        }}
        onPublish={(v) => void publish(v.id, v.number)}
        publishingId={publishing?.id ?? null}
        publishError={dialog === 'versions' ? publishError : null}
      />
      <ConfirmDialog
        isOpen={dialog === 'publish'}
        title={`Publish v${latestSavedNumber} for the driver station?`}
        confirmLabel={`Publish v${latestSavedNumber}`}
        isPending={publishing !== null}
        error={publishError != null && <Notice tone="error">{errorMessage(publishError)}</Notice>}
        onCancel={() => setDialog(null)}
        onConfirm={() => void publish(state.baseVersionId, latestSavedNumber)}
      >
        <p>
          The driver station’s run mode opens this version from now on{issues.some((i) => i.severity === 'error') ? ', and the panel check still lists errors' : ''}.
        </p>
        <p className={cx('mt-2 text-sm text-signal-200')}>
          A panel connected to a real robot can make it move. Pitwall never replaces the driver station’s enable, disable or emergency stop; follow the game manual, the event’s rules and your safety mentors.
        </p>
      </ConfirmDialog>
      <ConfirmDialog
        isOpen={blocker.state === 'blocked'}
        title="Leave without saving?"
        confirmLabel="Leave and lose changes"
        onCancel={() => blocker.reset?.()}
        onConfirm={() => blocker.proceed?.()}
      >
        This panel has changes that are not saved as a version yet.
      </ConfirmDialog>
    </DndContext>
  );
}
