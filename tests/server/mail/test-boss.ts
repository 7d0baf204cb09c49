// pg-boss in a schema of its own for one mail test (so no other file's worker takes its jobs), with fast retries.
import { randomUUID } from 'node:crypto';
import PgBoss from 'pg-boss';
import { QUEUES } from '../../../server/jobs/queue';
import { dropTestSchema } from '../helpers/drop-schema';
import { testDatabaseUrl } from '../helpers/test-app';

export type TestBoss = { boss: PgBoss; schema: string; stop(): Promise<void> };

/** Queues as in production (mail → dead letter) but retried at once, so a test sees the retries in seconds. */
export async function startMailTestBoss(retryLimit: number): Promise<TestBoss> {
  const schema = `test_mail_${randomUUID().slice(0, 8)}`;
  const boss = new PgBoss({ connectionString: testDatabaseUrl(), schema, max: 3, schedule: false });
  boss.on('error', (err) => console.error(`[test boss ${schema}]`, err));
  await boss.start();
  await boss.createQueue(QUEUES.mailDead, { name: QUEUES.mailDead });
  await boss.createQueue(QUEUES.mail, { name: QUEUES.mail, retryLimit, retryDelay: 0, deadLetter: QUEUES.mailDead });
  return {
    boss,
    schema,
    async stop() {
      await boss.stop({ graceful: true, wait: true, timeout: 5000 });
      await dropTestSchema(testDatabaseUrl(), schema);
    },
  };
}

/** Polls `read` until `done` holds (or fails the test after `timeoutMs`). */
export async function waitFor<T>(read: () => Promise<T>, done: (value: T) => boolean, timeoutMs = 20_000): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await read();
    if (done(value)) return value;
    if (Date.now() > deadline) throw new Error(`condition not met within ${timeoutMs} ms; last value ${JSON.stringify(value)}`);
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
}
