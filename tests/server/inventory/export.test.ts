// GET /api/export/scenario and /graphml: valid files that read back to the same network; who may export.
import Graph from 'graphology';
import { parse as parseGraphml } from 'graphology-graphml';
import request from 'supertest';
import { createDb } from '../../../db/client';
import { migrateDatabase } from '../../../db/migrate';
import { seedDemo } from '../../../db/seed';
import { loadNetworkScenario } from '../../../server/services/inventory/load-network-scenario';
import { scenarioToGraphml } from '../../../server/services/inventory/graphml-export';
import type { Scenario } from '../../../shared/scenario';
import { validateScenario } from '../../../shared/scenario-validate';
import { signInAs } from '../helpers/sign-in';
import { admin, setupInventoryApp, withDatabase, type InventoryContext } from './helpers/inventory-app';

let ctx: InventoryContext;
const NOW = new Date('2031-03-01T08:00:00Z');
beforeAll(async () => { ctx = await setupInventoryApp('export'); }, 60_000);
afterAll(() => ctx.close());

async function exportAs(email: string, kind: 'scenario' | 'graphml') {
  const app = ctx.makeApp({ now: () => NOW });
  const cookie = await signInAs(app, email);
  return request(app).get(`/api/export/${kind}`).set('Cookie', cookie).buffer(true).parse((res, done) => {
    let text = '';
    res.setEncoding('utf8');
    res.on('data', (chunk: string) => { text += chunk; });
    res.on('end', () => done(null, text));
  });
}

test('the scenario export is an attachment that validates and re-imports to the same data', async () => {
  const res = await exportAs(ctx.users.planner.email, 'scenario');
  expect(res.status).toBe(200);
  expect(res.headers['content-disposition']).toBe('attachment; filename="slackwater-scenario-2031-03-01.json"');
  expect(res.headers['content-type']).toMatch(/^application\/json/);
  const exported = JSON.parse(res.body as string) as Scenario;
  const check = validateScenario(exported);
  expect(check.ok).toBe(true);
  expect(exported.slices).toHaveLength(ctx.demo.slices.length);

  // Re-import into an empty database and load it back: the same scenario, field for field.
  const dbName = 'slackwater_inv_export_again';
  const base = ctx.databaseUrl;
  await admin(base, [`drop database if exists "${dbName}" with (force)`, `create database "${dbName}"`]);
  const url = withDatabase(base, dbName);
  try {
    await migrateDatabase(url);
    const again = createDb(url, { max: 2 });
    try {
      await seedDemo(again.db, exported, { now: NOW });
      expect(await loadNetworkScenario(again.db)).toEqual(exported);
    } finally {
      await again.pool.end();
    }
  } finally {
    await admin(base, [`drop database if exists "${dbName}" with (force)`]);
  }
}, 60_000);

test('the GraphML export parses back with graphology-graphml to the same sites and spans', async () => {
  const res = await exportAs(ctx.users.engineer.email, 'graphml');
  expect(res.status).toBe(200);
  expect(res.headers['content-disposition']).toBe('attachment; filename="slackwater-network-2031-03-01.graphml"');
  const graph = parseGraphml(Graph, res.body as string);
  expect(graph.type).toBe('undirected');
  expect(graph.getAttribute('name')).toBe(ctx.demo.name);
  expect(graph.order).toBe(ctx.demo.sites.length);
  expect(graph.size).toBe(ctx.demo.spans.length);
  for (const s of ctx.demo.sites) {
    const { mtbfHours, mttrHours, id, ...rest } = s;
    expect(graph.getNodeAttributes(id)).toEqual({ ...rest, ...(mtbfHours ? { mtbfHours } : {}), ...(mttrHours ? { mttrHours } : {}) });
  }
  for (const s of ctx.demo.spans) {
    expect(graph.extremities(s.id).sort()).toEqual([s.a, s.b].sort());
    const attrs = graph.getEdgeAttributes(s.id);
    expect(attrs).toMatchObject({ capacityGbps: s.capacityGbps, lengthKm: s.lengthKm });
    expect(attrs.latencyMs).toBe(s.latencyMs);
    expect(attrs.srlg ? String(attrs.srlg).split(',') : undefined).toEqual(s.srlg?.length ? s.srlg : undefined);
  }
});

test('GraphML text is escaped: names with markup characters survive the round trip', () => {
  const name = 'Quay <North> & "Old" Mill\'s';
  const xml = scenarioToGraphml({
    name: 'A & B',
    sites: [{ id: 'x&1', name, kind: 'edge', lat: 1.5, lon: -2.25, cpu: 8 }, { id: 'y', name: 'Y', kind: 'core', lat: 0, lon: 0, cpu: 1 }],
    spans: [{ id: 'k<1>', a: 'x&1', b: 'y', capacityGbps: 0.1, lengthKm: 3, srlg: ['d&1', 'd2'] }],
  });
  const graph = parseGraphml(Graph, xml);
  expect(graph.getAttribute('name')).toBe('A & B');
  expect(graph.getNodeAttribute('x&1', 'name')).toBe(name);
  expect(graph.getEdgeAttributes('k<1>')).toEqual({ capacityGbps: 0.1, lengthKm: 3, srlg: 'd&1,d2' });
});

test('who may export: planner, admin, engineer yes; approver and tenant no; signed out 401', async () => {
  for (const user of [ctx.users.admin, ctx.users.engineer]) {
    expect((await exportAs(user.email, 'scenario')).status).toBe(200);
  }
  for (const user of [ctx.users.approver, ctx.users.tenant, ctx.users.noRoles]) {
    expect((await exportAs(user.email, 'scenario')).status).toBe(403);
    expect((await exportAs(user.email, 'graphml')).status).toBe(403);
  }
  expect((await request(ctx.app).get('/api/export/scenario')).status).toBe(401);
  expect((await request(ctx.app).get('/api/export/graphml')).status).toBe(401);
});
