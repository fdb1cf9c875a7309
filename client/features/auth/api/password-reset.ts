import { useMutation } from '@tanstack/react-query';
import type { z } from 'zod';
import { okSchema, resetConfirmBodySchema, resetRequestBodySchema } from '../../../../shared/schemas/auth';
import { api } from '../../../lib/api-client';

export type ResetRequestBody = z.infer<typeof resetRequestBodySchema>;
export type ResetConfirmBody = z.infer<typeof resetConfirmBodySchema>;

export const requestPasswordReset = (body: ResetRequestBody) => api.post('/auth/password-reset/request', body, okSchema);
export const confirmPasswordReset = (body: ResetConfirmBody) => api.post('/auth/password-reset/confirm', body, okSchema);

export const useRequestPasswordReset = () => useMutation({ mutationFn: requestPasswordReset });
export const useConfirmPasswordReset = () => useMutation({ mutationFn: confirmPasswordReset });
