import { useState } from 'react';
import { Navigate, useLocation, useParams, useSearchParams } from 'react-router-dom';
import { can } from '../../../shared/domain/roles';
import { ButtonLink } from '../../components/ui/button-link';
import { Button } from '../../components/ui/button';
import { EmptyState } from '../../components/ui/empty-state';
import { Loading } from '../../components/ui/loading';
import { PageHeader } from '../../components/ui/page-header';
import { QueryError } from '../../components/ui/query-error';
import { Section } from '../../components/ui/section';
import { useMe } from '../../features/auth/api/me';
import { signInPathFor } from '../../features/auth/model/safe-next-path';
import { useDrill, useDrills, usePublishedPanel } from '../../features/drills/api/drills';
import { CoachConsole } from '../../features/drills/components/coach-console';
import { DrillEditor } from '../../features/drills/components/drill-editor';
import { DrillList } from '../../features/drills/components/drill-list';
import { DrillResultsSection } from '../../features/drills/components/drill-results-section';
import { DrillRunView } from '../../features/drills/components/drill-run-view';
import { paceSummary, planSummary } from '../../features/drills/model/drill-form';
import { RunMessage } from '../../features/run/components/run-message';
import { isApiError } from '../../lib/api-error';
import { SafetyCaution } from '../safety-caution';

/** /drills: the team's drills, the editor (?edit=new or ?edit=<id>), and results over time. */
export function Component() {
  const { data: me } = useMe();
  const drills = useDrills();
  const [params, setParams] = useSearchParams();
  const editing = params.get('edit');
  const [notice, setNotice] = useState<string | null>(null);
  if (!me) return null;
  const canEdit = can(me.role, 'drills.send');
  const canRun = can(me.role, 'drills.run');
  const closeEditor = (savedName: string | null) => {
    setParams({}, { replace: true });
    setNotice(savedName ? `Saved “${savedName}”.` : null);
  };
  const edited = editing && editing !== 'new' ? drills.data?.drills.find((d) => d.id === editing) : undefined;

  return (
    <>
      <PageHeader
        eyebrow="Rehearsal"
        title="Drills"
        description="Timed target calls for the operator: each call is answered on the panel, and every answer is timed and checked."
        actions={
          <div className="flex flex-wrap gap-2">
            {canRun && (
              <ButtonLink to="/drills/follow" aria-label="Follow the coach’s calls">
                Follow the coach
              </ButtonLink>
            )}
            {canEdit && !editing && (
              <Button variant="primary" onClick={() => setParams({ edit: 'new' })}>
                New drill
              </Button>
            )}
          </div>
        }
      />
      <div className="flex flex-col gap-6">
        {notice && (
          <p role="status" className="text-sm text-go">
            {notice}
          </p>
        )}
        {editing && canEdit && (editing === 'new' || edited) && (
          <Section title={edited ? `Edit “${edited.name}”` : 'New drill'}>
            <DrillEditor key={editing} drill={edited ?? null} onDone={(saved) => closeEditor(saved?.name ?? null)} />
          </Section>
        )}
        <Section
          title="Team drills"
          description={
            canEdit
              ? 'Run a drill yourself, or send its calls to the operator’s tablet from this device.'
              : canRun
                ? 'Run a drill on your own, or follow the calls a coach sends.'
                : 'Operators run drills; coaches, programmers and leads write them and send calls.'
          }
        >
          {drills.isPending ? (
            <Loading label="Loading drills…" />
          ) : drills.isError ? (
            <QueryError title="The drills could not be loaded" error={drills.error} onRetry={() => drills.refetch()} isRetrying={drills.isFetching} />
          ) : drills.data.drills.length === 0 ? (
            <EmptyState
              icon="drills"
              title="No drills yet"
              action={canEdit ? <Button variant="primary" onClick={() => setParams({ edit: 'new' })}>Write the first drill</Button> : undefined}
            >
              A drill is a sequence of calls like “L4 · C”, random from chosen targets or scripted, at a pace you set.
            </EmptyState>
          ) : (
            <DrillList drills={drills.data.drills} canRun={canRun} canEdit={canEdit} onEdit={(d) => setParams({ edit: d.id })} />
          )}
        </Section>
        <Section title="Results over time" description="Median and p90 reaction time per run, and each operator’s personal bests.">
          <DrillResultsSection drills={drills.data?.drills ?? []} myUserId={me.user.id} />
        </Section>
      </div>
    </>
  );
}

function useSignInRedirect(error: unknown) {
  const location = useLocation();
  return isApiError(error) && error.status === 401 ? <Navigate to={signInPathFor(location.pathname, location.search)} replace /> : null;
}

function panelProblemOf(error: unknown): string | null {
  if (!error) return null;
  if (isApiError(error) && error.status === 404) return 'The team has no published panel yet.';
  if (isApiError(error) && error.status === 403) return 'Only operators, programmers and leads open the published panel.';
  return 'The published panel could not be loaded.';
}

type ViewGateProps = {
  mode: 'self' | 'coached';
  me: ReturnType<typeof useMe>;
  panel: ReturnType<typeof usePublishedPanel>;
  drill?: ReturnType<typeof useDrill>;
};

/** What both drill views show before the view itself: sign-in, loading, a missing drill, a viewer. */
function DrillViewGate({ mode, me, panel, drill }: ViewGateProps) {
  const redirect = useSignInRedirect(me.error ?? drill?.error);
  if (redirect) return redirect;
  // The panel's query key lies outside ['drills'], so storing a result never puts it back to pending under a run.
  if (me.isPending || drill?.isPending || panel.isPending) return <RunMessage isBusy title="Opening the drill…" backHref="/drills" />;
  if (drill?.isError)
    return (
      <RunMessage tone="problem" title={isApiError(drill.error) && drill.error.status === 404 ? 'No such drill' : 'The drill could not be loaded'} backHref="/drills">
        {drill.error instanceof Error ? drill.error.message : null}
      </RunMessage>
    );
  if (!me.data) return <RunMessage tone="problem" title="Pitwall could not reach its server" backHref="/drills" />;
  if (!can(me.data.role, 'drills.run'))
    return (
      <RunMessage title="Viewers watch drills" backHref="/drills">
        Operators, coaches, programmers and leads take part in drills.
      </RunMessage>
    );
  return (
    <DrillRunView
      mode={mode}
      drill={drill?.data}
      panel={panel.data ?? null}
      panelProblem={panelProblemOf(panel.error)}
      operatorName={me.data.user.name}
      canDriveSimulator={can(me.data.role, 'panels.run')}
      backHref="/drills"
      safety={<SafetyCaution />}
    />
  );
}

/** /drills/:id/run: the operator's full-screen drill view. */
export function RunComponent() {
  const { id = '' } = useParams();
  return <DrillViewGate mode="self" me={useMe()} panel={usePublishedPanel()} drill={useDrill(id)} />;
}

/** /drills/follow: the operator's drill view following the calls a coach sends over the relay. */
export function FollowComponent() {
  return <DrillViewGate mode="coached" me={useMe()} panel={usePublishedPanel()} />;
}

/** /drills/:id/send: a coach sends the drill's calls to the operator's tablet. */
export function SendComponent() {
  const { id = '' } = useParams();
  const { data: me } = useMe();
  const drill = useDrill(id);
  if (!me) return null;
  if (drill.isPending) return <Loading label="Loading the drill…" />;
  if (drill.isError) return <QueryError title="The drill could not be loaded" error={drill.error} onRetry={() => drill.refetch()} isRetrying={drill.isFetching} />;
  const canSend = can(me.role, 'drills.send');
  return (
    <>
      <PageHeader
        eyebrow={<>Drills · send calls</>}
        title={drill.data.name}
        description={`${planSummary(drill.data.plan)} · ${paceSummary(drill.data.pace)}`}
        actions={<ButtonLink to="/drills">Back to drills</ButtonLink>}
      />
      {canSend ? (
        <CoachConsole drill={drill.data} coachName={me.user.name} />
      ) : (
        <EmptyState icon="drills" title="Coaches, programmers and leads send calls">
          As {me.role === 'operator' ? 'an operator' : `a ${me.role}`}, open Follow the coach on your tablet to answer the calls someone sends.
        </EmptyState>
      )}
    </>
  );
}
