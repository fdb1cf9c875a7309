import { keepPreviousData, queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import {
  recordingDetailSchema,
  recordingPageSchema,
  type RecordingPatch,
} from '../../../../shared/schemas/recording';
import { api } from '../../../lib/api-client';
import { apiSearchFromView, type RecordingView } from '../model/list-query';

export const recordingKeys = {
  all: ['recordings'] as const,
  lists: () => ['recordings', 'list'] as const,
  list: (view: RecordingView) => ['recordings', 'list', apiSearchFromView(view)] as const,
  one: (id: string) => ['recordings', 'one', id] as const,
};

export const listRecordings = (view: RecordingView) => api.get(`/recordings?${apiSearchFromView(view)}`, recordingPageSchema);
export const getRecording = (id: string) => api.get(`/recordings/${encodeURIComponent(id)}`, recordingDetailSchema);
export const updateRecording = (id: string, patch: RecordingPatch) =>
  api.patch(`/recordings/${encodeURIComponent(id)}`, patch, recordingDetailSchema);
export const deleteRecording = (id: string) => api.delete(`/recordings/${encodeURIComponent(id)}`);

/** Where the browser downloads a recording from (the server answers with an attachment). */
export const exportUrl = (id: string, format: 'pitwall' | 'csv') =>
  `/api/recordings/${encodeURIComponent(id)}/export?format=${format}`;

export const recordingsQuery = (view: RecordingView) =>
  queryOptions({
    queryKey: recordingKeys.list(view),
    queryFn: () => listRecordings(view),
    // Keep the old page on screen while the next one loads, so the table doesn't jump.
    placeholderData: keepPreviousData,
  });
export const useRecordings = (view: RecordingView) => useQuery(recordingsQuery(view));

/** While a recording is still being made it is read again every second, so its replay follows it and sees it end. */
export const recordingQuery = (id: string) =>
  queryOptions({
    queryKey: recordingKeys.one(id),
    queryFn: () => getRecording(id),
    refetchInterval: (query) => (query.state.data?.status === 'recording' ? 1000 : false),
  });
export const useRecording = (id: string) => useQuery(recordingQuery(id));

/** PATCH one recording; the detail shows the answer at once, and the detail and every list page refetch. */
export function useUpdateRecording(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (patch: RecordingPatch) => updateRecording(id, patch),
    onSuccess: async (saved) => {
      queryClient.setQueryData(recordingKeys.one(id), saved);
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: recordingKeys.one(id), exact: true }),
        queryClient.invalidateQueries({ queryKey: recordingKeys.lists() }),
      ]);
    },
  });
}

export type BulkProgress = { done: number; total: number; failed: { id: string; message: string }[] };

/**
 * Runs `step` for each id, one after another (so the server sees one change at a time and the person sees
 * how far it got), collecting failures instead of stopping at the first.
 */
export async function runInSequence(
  ids: readonly string[],
  step: (id: string) => Promise<unknown>,
  onProgress: (p: BulkProgress) => void,
  describeError: (e: unknown) => string,
): Promise<BulkProgress> {
  const progress: BulkProgress = { done: 0, total: ids.length, failed: [] };
  onProgress({ ...progress });
  for (const id of ids) {
    try {
      await step(id);
    } catch (e) {
      progress.failed.push({ id, message: describeError(e) });
    }
    progress.done += 1;
    onProgress({ ...progress, failed: [...progress.failed] });
  }
  return progress;
}

export function useInvalidateRecordings() {
  const queryClient = useQueryClient();
  return () => queryClient.invalidateQueries({ queryKey: recordingKeys.all });
}
