// Invitation lifecycle against PostgreSQL: invite (mail queued to the invitee), accept once, expired, reused,
// revoked and superseded links refused, bad input refused with nothing stored, audit rows without secrets.
import request from 'supertest';
import { createLogger } from '../../../server/log/logger';
import { peopleListSchema } from '../../../shared/people';
import { sessionCookieFrom } from '../helpers/test-app';
import { setupPeople, type PeopleContext } from './people-fixture';

let ctx: PeopleContext;
beforeAll(async () => { ctx = await setupPeople(); });
afterAll(() => ctx.close());

const PASSWORD = 'quiet ferry lantern 84 gulls';
const HOUR_MS = 60 * 60 * 1000;

async function inviteOne(what = 'invitee', roles: string[] = ['planner']) {
  const email = ctx.unique(what);
  const res = await ctx.invite({ email, name: `Ada ${what}`, roles: roles as never });
  expect(res.status).toBe(201);
  return { email, id: res.body.id as string, token: ctx.tokenMailedTo(email), body: res.body };
}

const accept = (token: string, app = ctx.app) => request(app).post('/api/invitations/accept').send({ token, password: PASSWORD });
const linkStatus = (token: string, app = ctx.app) => request(app).get(`/api/invitations/link/${token}`);

async function statusOf(id: string): Promise<string | undefined> {
  const { users } = peopleListSchema.parse((await ctx.asAdmin('get', '/api/users')).body);
  return users.find((u) => u.id === id)?.status;
}

test('an invitation answers 201 with the id and queues one mail to the invitee holding the link', async () => {
  const before = ctx.queue.mails.length;
  const { email, id, body, token } = await inviteOne('mailed');
  expect(body).toMatchObject({ id, email, roles: ['planner'], tenantId: null, mailQueued: true });
  expect(ctx.queue.mails.slice(before).map((m) => m.to)).toEqual([[email]]);
  expect(ctx.queue.mails.at(-1)!.text).toContain(`/invitation?token=${token}`);
  expect(ctx.queue.mails.at(-1)!.text).toContain('72 hours');
  expect(await statusOf(id)).toBe('invited');
});

test('the link opens once: it shows whom it is for, accepting signs in, and a second use is refused', async () => {
  const { email, id, token } = await inviteOne('once', ['engineer', 'approver']);
  expect((await linkStatus(token)).body).toEqual({ email, name: 'Ada once', staff: true });
  const first = await accept(token);
  expect(first.status).toBe(201);
  expect(first.body.user).toMatchObject({ id, email, roles: ['engineer', 'approver'] });
  const me = await request(ctx.app).get('/api/me').set('Cookie', sessionCookieFrom(first));
  expect(me.status).toBe(200);
  const again = await accept(token);
  expect([again.status, again.body.error.code]).toEqual([404, 'INVITATION_LINK_INVALID']);
  expect((await linkStatus(token)).status).toBe(404);
  expect((await request(ctx.app).post('/api/auth/sign-in').send({ email, password: PASSWORD })).status).toBe(200);
  expect(await statusOf(id)).toBe('active');
});

test('a link works until 72 hours after it was sent and not after', async () => {
  const { token } = await inviteOne('expiry');
  const at = (ms: number) => ctx.makeApp({ now: () => new Date(Date.now() + ms) });
  expect((await linkStatus(token, at(71 * HOUR_MS))).status).toBe(200);
  const late = at(72 * HOUR_MS + 60_000);
  expect((await linkStatus(token, late)).status).toBe(404);
  expect((await accept(token, late)).status).toBe(404);
});

test('resending makes a new link and the old one stops working', async () => {
  const { email, id, token: old } = await inviteOne('resend');
  const res = await ctx.asAdmin('post', `/api/invitations/${id}/resend`);
  expect(res.status).toBe(200);
  const fresh = ctx.tokenMailedTo(email);
  expect(fresh).not.toBe(old);
  expect((await accept(old)).status).toBe(404);
  expect((await accept(fresh)).status).toBe(201);
  // Joined: there is no invitation left to resend or revoke.
  expect((await ctx.asAdmin('post', `/api/invitations/${id}/resend`)).body.error.code).toBe('INVITATION_NOT_FOUND');
  expect((await ctx.asAdmin('delete', `/api/invitations/${id}`)).status).toBe(404);
});

test('a revoked invitation\'s link is refused and the waiting account is gone, its trail kept', async () => {
  const { id, token } = await inviteOne('revoke');
  expect((await ctx.asAdmin('delete', `/api/invitations/${id}`)).status).toBe(204);
  expect((await accept(token)).status).toBe(404);
  expect(await statusOf(id)).toBeUndefined();
  expect((await ctx.auditOf(id)).map((r) => r.action)).toEqual(['invitation.create', 'invitation.revoke']);
});

test('a short or easily guessed password is refused and the link still works', async () => {
  const { token } = await inviteOne('weak');
  const short = await request(ctx.app).post('/api/invitations/accept').send({ token, password: 'too short' });
  expect(short.status).toBe(400);
  const guessable = await request(ctx.app).post('/api/invitations/accept').send({ token, password: 'password1234' });
  expect([guessable.status, guessable.body.error.code]).toEqual([400, 'WEAK_PASSWORD']);
  expect((await linkStatus(token)).status).toBe(200);
});

describe('bad invitations are refused and nothing is stored', () => {
  test.each([
    ['a tenant role without a tenant', { roles: ['tenant'] }, 'VALIDATION_FAILED'],
    ['a tenant contact with an operator role', { roles: ['tenant', 'planner'], tenantId: 'TENANT' }, 'VALIDATION_FAILED'],
    ['a tenant for a staff member', { roles: ['engineer'], tenantId: 'TENANT' }, 'VALIDATION_FAILED'],
    ['no role at all', { roles: [] }, 'VALIDATION_FAILED'],
    ['an unknown tenant', { roles: ['tenant'], tenantId: 'no-such-tenant' }, 'UNKNOWN_TENANT'],
    ['an address already on the list', { roles: ['planner'], email: 'ADMIN' }, 'EMAIL_IN_USE'],
  ])('%s', async (_what, extra, code) => {
    const email = ctx.unique('refused');
    const body = { email, name: 'Refused', ...extra } as Record<string, unknown>;
    if (body.tenantId === 'TENANT') body.tenantId = ctx.tenantId;
    if (body.email === 'ADMIN') body.email = ctx.users.admin.email.toUpperCase();
    const mails = ctx.queue.mails.length;
    const res = await ctx.invite(body);
    expect([res.status >= 400 && res.status < 500, res.body.error.code]).toEqual([true, code]);
    expect(ctx.queue.mails.length).toBe(mails);
    const { users } = peopleListSchema.parse((await ctx.asAdmin('get', `/api/users?q=${encodeURIComponent(email)}`)).body);
    expect(users).toEqual([]);
  });
});

test('a tenant contact is invited bound to exactly one tenant', async () => {
  const email = ctx.unique('tenant-contact');
  const res = await ctx.invite({ email, name: 'Tess', roles: ['tenant'], tenantId: ctx.tenantId });
  expect(res.status).toBe(201);
  expect(res.body).toMatchObject({ roles: ['tenant'], tenantId: ctx.tenantId });
  expect(ctx.queue.mails.at(-1)!.text).toContain(`a contact for Tenant ${ctx.prefix}`);
  // Tenant contacts never sign in through single sign-on, so their link offers only a password.
  expect((await linkStatus(ctx.tokenMailedTo(email))).body).toEqual({ email, name: 'Tess', staff: false });
});

test('when the mail cannot be queued the invitation stands and says so', async () => {
  // The default app has no job queue: every sendMail fails.
  const email = ctx.unique('no-queue');
  const output: string[] = [];
  const logger = createLogger({ level: 'warn', format: 'json', destination: { write: (line: string) => { output.push(line); } } });
  const res = await request(ctx.makeApp({ logger })).post('/api/invitations').set('Cookie', ctx.cookies.admin).send({ email, name: 'Q', roles: ['planner'] });
  expect([res.status, res.body.mailQueued]).toEqual([201, false]);
  expect(output.map((line) => JSON.parse(line))).toContainEqual(expect.objectContaining({
    msg: 'the invitation mail could not be queued', reqId: res.headers['x-request-id'], err: expect.objectContaining({ type: expect.any(String) }),
  }));
});

test('audit rows name the actor and the change, never the token or the password', async () => {
  const { id, token } = await inviteOne('audited');
  await accept(token);
  const rows = await ctx.auditOf(id);
  expect(rows.map((r) => [r.action, r.actorId])).toEqual([['invitation.create', ctx.users.admin.id], ['invitation.accept', id]]);
  expect(rows[0].after).toMatchObject({ roles: ['planner'], name: 'Ada audited' });
  const text = JSON.stringify(rows);
  expect(text).not.toContain(token);
  expect(text).not.toContain(PASSWORD);
});
