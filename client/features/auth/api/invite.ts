import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { meSchema } from '../../../../shared/schemas/auth';
import { acceptInviteBodySchema, invitePreviewSchema } from '../../../../shared/schemas/team';
import { api } from '../../../lib/api-client';
import { setSignedIn } from './me';

export type AcceptInviteBody = z.infer<typeof acceptInviteBodySchema>;

export const invitePreviewKeys = { one: (token: string) => ['invite-preview', token] as const };

export const getInvitePreview = (token: string) => api.get(`/invites/${encodeURIComponent(token)}`, invitePreviewSchema);
export const acceptInvite = (token: string, body: AcceptInviteBody) =>
  api.post(`/invites/${encodeURIComponent(token)}/accept`, body, meSchema);

export const invitePreviewQuery = (token: string) =>
  queryOptions({ queryKey: invitePreviewKeys.one(token), queryFn: () => getInvitePreview(token), staleTime: Infinity });

export const useInvitePreview = (token: string) => useQuery(invitePreviewQuery(token));

export function useAcceptInvite(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: AcceptInviteBody) => acceptInvite(token, body),
    onSuccess: (me) => setSignedIn(queryClient, me),
  });
}
