// The invitation mail goes through the real queue and worker into the local SMTP sink, and GET /api/outbox lists
// it with the invitee among its recipients.
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { outboxListSchema } from '../../../shared/outbox';
import { startBackground, type Background } from '../../../server/background';
import { signInAs } from '../helpers/sign-in';
import { dropTestSchema } from '../helpers/drop-schema';
import { setupTestApp, testConfig, testDatabaseUrl, type TestContext } from '../helpers/test-app';
import { waitFor } from '../mail/test-boss';

let ctx: TestContext;
let background: Background;
const schema = `test_people_mail_${randomUUID().slice(0, 8)}`;

beforeAll(async () => {
  ctx = await setupTestApp();
  background = await startBackground({
    db: ctx.db, config: testConfig({ SMTP_URL: 'sink', SMTP_SINK_PORT: '0', JOB_SCHEMA: schema, WORKER_IN_PROCESS: 'true' }), log: () => undefined,
  });
}, 60_000);
afterAll(async () => {
  await background.stop();
  await dropTestSchema(testDatabaseUrl(), schema);
  await ctx.close();
});

test('the invitation mail reaches the outbox addressed to the invitee', async () => {
  const app = ctx.makeApp({ jobs: background.jobs });
  const cookie = await signInAs(app, ctx.users.admin.email);
  const email = `outbox.${ctx.prefix}@test.example`;
  const res = await request(app).post('/api/invitations').set('Cookie', cookie).send({ email, name: 'Mara', roles: ['approver'] });
  expect([res.status, res.body.mailQueued]).toEqual([201, true]);
  const list = await waitFor(
    async () => outboxListSchema.parse((await request(app).get('/api/outbox?pageSize=100').set('Cookie', cookie)).body),
    (l) => l.items.some((m) => m.to.includes(email)),
    30_000,
  );
  const mail = list.items.find((m) => m.to.includes(email))!;
  expect(mail.subject).toContain('invited you to Slackwater');
}, 60_000);
