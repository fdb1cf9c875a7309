import { useMutation, useQueryClient } from '@tanstack/react-query';
import { meSchema, type SignInBody } from '../../../../shared/schemas/auth';
import { api } from '../../../lib/api-client';
import { setSignedIn } from './me';

export const signIn = (body: SignInBody) => api.post('/auth/sign-in', body, meSchema);

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: signIn, onSuccess: (me) => setSignedIn(queryClient, me) });
}
