// People suites: the test app with a recording mail queue, admin requests, and reading invitation links and audit rows.
import { and, asc, eq } from 'drizzle-orm';
import request from 'supertest';
import { auditLog } from '../../../db/schema';
import type { InvitationRequest } from '../../../shared/people';
import { createRecordingQueue, type RecordingQueue } from '../helpers/jobs';
import { signInAs } from '../helpers/sign-in';
import { setupTestApp, type TestContext, type TestUsers } from '../helpers/test-app';

export type PeopleContext = TestContext & {
  queue: RecordingQueue;
  cookies: Record<keyof TestUsers, string>;
  /** a request maker as this file's admin, on the app with the recording queue */
  asAdmin: (method: 'get' | 'post' | 'put' | 'delete', path: string) => request.Test;
  invite: (body: Partial<InvitationRequest>) => request.Test;
  /** the one-time token in the newest mail to `email` */
  tokenMailedTo: (email: string) => string;
  auditOf: (entityId: string) => Promise<{ actorId: string | null; action: string; before: unknown; after: unknown }[]>;
  unique: (what: string) => string;
};

export async function setupPeople(): Promise<PeopleContext> {
  const ctx = await setupTestApp();
  const queue = createRecordingQueue();
  const app = ctx.makeApp({ jobs: queue });
  const cookies = {} as Record<keyof TestUsers, string>;
  for (const key of Object.keys(ctx.users) as (keyof TestUsers)[]) cookies[key] = await signInAs(app, ctx.users[key].email);
  const asAdmin = (method: 'get' | 'post' | 'put' | 'delete', path: string) => request(app)[method](path).set('Cookie', cookies.admin);
  let n = 0;
  return {
    ...ctx, app, queue, cookies, asAdmin,
    invite: (body) => asAdmin('post', '/api/invitations').send(body),
    tokenMailedTo: (email) => {
      const mail = [...queue.mails].reverse().find((m) => m.to.includes(email));
      const token = mail && /invitation\?token=([A-Za-z0-9_-]{43})/.exec(mail.text)?.[1];
      if (!token) throw new Error(`no invitation mail to ${email}`);
      return token;
    },
    auditOf: (entityId) => ctx.db.select({ actorId: auditLog.actorId, action: auditLog.action, before: auditLog.before, after: auditLog.after })
      .from(auditLog).where(and(eq(auditLog.entity, 'user'), eq(auditLog.entityId, entityId))).orderBy(asc(auditLog.id)),
    unique: (what) => `${what}.${ctx.prefix}.${++n}@test.example`,
  };
}
