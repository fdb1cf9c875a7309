import type { UseQueryResult } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { Loading } from './loading';
import { QueryError } from './query-error';

type QueryGateProps<T> = {
  query: UseQueryResult<T>;
  loadingLabel: string;
  errorTitle: string;
  children: (data: T) => ReactNode;
};

/** Loading, then either the error with a retry or the children with the data. */
export function QueryGate<T>({ query, loadingLabel, errorTitle, children }: QueryGateProps<T>) {
  if (query.isPending) return <Loading label={loadingLabel} />;
  if (query.isError) {
    return <QueryError title={errorTitle} error={query.error} onRetry={() => query.refetch()} isRetrying={query.isFetching} />;
  }
  return children(query.data);
}
