import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import {
  drillListSchema,
  drillResultListSchema,
  drillSchema,
  personalBestListSchema,
  submittedDrillResultSchema,
  type DrillBody,
  type DrillResultBody,
} from '../../../../shared/schemas/drill';
import { publishedPanelSchema } from '../../../../shared/schemas/panel';
import { api } from '../../../lib/api-client';

export type ResultFilter = { drillId?: string; operatorId?: string };

const filterSearch = (f: ResultFilter) => {
  const p = new URLSearchParams();
  if (f.drillId) p.set('drillId', f.drillId);
  if (f.operatorId) p.set('operatorId', f.operatorId);
  return p.toString();
};

export const drillKeys = {
  all: ['drills'] as const,
  list: () => ['drills', 'list'] as const,
  one: (id: string) => ['drills', 'one', id] as const,
  results: (f: ResultFilter) => ['drills', 'results', filterSearch(f)] as const,
  bests: (f: ResultFilter) => ['drills', 'bests', filterSearch(f)] as const,
  /** Outside ['drills'] so that storing a result does not reload the panel under a running drill view. */
  publishedPanel: ['published-panel', 'drill-view'] as const,
};

export const listDrills = () => api.get('/drills', drillListSchema);
export const getDrill = (id: string) => api.get(`/drills/${encodeURIComponent(id)}`, drillSchema);
export const createDrill = (body: DrillBody) => api.post('/drills', body, drillSchema);
export const updateDrill = (id: string, body: DrillBody) => api.put(`/drills/${encodeURIComponent(id)}`, body, drillSchema);
export const deleteDrill = (id: string) => api.delete(`/drills/${encodeURIComponent(id)}`);
export const listDrillResults = (f: ResultFilter) => api.get(`/drills/results?${filterSearch(f)}`, drillResultListSchema);
export const listPersonalBests = (f: ResultFilter) => api.get(`/drills/bests?${filterSearch(f)}`, personalBestListSchema);
export const submitDrillResult = (body: DrillResultBody) => api.post('/drills/results', body, submittedDrillResultSchema);
/** The team's published panel, which the drill view draws; 404 when none is published. */
export const getPublishedPanel = () => api.get('/panels/published', publishedPanelSchema);

export const drillsQuery = () => queryOptions({ queryKey: drillKeys.list(), queryFn: listDrills });
export const drillQuery = (id: string) => queryOptions({ queryKey: drillKeys.one(id), queryFn: () => getDrill(id) });
export const drillResultsQuery = (f: ResultFilter) => queryOptions({ queryKey: drillKeys.results(f), queryFn: () => listDrillResults(f) });
export const personalBestsQuery = (f: ResultFilter) => queryOptions({ queryKey: drillKeys.bests(f), queryFn: () => listPersonalBests(f) });
export const publishedPanelQuery = () =>
  queryOptions({ queryKey: drillKeys.publishedPanel, queryFn: getPublishedPanel, retry: false, staleTime: 60_000, refetchOnWindowFocus: false });

export const useDrills = () => useQuery(drillsQuery());
export const useDrill = (id: string) => useQuery(drillQuery(id));
export const useDrillResults = (f: ResultFilter) => useQuery(drillResultsQuery(f));
export const usePersonalBests = (f: ResultFilter) => useQuery(personalBestsQuery(f));
export const usePublishedPanel = () => useQuery(publishedPanelQuery());

export function useSaveDrill(id: string | null) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: DrillBody) => (id ? updateDrill(id, body) : createDrill(body)),
    onSuccess: async (saved) => {
      queryClient.setQueryData(drillKeys.one(saved.id), saved);
      await queryClient.invalidateQueries({ queryKey: drillKeys.list() });
    },
  });
}

export function useDeleteDrill() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => deleteDrill(id),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: drillKeys.all }),
  });
}

export function useSubmitDrillResult() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: DrillResultBody) => submitDrillResult(body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: drillKeys.all }),
  });
}
