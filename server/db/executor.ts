import type { Db } from './client';

/** A database or an open transaction: repos work on either. */
export type Executor = Db | Parameters<Parameters<Db['transaction']>[0]>[0];
