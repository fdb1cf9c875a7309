import { queryOptions, useQuery } from '@tanstack/react-query';
import { devMailListSchema } from '../../../../shared/schemas/team';
import { api } from '../../../lib/api-client';

export const devMailKeys = { all: ['dev', 'mails'] as const };

export const listDevMails = () => api.get('/dev/mails', devMailListSchema).then((r) => r.mails);

/** Polls while the page is open: the point of the inbox is watching a reset or invite mail arrive. */
export const devMailsQuery = () =>
  queryOptions({ queryKey: devMailKeys.all, queryFn: listDevMails, refetchInterval: 3000, staleTime: 0 });

export const useDevMails = () => useQuery(devMailsQuery());
