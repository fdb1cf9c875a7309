import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { seasonProfileSchema } from '../../../../shared/domain/season/season-profile';
import { branchTargetsSchema } from '../../../../shared/domain/season/targets';
import type { TargetsQuery } from '../../../../shared/schemas/season';
import { api } from '../../../lib/api-client';

export const seasonKeys = {
  all: ['season'] as const,
  profile: ['season', 'profile'] as const,
  /** `profileVersion` is the robot profile's `updatedAt`: targets without overrides follow the saved profile. */
  targets: (query: TargetsQuery, profileVersion: string | null) => ['season', 'targets', query, profileVersion] as const,
};

export const getSeason = () => api.get('/season', seasonProfileSchema);

export function getBranchTargets(query: TargetsQuery) {
  const params = new URLSearchParams({ alliance: query.alliance });
  if (query.side !== undefined) params.set('side', query.side);
  if (query.depth !== undefined) params.set('depth', String(query.depth));
  return api.get(`/season/targets?${params}`, branchTargetsSchema);
}

// The season profile is data shipped with the server; it changes only with a new server version.
export const seasonQuery = () => queryOptions({ queryKey: seasonKeys.profile, queryFn: getSeason, staleTime: Infinity });
export const useSeason = () => useQuery(seasonQuery());

export const branchTargetsQuery = (query: TargetsQuery, profileVersion: string | null) =>
  queryOptions({
    queryKey: seasonKeys.targets(query, profileVersion),
    queryFn: () => getBranchTargets(query),
    // Keep showing the last answer while an override refetches, so the table doesn't blink per keystroke.
    placeholderData: keepPreviousData,
  });
export const useBranchTargets = (query: TargetsQuery, profileVersion: string | null) =>
  useQuery(branchTargetsQuery(query, profileVersion));
