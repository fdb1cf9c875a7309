import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { recorderRobotSchema, recorderStatusSchema, recorderStoppedSchema } from '../../../../shared/schemas/recorder';
import { api } from '../../../lib/api-client';

export const recorderKeys = { status: ['recorder', 'status'] as const };

export const getRecorderStatus = () => api.get('/recorder', recorderStatusSchema);
export const startRecording = (robot: string) => api.post('/recorder/start', { robot }, recorderRobotSchema);
export const stopRecording = (robot: string) => api.post('/recorder/stop', { robot }, recorderStoppedSchema);

/** The connected robots and what the recorder is doing with each; read every two seconds while shown. */
export const recorderStatusQuery = () => queryOptions({ queryKey: recorderKeys.status, queryFn: getRecorderStatus, refetchInterval: 2000 });
export const useRecorderStatus = () => useQuery(recorderStatusQuery());

function useRecorderCommand<T>(command: (robot: string) => Promise<T>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: command,
    onSettled: () => Promise.all([queryClient.invalidateQueries({ queryKey: recorderKeys.status }), queryClient.invalidateQueries({ queryKey: ['recordings'] })]),
  });
}
export const useStartRecording = () => useRecorderCommand(startRecording);
export const useStopRecording = () => useRecorderCommand(stopRecording);
