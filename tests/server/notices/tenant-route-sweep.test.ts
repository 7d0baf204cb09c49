// Every API route, read and write, asked by each tenant user with other tenants' ids and filters: 403 or 404,
// never data. The route list is read from the routers' source, so a new route fails here until it is swept.
import fs from 'node:fs';
import path from 'node:path';
import { and, eq } from 'drizzle-orm';
import { notices, windows } from '../../../db/schema';
import { leaksIn, setupTenantViews, TENANT_USERS, type TenantViewsContext, type TenantWho } from './tenant-fixture';

let ctx: TenantViewsContext;
const noticeIds: Record<string, string> = {};
beforeAll(async () => {
  ctx = await setupTenantViews();
  for (const n of await ctx.db.select().from(notices).where(eq(notices.windowId, ctx.notified))) noticeIds[n.tenantId] = n.id;
}, 60_000);
afterAll(async () => { await ctx.close(); });

const ROUTES_DIR = path.join(__dirname, '../../../server/routes');
/** "METHOD /api/..." for every route a router declares (routes/windows/* are mounted under /api/windows). */
function declaredRoutes(): string[] {
  const files = fs.readdirSync(ROUTES_DIR, { recursive: true }).map(String).filter((f) => f.endsWith('.ts'));
  return files.flatMap((file) => {
    const rel = file.replace(/\\/g, '/').replace(/\.ts$/, '');
    const prefix = `/api/${rel.startsWith('windows/') ? 'windows' : rel}`;
    const source = fs.readFileSync(path.join(ROUTES_DIR, file), 'utf8');
    return [...source.matchAll(/router\.(get|post|put|patch|delete)\('([^']*)'/g)]
      .map(([, method, p]) => `${method.toUpperCase()} ${prefix}${p === '/' ? '' : p}`);
  });
}

type Probe = { route: string; path: (who: TenantWho) => string; foreign: boolean; refusals?: number[] };
const RANGE = 'from=2031-05-01T00:00:00Z&to=2031-07-01T00:00:00Z';
/** Another tenant than `who`'s (the tenantless user has none, so both are others to it). */
const otherTenant = (who: TenantWho) => (who === 'tenant' ? ctx.otherTenantId : ctx.tenantId);
const otherNotice = (who: TenantWho) => noticeIds[otherTenant(who)];
const otherSlice = (who: TenantWho) => ctx.id(who === 'tenant' ? 'C' : 'A');
const w = () => ctx.unnotified;
/** Slice and tenant names `who` must never read. */
function foreignNames(who: TenantWho): string[] {
  const own = ['Port cranes', 'Harbour pilots', `Tenant ${ctx.prefix}`];
  const other = ['Yard cameras', 'Other Harbour Co'];
  return who === 'tenant' ? other : who === 'otherTenant' ? own : [...own, ...other];
}

const probes: Probe[] = [
  ...(['/api/me', '/api/overview', '/api/portal/work', '/api/sites', '/api/spans', '/api/tenants', '/api/slices',
    '/api/network/map', '/api/health', '/api/ready', '/api/me/otp', '/api/me/sessions'] as const)
    .map((p) => ({ route: `GET ${p}`, path: () => p, foreign: false })),
  { route: 'GET /api/windows', path: (who) => `/api/windows?${RANGE}&tenant=${otherTenant(who)}`, foreign: true },
  { route: 'GET /api/windows/:id', path: () => `/api/windows/${w()}`, foreign: true },
  ...['impact', 'conflicts', 'mop', 'notices', 'plans', 'history'].map((sub) => ({
    route: `GET /api/windows/:id/${sub}`, path: () => `/api/windows/${ctx.notified}/${sub}`, foreign: true })),
  ...['POST /api/windows', 'PATCH /api/windows/:id', 'POST /api/windows/:id/transition', 'POST /api/windows/:id/assess',
    'PUT /api/windows/:id/mop', 'POST /api/windows/:id/submit', 'POST /api/windows/:id/plans']
    .map((route) => ({ route, path: () => route.split(' ')[1].replace(':id', w()), foreign: true })),
  { route: 'GET /api/slices/:id', path: (who) => `/api/slices/${otherSlice(who)}`, foreign: true },
  { route: 'GET /api/tenants/:id', path: (who) => `/api/tenants/${otherTenant(who)}`, foreign: true },
  { route: 'GET /api/sites/:id', path: () => `/api/sites/${ctx.id('X4')}`, foreign: true },
  { route: 'GET /api/spans/:id', path: () => `/api/spans/${ctx.id('s4')}`, foreign: true },
  ...['GET /api/notices/:id', 'GET /api/notices/:id/ics', 'POST /api/notices/:id/acknowledge',
    'POST /api/notices/:id/resend', 'POST /api/notices/:id/override']
    .map((route) => ({ route, path: (who: TenantWho) => route.split(' ')[1].replace(':id', otherNotice(who)), foreign: true })),
  ...['GET /api/plans/:planId', 'POST /api/plans/:planId/cancel', 'POST /api/plans/:planId/accept']
    .map((route) => ({ route, path: () => route.split(' ')[1].replace(':planId', ctx.id('plan-notified')), foreign: true })),
  ...['GET /api/signoff/:windowId', 'POST /api/signoff/:windowId/decision']
    .map((route) => ({ route, path: () => route.split(' ')[1].replace(':windowId', ctx.notified), foreign: true })),
  ...['queue', 'waiting-count', 'decided-by-me']
    .map((sub) => ({ route: `GET /api/signoff/${sub}`, path: () => `/api/signoff/${sub}`, foreign: true })),
  { route: 'DELETE /api/signoff/otp-keys/:userId', path: () => `/api/signoff/otp-keys/${ctx.users.engineer.id}`, foreign: true },
  // Feeds answer by the token in the address alone (no session): a made-up token is not found, for anyone.
  { route: 'GET /api/calendar-feeds/:file', path: () => `/api/calendar-feeds/${'A'.repeat(43)}.ics`, foreign: true },
  ...['GET /api/windows/:id/pack', 'GET /api/windows/:id/moves.csv']
    .map((route) => ({ route, path: () => route.split(' ')[1].replace(':id', ctx.notified), foreign: true })),
  ...['GET /api/demo-data', 'DELETE /api/demo-data'].map((route) => ({ route, path: () => '/api/demo-data', foreign: true })),
  // The first-admin set-up runs without a session: a made-up link is not found, and set-up is refused once an admin
  // exists (or the body is not a set-up form).
  { route: 'GET /api/set-up/:token', path: () => `/api/set-up/${'A'.repeat(43)}`, foreign: true },
  { route: 'POST /api/set-up', path: () => '/api/set-up', foreign: true, refusals: [400, 404, 409] },
  // A made-up session id is malformed, so 400 is a refusal here too.
  { route: 'DELETE /api/me/sessions/:id', path: () => '/api/me/sessions/someone-elses-session', foreign: true, refusals: [400, 403, 404] },
  ...['GET /api/users', 'POST /api/scenarios/validate', 'GET /api/freezes', 'POST /api/freezes', 'PATCH /api/freezes/:id',
    'DELETE /api/freezes/:id', 'GET /api/policies', 'PATCH /api/policies', 'POST /api/imports', 'GET /api/imports',
    'GET /api/imports/templates/:kind', 'GET /api/imports/:id', 'POST /api/imports/:id/apply', 'GET /api/export/scenario',
    'GET /api/export/graphml', 'GET /api/outbox', 'GET /api/outbox/:id', 'GET /api/outbox/:id/raw',
    'GET /api/sso', 'PUT /api/sso']
    .map((route) => ({ route, path: () => route.split(' ')[1].replace(/:\w+/, 'sites'), foreign: true })),
  // Slot searches (engineers, planners, admins) and campaigns (planners; admins and engineers read): staff only.
  ...['POST /api/slot-searches', 'GET /api/slot-searches/:id', 'POST /api/campaigns', 'GET /api/campaigns',
    'GET /api/campaigns/:id', 'PATCH /api/campaigns/:id', 'POST /api/campaigns/:id/book', 'DELETE /api/campaigns/:id']
    .map((route) => ({ route, path: () => route.split(' ')[1].replace(':id', 'cp-someone-elses'), foreign: true })),
  // The audit trail (admins and approvers): a window's rows as CSV, and the filter choices (people, windows, actions).
  { route: 'GET /api/audit', path: () => `/api/audit?window=${ctx.notified}&format=csv`, foreign: true },
  { route: 'GET /api/audit/choices', path: () => '/api/audit/choices', foreign: true },
  // Password resets run without a session: a made-up link is not found, and a reset without a token is refused.
  { route: 'GET /api/auth/reset-password/:token', path: () => `/api/auth/reset-password/${'A'.repeat(43)}`, foreign: true },
  { route: 'POST /api/auth/reset-password', path: () => '/api/auth/reset-password', foreign: true, refusals: [400, 404] },
  // Single sign-on redirects (no SSO set up here: back to sign-in) and the button's words: the same for anyone.
  ...['GET /api/auth/sso/button', 'GET /api/auth/sso/start', 'GET /api/auth/sso/callback']
    .map((route) => ({ route, path: () => route.split(' ')[1], foreign: false })),
  // People (admin): changes to another person and invitations; a tenant user is refused before the body is read.
  ...['PUT /api/users/:id/roles', 'POST /api/users/:id/deactivate', 'POST /api/users/:id/reactivate', 'POST /api/invitations',
    'POST /api/invitations/:id/resend', 'DELETE /api/invitations/:id']
    .map((route) => ({ route, path: () => route.split(' ')[1].replace(':id', ctx.users.engineer.id), foreign: true })),
  // The invitee's own routes need no session: a made-up link is not found, and a body without a token is refused.
  { route: 'GET /api/invitations/link/:token', path: () => `/api/invitations/link/${'A'.repeat(43)}`, foreign: true },
  { route: 'POST /api/invitations/accept', path: () => '/api/invitations/accept', foreign: true, refusals: [400, 404] },
  // Own-user routes naming no one else: answered for the caller, checked for leaks only.
  ...['POST /api/auth/forgot-password', 'POST /api/me/password'].map((route) => ({ route, path: () => route.split(' ')[1], foreign: false })),
  ...['POST /api/auth/sign-in', 'POST /api/me/otp/enrol', 'POST /api/me/otp/confirm', 'DELETE /api/me/otp', 'PATCH /api/me/time-zone',
    'GET /api/me/calendar-feed', 'DELETE /api/me/calendar-feed']
    .map((route) => ({ route, path: () => route.split(' ')[1], foreign: false })),
];
/** They end the caller's own sessions and name no one else; calling them would sign the sweep out. */
const NOT_CALLED = ['POST /api/auth/sign-out', 'POST /api/me/sessions/revoke-all'];

test('the sweep covers every route the routers declare', () => {
  const swept = new Set([...probes.map((p) => p.route), ...NOT_CALLED]);
  expect(declaredRoutes().filter((r) => !swept.has(r))).toEqual([]);
});

describe.each(TENANT_USERS)('as %s', (who) => {
  test.each(probes.map((p) => [p.route, p] as const))('%s', async (_route, probe) => {
    const [method, routePath] = probe.route.split(' ');
    const call = (await ctx.asTenant(who))(method.toLowerCase() as 'get', probe.path(who));
    const res = method === 'GET' || method === 'DELETE' ? await call : await call.send({ version: 1 });
    if (probe.foreign) expect([routePath, (probe.refusals ?? [403, 404]).includes(res.status) ? 'refused' : res.status]).toEqual([routePath, 'refused']);
    const i = ctx.internals;
    const secrets = [i.title, i.ownerName, i.notes, i.mopFileName, i.overrideReason, ctx.unnotified, ctx.blocked,
      otherTenant(who), otherSlice(who), ...foreignNames(who)]
      // A refusal may echo the id the caller sent ("No window <id>."): that tells it nothing it did not say.
      .filter((s) => res.status < 400 || !probe.path(who).includes(s));
    expect(leaksIn(res.body, secrets).values).toEqual([]);
  });
});

test('the writes changed nothing: the window is as booked and no notice was acknowledged', async () => {
  const [row] = await ctx.db.select().from(windows).where(eq(windows.id, ctx.unnotified));
  expect([row.version, row.status]).toEqual([1, 'cleared']);
  const acked = await ctx.db.select().from(notices).where(and(eq(notices.windowId, ctx.notified)));
  expect(acked.map((n) => n.acknowledgedAt)).toEqual([null, null]);
});
