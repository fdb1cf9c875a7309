import { queryOptions, useQuery } from '@tanstack/react-query';
import { serverConfigSchema } from '../../../../shared/schemas/auth';
import { api } from '../../../lib/api-client';

export const serverConfigKeys = { all: ['server-config'] as const };

export const getServerConfig = () => api.get('/config', serverConfigSchema);

export const serverConfigQuery = () =>
  queryOptions({ queryKey: serverConfigKeys.all, queryFn: getServerConfig, staleTime: Infinity });

export const useServerConfig = () => useQuery(serverConfigQuery());
