import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { createRobotKeyBodySchema, createdRobotKeySchema, robotKeyListSchema } from '../../../../shared/schemas/team';
import { api } from '../../../lib/api-client';

export type CreateRobotKeyBody = z.infer<typeof createRobotKeyBodySchema>;

export const robotKeyKeys = { all: ['team', 'robot-keys'] as const };

export const listRobotKeys = () => api.get('/team/robot-keys', robotKeyListSchema).then((r) => r.keys);
export const createRobotKey = (body: CreateRobotKeyBody) => api.post('/team/robot-keys', body, createdRobotKeySchema);
export const revokeRobotKey = (id: string) => api.delete(`/team/robot-keys/${encodeURIComponent(id)}`);

export const robotKeysQuery = () => queryOptions({ queryKey: robotKeyKeys.all, queryFn: listRobotKeys });
export const useRobotKeys = () => useQuery(robotKeysQuery());

export function useCreateRobotKey() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createRobotKey,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: robotKeyKeys.all }),
  });
}

export function useRevokeRobotKey() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: revokeRobotKey,
    onSettled: () => queryClient.invalidateQueries({ queryKey: robotKeyKeys.all }),
  });
}
