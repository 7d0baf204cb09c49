// The transaction handle seeding works in.
import type { Db } from '../client';

export type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];
