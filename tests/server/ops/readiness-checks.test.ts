// checkReadiness on plain ports: each check reports on its own, and a missing migration is named.
import { checkReadiness, type ReadinessPorts } from '../../../server/services/readiness/check-readiness';

const committed = [{ tag: '0000_initial', createdAtMs: 1000 }, { tag: '0001_more', createdAtMs: 2000 }, { tag: '0002_last', createdAtMs: 3000 }];

function ports(overrides: Partial<ReadinessPorts> = {}): ReadinessPorts {
  return {
    query: async () => undefined,
    appliedMigrations: async () => new Set([1000, 2000, 3000]),
    committedMigrations: committed,
    jobQueueRunning: () => true,
    timeoutMs: 50,
    ...overrides,
  };
}

test('all checks pass: ready, no problems', async () => {
  const r = await checkReadiness(ports());
  expect(r).toEqual({
    ready: true, problems: [],
    checks: { database: { ok: true, detail: 'answers' }, jobQueue: { ok: true, detail: 'running' }, migrations: { ok: true, detail: 'all 3 applied' } },
  });
});

test('migrations the database has not applied are named, oldest first', async () => {
  const r = await checkReadiness(ports({ appliedMigrations: async () => new Set([1000]) }));
  expect(r.ready).toBe(false);
  expect(r.problems).toEqual(['Migrations: 2 of 3 not applied: 0001_more, 0002_last']);
});

test('a database that never answers fails within the timeout, and migrations are left unchecked', async () => {
  let asked = false;
  const r = await checkReadiness(ports({
    query: () => new Promise(() => undefined),
    appliedMigrations: async () => { asked = true; return new Set(); },
  }));
  expect(r.checks.database).toEqual({ ok: false, detail: 'no answer within 50 ms' });
  expect(r.checks.migrations.ok).toBe(false);
  expect(asked).toBe(false);
});

test('a query refused for another reason than an outage says so, with its code', async () => {
  const r = await checkReadiness(ports({ query: async () => { throw Object.assign(new Error('permission denied'), { code: '42501' }); } }));
  expect(r.checks.database).toEqual({ ok: false, detail: 'the query failed (42501)' });
});
