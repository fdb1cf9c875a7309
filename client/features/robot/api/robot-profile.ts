import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { storedRobotProfileSchema, type RobotProfile } from '../../../../shared/schemas/robot-profile';
import { api } from '../../../lib/api-client';

export const robotProfileKeys = { all: ['team', 'robot-profile'] as const };

export const getRobotProfile = () => api.get('/team/robot-profile', storedRobotProfileSchema);
export const saveRobotProfile = (profile: RobotProfile) => api.put('/team/robot-profile', profile, storedRobotProfileSchema);

export const robotProfileQuery = () => queryOptions({ queryKey: robotProfileKeys.all, queryFn: getRobotProfile });
export const useRobotProfile = () => useQuery(robotProfileQuery());

export function useSaveRobotProfile() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveRobotProfile,
    onSuccess: (stored) => queryClient.setQueryData(robotProfileKeys.all, stored),
  });
}
