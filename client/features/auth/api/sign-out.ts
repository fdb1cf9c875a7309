import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export const signOut = () => api.post('/auth/sign-out', undefined, undefined);

/** Signs out and forgets every cached answer, so the next person at this tablet sees nothing of it. */
export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: signOut, onSuccess: () => queryClient.clear() });
}
