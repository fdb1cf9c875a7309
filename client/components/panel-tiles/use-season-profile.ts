import { useQuery } from '@tanstack/react-query';
import { seasonProfileSchema } from '../../../shared/domain/season/season-profile';
import { api } from '../../lib/api-client';

/** The season profile for drawing the reef; the same cache entry as the season feature's query. `always`: run mode reads it from the service worker's cache with no network. */
export function useSeasonProfile() {
  return useQuery({ queryKey: ['season', 'profile'], queryFn: () => api.get('/season', seasonProfileSchema), staleTime: Infinity, networkMode: 'always' });
}
