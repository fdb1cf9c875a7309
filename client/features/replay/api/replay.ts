import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import { createNoteBodySchema, noteListSchema, noteSchema, type CreateNoteBody } from '../../../../shared/schemas/note';
import { recordingEventsSchema, recordingSignalsSchema, samplesSchema } from '../../../../shared/schemas/recording';
import { api } from '../../../lib/api-client';
import { ApiError } from '../../../lib/api-error';

const base = (id: string) => `/recordings/${encodeURIComponent(id)}`;

export const replayKeys = {
  signals: (id: string) => ['recordings', 'one', id, 'signals'] as const,
  samples: (id: string, signal: string) => ['recordings', 'one', id, 'samples', signal] as const,
  events: (id: string) => ['recordings', 'one', id, 'events'] as const,
  notes: (id: string) => ['recordings', 'one', id, 'notes'] as const,
};

export const listSignals = (id: string) => api.get(`${base(id)}/signals`, recordingSignalsSchema);
export const getSamples = (id: string, signal: string) =>
  api.get(`${base(id)}/samples?signal=${encodeURIComponent(signal)}`, samplesSchema);
export const listEvents = (id: string) => api.get(`${base(id)}/events`, recordingEventsSchema);
export const listNotes = (id: string) => api.get(`${base(id)}/notes`, noteListSchema);
export const createNote = (id: string, body: CreateNoteBody) => api.post(`${base(id)}/notes`, createNoteBodySchema.parse(body), noteSchema);
export const deleteNote = (id: string, noteId: string) => api.delete(`${base(id)}/notes/${encodeURIComponent(noteId)}`);

// A finished recording never changes, so its samples stay fresh for the whole visit. A recording still being
// made is read again every LIVE_REFETCH_MS while the page follows it.
export const LIVE_REFETCH_MS = 1000;
const freshness = (isLive: boolean) => (isLive ? { staleTime: 0, refetchInterval: LIVE_REFETCH_MS } : { staleTime: Infinity });
export const signalsQuery = (id: string, isLive = false) =>
  queryOptions({ queryKey: replayKeys.signals(id), queryFn: () => listSignals(id), ...freshness(isLive) });
export const samplesQuery = (id: string, signal: string, isLive = false) =>
  queryOptions({ queryKey: replayKeys.samples(id, signal), queryFn: () => getSamples(id, signal), ...freshness(isLive) });
export const eventsQuery = (id: string, isLive = false) =>
  queryOptions({ queryKey: replayKeys.events(id), queryFn: () => listEvents(id), ...freshness(isLive) });
export const notesQuery = (id: string) =>
  queryOptions({
    queryKey: replayKeys.notes(id),
    queryFn: () => listNotes(id),
    // A server without notes yet answers 404; say so once instead of retrying.
    retry: (count, error) => !(error instanceof ApiError && error.status === 404) && count < 2,
  });

export const useSignals = (id: string, isLive = false) => useQuery(signalsQuery(id, isLive));
export const useEvents = (id: string, isLive = false) => useQuery(eventsQuery(id, isLive));
export const useNotes = (id: string) => useQuery(notesQuery(id));

export function useCreateNote(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateNoteBody) => createNote(id, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: replayKeys.notes(id) }),
  });
}

export function useDeleteNote(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (noteId: string) => deleteNote(id, noteId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: replayKeys.notes(id) }),
  });
}

/** Once a live recording is finished, everything read while it grew is read again, complete. */
export function useRefreshReplay(id: string) {
  const queryClient = useQueryClient();
  return useCallback(() => queryClient.invalidateQueries({ queryKey: ['recordings', 'one', id], exact: false }), [queryClient, id]);
}
