import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { inviteListSchema, inviteSchema, type CreateInviteBody } from '../../../../shared/schemas/team';
import { api } from '../../../lib/api-client';

export const inviteKeys = { all: ['team', 'invites'] as const };

export const listInvites = () => api.get('/team/invites', inviteListSchema).then((r) => r.invites);
export const createInvite = (body: CreateInviteBody) => api.post('/team/invites', body, inviteSchema);
export const revokeInvite = (id: string) => api.delete(`/team/invites/${encodeURIComponent(id)}`);

export const invitesQuery = () => queryOptions({ queryKey: inviteKeys.all, queryFn: listInvites });
export const useInvites = () => useQuery(invitesQuery());

export function useCreateInvite() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createInvite,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: inviteKeys.all }),
  });
}

export function useRevokeInvite() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: revokeInvite,
    onSettled: () => queryClient.invalidateQueries({ queryKey: inviteKeys.all }),
  });
}
