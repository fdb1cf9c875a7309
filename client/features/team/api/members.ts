import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Role } from '../../../../shared/domain/roles';
import { memberListSchema, memberSchema } from '../../../../shared/schemas/team';
import { api } from '../../../lib/api-client';

export const memberKeys = { all: ['team', 'members'] as const };

export const listMembers = () => api.get('/team/members', memberListSchema).then((r) => r.members);
export const changeMemberRole = (userId: string, role: Role) =>
  api.patch(`/team/members/${encodeURIComponent(userId)}`, { role }, memberSchema);
export const removeMember = (userId: string) => api.delete(`/team/members/${encodeURIComponent(userId)}`);

export const membersQuery = () => queryOptions({ queryKey: memberKeys.all, queryFn: listMembers });
export const useMembers = () => useQuery(membersQuery());

export function useChangeMemberRole() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, role }: { userId: string; role: Role }) => changeMemberRole(userId, role),
    onSettled: () => queryClient.invalidateQueries({ queryKey: memberKeys.all }),
  });
}

export function useRemoveMember() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: removeMember,
    onSettled: () => queryClient.invalidateQueries({ queryKey: memberKeys.all }),
  });
}
