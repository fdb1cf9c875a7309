import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useMemo } from 'react';
import { Navigate, useLocation, useParams } from 'react-router-dom';
import { can } from '../../../shared/domain/roles';
import { ButtonLink } from '../../components/ui/button-link';
import { Loading } from '../../components/ui/loading';
import { QueryError } from '../../components/ui/query-error';
import { useMe } from '../../features/auth/api/me';
import { signInPathFor } from '../../features/auth/model/safe-next-path';
import { PanelDesigner, type DesignerApi } from '../../features/panel-editor/components/panel-designer';
import { getPanelVersion, panelQuery, panelVersionQuery, usePanel, usePanelVersions, usePublishPanel, useSavePanel } from '../../features/panels/api/panels';
import { useRelaySelector } from '../../hooks/use-relay';
import { isApiError, isUnauthenticated } from '../../lib/api-error';
import type { RelayState } from '../../lib/relay-client';

/** The robots on the relay and what they read, as one stable string (so the selector's result compares by value). */
const robotReadsKey = (s: RelayState): string => {
  if (s.clients === undefined) return 'unknown';
  const robots = s.clients.filter((c) => c.kind === 'robot');
  if (robots.length === 0) return 'none';
  return JSON.stringify({ names: robots.map((r) => r.name), reads: robots.every((r) => r.reads) ? [...new Set(robots.flatMap((r) => r.reads ?? []))].sort() : null });
};

let counter = 0;
/** Ids for new tiles and pages: unique within a panel, no secure context needed (a tablet on plain http has no crypto.randomUUID). */
const newId = () => `t${Date.now().toString(36)}${(counter++).toString(36)}${Math.random().toString(36).slice(2, 6)}`;

/** /panels/:id/edit: the panel designer, full screen. Members who may not edit see it read only. */
export function Component() {
  const { id = '' } = useParams();
  const location = useLocation();
  const me = useMe();
  const panel = usePanel(id);
  const versions = usePanelVersions(id);
  const save = useSavePanel(id);
  const publish = usePublishPanel(id);
  const queryClient = useQueryClient();
  const robots = useRelaySelector(robotReadsKey);

  const { robotReads, robotNote } = useMemo(() => {
    if (robots === 'unknown') return { robotReads: undefined, robotNote: 'Not connected to the relay yet, so channels the robot does not read are not checked.' };
    if (robots === 'none') return { robotReads: undefined, robotNote: 'No robot is connected to the relay, so channels the robot does not read are not checked.' };
    const parsed = JSON.parse(robots) as { names: string[]; reads: string[] | null };
    if (!parsed.reads) return { robotReads: undefined, robotNote: `${parsed.names.join(', ')} did not say which channels it reads, so that rule is skipped.` };
    return { robotReads: parsed.reads, robotNote: `Checked against what ${parsed.names.join(', ')} reads (${parsed.reads.length} channels).` };
  }, [robots]);

  const api: DesignerApi = useMemo(
    () => ({
      save: (body) => save.mutateAsync(body),
      loadCurrent: () => queryClient.fetchQuery({ ...panelQuery(id), staleTime: 0 }),
      publish: (versionId) => publish.mutateAsync(versionId),
    }),
    // mutateAsync is stable per mutation observer.
    [save.mutateAsync, publish.mutateAsync, queryClient, id],
  );
  const versionQuery = useCallback((versionId: string) => {
    const q = panelVersionQuery(id, versionId);
    return { queryKey: q.queryKey, queryFn: () => getPanelVersion(id, versionId), staleTime: Infinity };
  }, [id]);

  const error = me.error ?? panel.error;
  if (isUnauthenticated(error)) return <Navigate to={signInPathFor(location.pathname, location.search)} replace />;
  if (me.isPending || panel.isPending) {
    return (
      <main className="grid min-h-dvh place-items-center">
        <Loading label="Opening the designer…" />
      </main>
    );
  }
  if (me.isError || panel.isError) {
    const isMissing = isApiError(panel.error) && panel.error.status === 404;
    return (
      <main className="mx-auto grid min-h-dvh max-w-lg place-items-center p-6">
        <div className="flex flex-col items-start gap-4">
          <QueryError
            title={isMissing ? 'This panel doesn’t exist (any more)' : 'Couldn’t open the panel'}
            error={panel.error ?? me.error}
            onRetry={isMissing ? undefined : () => void Promise.all([me.refetch(), panel.refetch()])}
            isRetrying={panel.isFetching}
          />
          <ButtonLink to="/panels">Back to panels</ButtonLink>
        </div>
      </main>
    );
  }
  return (
    <PanelDesigner
      key={panel.data.id}
      panel={panel.data}
      canEdit={can(me.data.role, 'panels.edit')}
      robotReads={robotReads}
      robotNote={robotNote}
      versions={versions}
      versionQuery={versionQuery}
      api={api}
      newId={newId}
    />
  );
}
