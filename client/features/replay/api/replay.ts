import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
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

// A finished recording never changes, so its samples stay fresh for the whole visit.
export const signalsQuery = (id: string) => queryOptions({ queryKey: replayKeys.signals(id), queryFn: () => listSignals(id), staleTime: Infinity });
export const samplesQuery = (id: string, signal: string) =>
  queryOptions({ queryKey: replayKeys.samples(id, signal), queryFn: () => getSamples(id, signal), staleTime: Infinity });
export const eventsQuery = (id: string) => queryOptions({ queryKey: replayKeys.events(id), queryFn: () => listEvents(id), staleTime: Infinity });
export const notesQuery = (id: string) =>
  queryOptions({
    queryKey: replayKeys.notes(id),
    queryFn: () => listNotes(id),
    // A server without notes yet answers 404; say so once instead of retrying.
    retry: (count, error) => !(error instanceof ApiError && error.status === 404) && count < 2,
  });

export const useSignals = (id: string) => useQuery(signalsQuery(id));
export const useEvents = (id: string) => useQuery(eventsQuery(id));
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
