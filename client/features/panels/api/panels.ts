import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import {
  panelListSchema,
  panelSchema,
  panelSummarySchema,
  panelVersionListSchema,
  panelVersionSchema,
  type CreatePanelBody,
  type DuplicatePanelBody,
  type Panel,
  type UpdatePanelBody,
} from '../../../../shared/schemas/panel';
import { api } from '../../../lib/api-client';

export const panelKeys = {
  all: ['panels'] as const,
  list: () => ['panels', 'list'] as const,
  one: (id: string) => ['panels', 'one', id] as const,
  versions: (id: string) => ['panels', 'one', id, 'versions'] as const,
  version: (id: string, versionId: string) => ['panels', 'one', id, 'versions', versionId] as const,
};

const at = (id: string) => `/panels/${encodeURIComponent(id)}`;

export const listPanels = () => api.get('/panels', panelListSchema).then((r) => r.panels);
export const getPanel = (id: string) => api.get(at(id), panelSchema);
export const createPanel = (body: CreatePanelBody) => api.post('/panels', body, panelSchema);
export const updatePanel = (id: string, body: UpdatePanelBody) => api.put(at(id), body, panelSchema);
export const deletePanel = (id: string) => api.delete(at(id));
export const duplicatePanel = (id: string, body: DuplicatePanelBody) => api.post(`${at(id)}/duplicate`, body, panelSchema);
export const listPanelVersions = (id: string) => api.get(`${at(id)}/versions`, panelVersionListSchema).then((r) => r.versions);
export const getPanelVersion = (id: string, versionId: string) =>
  api.get(`${at(id)}/versions/${encodeURIComponent(versionId)}`, panelVersionSchema);
export const publishPanel = (id: string, versionId: string) => api.post(`${at(id)}/publish`, { versionId }, panelSummarySchema);
/** The file's JSON as read from disk; the server validates it and answers with the issues of a bad one. */
export const importPanel = (file: unknown) => api.post('/panels/import', file, panelSchema);
/** Where the browser downloads a panel's file from (the server answers with an attachment). */
export const exportPanelUrl = (id: string) => `/api${at(id)}/export`;

export const panelsQuery = () => queryOptions({ queryKey: panelKeys.list(), queryFn: listPanels });
export const usePanels = () => useQuery(panelsQuery());

export const panelQuery = (id: string) => queryOptions({ queryKey: panelKeys.one(id), queryFn: () => getPanel(id) });
export const usePanel = (id: string) => useQuery(panelQuery(id));

export const panelVersionsQuery = (id: string) => queryOptions({ queryKey: panelKeys.versions(id), queryFn: () => listPanelVersions(id) });
export const usePanelVersions = (id: string) => useQuery(panelVersionsQuery(id));

export const panelVersionQuery = (id: string, versionId: string) =>
  // A version never changes once written.
  queryOptions({ queryKey: panelKeys.version(id, versionId), queryFn: () => getPanelVersion(id, versionId), staleTime: Infinity });

function useInvalidatePanels() {
  const queryClient = useQueryClient();
  return () => queryClient.invalidateQueries({ queryKey: panelKeys.all });
}

export function useCreatePanel() {
  const invalidate = useInvalidatePanels();
  return useMutation({ mutationFn: createPanel, onSuccess: () => invalidate() });
}

export function useRenamePanel() {
  const invalidate = useInvalidatePanels();
  return useMutation({
    mutationFn: ({ id, name, baseVersionId }: { id: string; name: string; baseVersionId: string }) => updatePanel(id, { baseVersionId, name }),
    onSuccess: () => invalidate(),
  });
}

export function useDuplicatePanel() {
  const invalidate = useInvalidatePanels();
  return useMutation({ mutationFn: ({ id, name }: { id: string; name?: string }) => duplicatePanel(id, name ? { name } : {}), onSuccess: () => invalidate() });
}

export function useDeletePanel() {
  const invalidate = useInvalidatePanels();
  return useMutation({ mutationFn: (id: string) => deletePanel(id), onSuccess: () => invalidate() });
}

export function useImportPanel() {
  const invalidate = useInvalidatePanels();
  return useMutation({ mutationFn: importPanel, onSuccess: () => invalidate() });
}

/** PUT a new version. A stale base answers 409 (an ApiError with status 409); the caller shows the conflict. */
export function useSavePanel(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdatePanelBody) => updatePanel(id, body),
    onSuccess: async (saved: Panel) => {
      queryClient.setQueryData(panelKeys.one(id), saved);
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: panelKeys.versions(id) }),
        queryClient.invalidateQueries({ queryKey: panelKeys.list() }),
      ]);
    },
  });
}

export function usePublishPanel(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (versionId: string) => publishPanel(id, versionId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: panelKeys.all }),
  });
}
