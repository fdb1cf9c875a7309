import { queryOptions, useQuery, type QueryClient } from '@tanstack/react-query';
import { meSchema, type Me } from '../../../../shared/schemas/auth';
import { api } from '../../../lib/api-client';

export const meKeys = { all: ['me'] as const };

export const getMe = () => api.get('/me', meSchema);

export const meQuery = () => queryOptions({ queryKey: meKeys.all, queryFn: getMe, staleTime: 60_000 });

export const useMe = () => useQuery(meQuery());

/** Stores the signed-in member after sign-in, sign-up or accepting an invite, so no refetch is needed. */
export function setSignedIn(queryClient: QueryClient, me: Me): void {
  queryClient.setQueryData(meKeys.all, me);
}
