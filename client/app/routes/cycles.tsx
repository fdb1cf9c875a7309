import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import { PageHeader } from '../../components/ui/page-header';
import { useMe } from '../../features/auth/api/me';
import { CycleReviewPage } from '../../features/cycles/components/review-page';
import { reviewViewFromSearch, searchFromReviewView, type ReviewView } from '../../features/cycles/model/review-query';

/** /cycles: the coach review of cycle times across recordings, filtered by the URL. */
export function Component() {
  const { data: me } = useMe();
  const [params, setParams] = useSearchParams();
  const search = params.toString();
  const view = useMemo(() => reviewViewFromSearch(new URLSearchParams(search)), [search]);
  const setView = useCallback((next: ReviewView) => setParams(searchFromReviewView(next)), [setParams]);
  if (!me) return null;
  return (
    <>
      <PageHeader
        eyebrow={<>{me.team.name}</>}
        title="Cycles"
        description="Cycle times per match and across an event: acquire, travel, align and place, by level, face, station and operator. Open any slow cycle in the replay."
      />
      <CycleReviewPage view={view} onChange={setView} />
    </>
  );
}
