// What the People services need: the database, the mail queue port, the address links point to, and the time.
import type { Db } from '../../../db/client';
import type { MailQueue } from '../ports';

export type PeopleDeps = {
  db: Db;
  jobs: MailQueue;
  /** the app's address, without a trailing slash: invitation links start with it */
  publicUrl: string;
  now: Date;
  log?: (message: string, err: unknown) => void;
};

/**
 * Serialises every change to roles and deactivation: two admins demoting each other at once must not both pass
 * the last-admin check.
 */
export const PEOPLE_LOCK_KEY = 7_402_117;
