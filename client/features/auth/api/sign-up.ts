import { useMutation, useQueryClient } from '@tanstack/react-query';
import { meSchema, type SignUpBody } from '../../../../shared/schemas/auth';
import { api } from '../../../lib/api-client';
import { setSignedIn } from './me';

export const signUp = (body: SignUpBody) => api.post('/auth/sign-up', body, meSchema);

export function useSignUp() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: signUp, onSuccess: (me) => setSignedIn(queryClient, me) });
}
