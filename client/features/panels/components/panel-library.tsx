import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import type { PanelSummary } from '../../../../shared/schemas/panel';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { EmptyState } from '../../../components/ui/empty-state';
import { Loading } from '../../../components/ui/loading';
import { Notice } from '../../../components/ui/notice';
import { QueryError } from '../../../components/ui/query-error';
import { Section } from '../../../components/ui/section';
import { errorMessage } from '../../../lib/form-errors';
import { useDeletePanel, useDuplicatePanel, usePanels } from '../api/panels';
import { CreatePanelDialog } from './create-panel-dialog';
import { ImportPanelButton, ImportRefusalNotice, type ImportRefusal } from './import-panel-button';
import { PanelsTable } from './panels-table';
import { RenamePanelDialog } from './rename-panel-dialog';

type PanelLibraryProps = { canEdit: boolean; canRun: boolean; nowMs: number };

/** The team's panels: a table with create, rename, duplicate, delete, import and export by role. */
export function PanelLibrary({ canEdit, canRun, nowMs }: PanelLibraryProps) {
  const navigate = useNavigate();
  const list = usePanels();
  const [isCreating, setIsCreating] = useState(false);
  const [renaming, setRenaming] = useState<PanelSummary | null>(null);
  const [deleting, setDeleting] = useState<PanelSummary | null>(null);
  const [highlightId, setHighlightId] = useState<string | null>(null);
  const [refusal, setRefusal] = useState<ImportRefusal | null>(null);
  const duplicate = useDuplicatePanel();
  const remove = useDeletePanel();

  const actions = canEdit && (
    <div className="flex flex-wrap items-center gap-2">
      <ImportPanelButton
        onImported={(panel) => {
          setRefusal(null);
          setHighlightId(panel.id);
        }}
        onRefused={setRefusal}
      />
      <Button variant="primary" onClick={() => setIsCreating(true)}>
        New panel
      </Button>
    </div>
  );

  return (
    <Section
      title="Team panels"
      description="Each save is a version. The version a panel publishes is what the driver station runs; the team has one driver station panel."
      actions={actions}
    >
      {!canEdit && (
        <Notice tone="info" title="Read only" className="mb-4">
          Your role can open and export panels. Programmers and leads create, edit and publish them.
        </Notice>
      )}
      {refusal && <ImportRefusalNotice refusal={refusal} onDismiss={() => setRefusal(null)} />}
      {duplicate.isError && (
        <Notice tone="error" title="Couldn’t duplicate the panel" className="mb-4">
          {errorMessage(duplicate.error)}
        </Notice>
      )}
      <div className={refusal ? 'mt-4' : undefined}>
        {list.isPending ? (
          <Loading label="Loading panels…" />
        ) : list.isError ? (
          <QueryError title="Couldn’t load the panels" error={list.error} onRetry={() => list.refetch()} isRetrying={list.isFetching} />
        ) : list.data.length === 0 ? (
          <EmptyState
            icon="panels"
            title="No panels yet"
            action={
              canEdit && (
                <Button variant="primary" onClick={() => setIsCreating(true)}>
                  Create the first panel
                </Button>
              )
            }
          >
            {canEdit
              ? 'Lay out the operator’s tiles on a grid sized to the driver station tablet, or import a panel file from another Pitwall.'
              : 'When a programmer creates a panel it appears here.'}
          </EmptyState>
        ) : (
          <PanelsTable
            panels={list.data}
            canEdit={canEdit}
            canRun={canRun}
            nowMs={nowMs}
            highlightId={highlightId}
            duplicatingId={duplicate.isPending ? (duplicate.variables?.id ?? null) : null}
            onRename={setRenaming}
            onDuplicate={(p) => duplicate.mutate({ id: p.id }, { onSuccess: (copy) => setHighlightId(copy.id) })}
            onDelete={(p) => {
              remove.reset();
              setDeleting(p);
            }}
          />
        )}
      </div>

      <CreatePanelDialog isOpen={isCreating} onClose={() => setIsCreating(false)} onCreated={(panel) => navigate(`/panels/${panel.id}/edit`)} />
      <RenamePanelDialog panel={renaming} onClose={() => setRenaming(null)} />
      <ConfirmDialog
        isOpen={deleting !== null}
        title={`Delete ${deleting?.name ?? 'panel'}?`}
        confirmLabel="Delete panel"
        isPending={remove.isPending}
        error={remove.isError && <Notice tone="error">{errorMessage(remove.error)}</Notice>}
        onCancel={() => setDeleting(null)}
        onConfirm={() => deleting && remove.mutate(deleting.id, { onSuccess: () => setDeleting(null) })}
      >
        {deleting?.isTeamPanel
          ? 'This is the driver station panel. After deleting it the driver station has no panel to run until another one is published.'
          : 'The panel and all its versions go. Export it first if you may want it back.'}
      </ConfirmDialog>
    </Section>
  );
}
