import { useCallback, useMemo, useState } from 'react';
import { useParams, useSearchParams } from 'react-router-dom';
import { can } from '../../../shared/domain/roles';
import { ButtonLink } from '../../components/ui/button-link';
import { EmptyState } from '../../components/ui/empty-state';
import { Loading } from '../../components/ui/loading';
import { Notice } from '../../components/ui/notice';
import { PageHeader } from '../../components/ui/page-header';
import { QueryError } from '../../components/ui/query-error';
import { QueryGate } from '../../components/ui/query-gate';
import { Section } from '../../components/ui/section';
import { useMe } from '../../features/auth/api/me';
import { useInvalidateRecordings, useRecording, useRecordings } from '../../features/recordings/api/recordings';
import { BulkActions } from '../../features/recordings/components/bulk-actions';
import { Pager } from '../../features/recordings/components/pager';
import { RecordingFilters } from '../../features/recordings/components/recording-filters';
import { RecordingsTable } from '../../features/recordings/components/recordings-table';
import { UploadPanel } from '../../features/recordings/components/upload-panel';
import { RecordingDetailsForm } from '../../features/recordings/components/recording-details-form';
import { ReplayPage } from '../../features/replay/components/replay-page';
import { CyclesView } from '../../features/cycles/components/cycles-view';
import { matchLabel } from '../../features/recordings/model/format';
import {
  activeFilterCount,
  DEFAULT_VIEW,
  searchFromView,
  toggleSort,
  viewFromSearch,
  type RecordingView,
} from '../../features/recordings/model/list-query';

/** /recordings: the team's recordings, filtered, sorted and paged by the URL. */
export function Component() {
  const { data: me } = useMe();
  const [params, setParams] = useSearchParams();
  const search = params.toString();
  const view = useMemo(() => viewFromSearch(new URLSearchParams(search)), [search]);
  const [selected, setSelected] = useState<ReadonlySet<string>>(new Set());
  const [highlightId, setHighlightId] = useState<string | null>(null);
  const list = useRecordings(view);
  const invalidate = useInvalidateRecordings();

  const setView = useCallback(
    (next: RecordingView) => {
      setSelected(new Set());
      setParams(searchFromView(next), { replace: false });
    },
    [setParams],
  );

  if (!me) return null;
  const canManage = can(me.role, 'recordings.manage');
  const items = list.data?.items ?? [];
  const selectedRows = items.filter((r) => selected.has(r.id));

  return (
    <>
      <PageHeader
        eyebrow={<>{me.team.name}</>}
        title="Recordings"
        description="Every match, practice run, drill and simulator run the team has stored. Open one to replay it."
      />
      <div className="flex flex-col gap-5">
        {canManage ? (
          <Section title="Upload a recording" description="Add a file exported from the robot or from another Pitwall.">
            <UploadPanel
              onStored={(id) => {
                setHighlightId(id);
                void invalidate();
                // Show the newest first, unfiltered, so the new recording is in view.
                if (searchFromView(view).toString() !== '') setView(DEFAULT_VIEW);
              }}
            />
          </Section>
        ) : (
          <Notice tone="info" title="Uploading is for programmers and leads">
            Your role can browse, open and export recordings. Ask a programmer or a lead to upload a file.
          </Notice>
        )}

        <Section title="All recordings">
          <RecordingFilters view={view} onChange={setView} />
          <div className="mt-5">
            {list.isPending ? (
              <Loading label="Loading recordings…" />
            ) : list.isError ? (
              <QueryError title="Couldn’t load the recordings" error={list.error} onRetry={() => list.refetch()} isRetrying={list.isFetching} />
            ) : list.data.total === 0 ? (
              activeFilterCount(view) > 0 ? (
                <EmptyState icon="recordings" title="No recording matches these filters" action={<ButtonLink to="/recordings">Clear filters</ButtonLink>}>
                  Try a wider date range, another kind, or fewer words in the search.
                </EmptyState>
              ) : (
                <EmptyState icon="recordings" title="No recordings yet">
                  A recording starts by itself when the robot is enabled during a connected session; the simulator makes one every
                  match too.{canManage && ' You can also upload a file above.'}
                </EmptyState>
              )
            ) : (
              <>
                <BulkActions role={me.role} selected={selectedRows} onClear={() => setSelected(new Set())} />
                <div className={list.isPlaceholderData ? 'opacity-60 transition-opacity' : undefined} aria-busy={list.isFetching}>
                  <RecordingsTable
                    items={items}
                    sort={view.sort}
                    onSort={(field) => setView(toggleSort(view, field))}
                    selected={selected}
                    onToggle={(id) =>
                      setSelected((s) => {
                        const next = new Set(s);
                        if (!next.delete(id)) next.add(id);
                        return next;
                      })
                    }
                    onToggleAll={(ids, isOn) => setSelected(isOn ? new Set(ids) : new Set())}
                    highlightId={highlightId}
                  />
                </div>
                <Pager page={list.data.page} pageSize={list.data.pageSize} total={list.data.total} onPage={(page) => setView({ ...view, page })} />
              </>
            )}
          </div>
        </Section>
      </div>
    </>
  );
}

/** /recordings/:id: the replay of one recording; `?t=93.2` opens it at that moment. */
export function ReplayComponent() {
  const { id = '' } = useParams();
  const [params] = useSearchParams();
  // Read once: afterwards the page writes the moment into the address itself.
  const [initialMoment] = useState(() => params.get('t'));
  const { data: me } = useMe();
  const recording = useRecording(id);
  if (!me) return null;
  return (
    <QueryGate query={recording} loadingLabel="Loading the recording…" errorTitle="Couldn’t load this recording">
      {(r) => (
        <>
          <PageHeader
            eyebrow={<>Replay · {r.robot}</>}
            title={[r.metadata.event, matchLabel(r.metadata)?.long].filter(Boolean).join(' · ') || `${r.robot} recording`}
            actions={<ButtonLink to="/recordings">Back to recordings</ButtonLink>}
          />
          <ReplayPage
            key={r.id}
            recording={r}
            me={{ name: me.user.name, role: me.role }}
            initialMoment={initialMoment}
            details={<RecordingDetailsForm recording={r} role={me.role} canEdit={can(me.role, 'recordings.manage')} />}
            cycles={(timeline) => <CyclesView recordingId={r.id} isLive={r.status === 'recording'} timeline={timeline} />}
          />
        </>
      )}
    </QueryGate>
  );
}
