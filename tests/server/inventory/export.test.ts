// GET /api/export/scenario and /graphml: valid files that read back to the same network; who may export.
import Graph from 'graphology';
import { parse as parseGraphml } from 'graphology-graphml';
import request from 'supertest';
import { createDb } from '../../../db/client';
import { migrateDatabase } from '../../../db/migrate';
import { seedDemo } from '../../../db/seed';
import { loadNetworkScenario } from '../../../server/services/inventory/load-network-scenario';
import { Writable } from 'node:stream';
import { graphmlPieces, loadGraphmlNetwork, scenarioToGraphml } from '../../../server/services/inventory/graphml-export';
import {
  assertExportable, scenarioJsonPieces, streamPieces,
} from '../../../server/services/inventory/stream-export';
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

/** What the export wrote before it streamed: the whole scenario validated, then printed in one piece. */
async function oldScenarioText(): Promise<string> {
  const result = validateScenario(await loadNetworkScenario(ctx.db));
  if (!result.ok) throw new Error('the demo should validate');
  return JSON.stringify(result.scenario, null, 2);
}

/** A sink that reads slowly (tiny buffer), so the writer has to wait for 'drain'. */
function slowSink(): { sink: Writable; text: () => string; writes: () => number } {
  const chunks: string[] = [];
  const sink = new Writable({
    highWaterMark: 16,
    write(chunk: Buffer, _enc, done) { chunks.push(chunk.toString('utf8')); setImmediate(done); },
  });
  return { sink, text: () => chunks.join(''), writes: () => chunks.length };
}

test('the streamed scenario export is byte for byte what the one-piece export wrote', async () => {
  const res = await exportAs(ctx.users.planner.email, 'scenario');
  expect(res.status).toBe(200);
  expect(res.body).toBe(await oldScenarioText());
});

test('exports in a row of one revision are each byte for byte what the one-piece export wrote', async () => {
  const expected = await oldScenarioText();
  for (const email of [ctx.users.planner.email, ctx.users.admin.email, ctx.users.engineer.email]) {
    const res = await exportAs(email, 'scenario');
    expect(res.status).toBe(200);
    expect(res.body).toBe(expected);
  }
});

test('an element that prints differently once parsed is written parsed on every export, not only the first', async () => {
  const scenario = await loadNetworkScenario(ctx.db);
  // A key the site schema does not know: parsing drops it, so the file must never carry it.
  const withExtra = { ...scenario, sites: [{ ...scenario.sites[0], note: 'not in the format' }, ...scenario.sites.slice(1)] };
  const expected = await oldScenarioText();
  expect([...scenarioJsonPieces(withExtra)].join('')).toBe(expected);
  expect([...scenarioJsonPieces(withExtra)].join('')).toBe(expected);
});

test('an export cut off part way leaves the next export of the same scenario checking every element', async () => {
  const scenario = await loadNetworkScenario(ctx.db);
  const last = scenario.placements.length - 1;
  const badLast = { ...scenario, placements: [...scenario.placements.slice(0, last), { ...scenario.placements[last], slice: '' }] };
  const pieces = scenarioJsonPieces(badLast);
  for (let i = 0; i < 5; i += 1) pieces.next();
  pieces.return(undefined);
  expect(() => [...scenarioJsonPieces(badLast)]).toThrow(new RegExp(`placements\\[${last}\\]\\.slice`));
});

test('the streamed GraphML export is byte for byte what the full-inventory export wrote', async () => {
  const res = await exportAs(ctx.users.admin.email, 'graphml');
  expect(res.status).toBe(200);
  expect(res.body).toBe(scenarioToGraphml(await loadNetworkScenario(ctx.db)));
});

test('streaming goes out in several writes, waits for a slow reader and loses nothing', async () => {
  const scenario = await loadNetworkScenario(ctx.db);
  const { sink, text, writes } = slowSink();
  await streamPieces(sink, scenarioJsonPieces(scenario));
  expect(text()).toBe(await oldScenarioText());
  expect(writes()).toBeGreaterThan(1);
  expect(sink.writableEnded).toBe(true);
});

test('a client that goes away mid-download does not leave the export waiting', async () => {
  const scenario = await loadNetworkScenario(ctx.db);
  let writes = 0;
  // A reader that never finishes a write: the writer must wait for drain, then the connection closes.
  const stuck = new Writable({ highWaterMark: 16, write() { writes += 1; setImmediate(() => stuck.destroy()); } });
  await streamPieces(stuck, scenarioJsonPieces(scenario));
  expect(writes).toBe(1);
  expect(stuck.writableEnded).toBe(false);
});

test('a gzip-accepting client gets the same streamed file, compressed', async () => {
  const app = ctx.makeApp({ now: () => NOW });
  const cookie = await signInAs(app, ctx.users.planner.email);
  const res = await request(app).get('/api/export/scenario').set('Cookie', cookie).set('Accept-Encoding', 'gzip');
  expect(res.status).toBe(200);
  expect(res.headers['content-encoding']).toBe('gzip');
  expect(res.text).toBe(await oldScenarioText());
});

test('scenario pieces print empty sections and a missing name exactly as JSON.stringify does', () => {
  const bare: Scenario = { format: 'slackwater-scenario/1', sites: [], spans: [], tenants: [], slices: [], placements: [] };
  expect([...scenarioJsonPieces(bare)].join('')).toBe(JSON.stringify(bare, null, 2));
});

test('an element with a bad shape stops the export with its JSON path; a dangling reference is refused up front', async () => {
  const scenario = await loadNetworkScenario(ctx.db);
  const badShape = { ...scenario, sites: [{ ...scenario.sites[0], cpu: -1 }, ...scenario.sites.slice(1)] };
  expect(() => [...scenarioJsonPieces(badShape)]).toThrow(/sites\[0\]\.cpu/);
  const dangling = { ...scenario, spans: [{ ...scenario.spans[0], a: 'no-such-site' }, ...scenario.spans.slice(1)] };
  expect(() => assertExportable(dangling)).toThrow(/EXPORT_INVALID|does not form a valid scenario/);
  expect(() => assertExportable(scenario)).not.toThrow();
});

test('the GraphML export reads no slice, function, tie, placement or tenant rows: it works with those tables gone', async () => {
  const expected = scenarioToGraphml(await loadNetworkScenario(ctx.db));
  const dbName = 'slackwater_inv_export_sites_only';
  const base = ctx.databaseUrl;
  await admin(base, [`drop database if exists "${dbName}" with (force)`, `create database "${dbName}"`]);
  const url = withDatabase(base, dbName);
  try {
    await migrateDatabase(url);
    const scratch = createDb(url, { max: 2 });
    try {
      await seedDemo(scratch.db, ctx.demo, { now: NOW });
      await scratch.pool.query('drop table placements, slice_ties, slice_functions, slices, tenants cascade');
      const { sink, text } = slowSink();
      await streamPieces(sink, graphmlPieces(await loadGraphmlNetwork(scratch.db)));
      expect(text()).toBe(expected);
    } finally {
      await scratch.pool.end();
    }
  } finally {
    await admin(base, [`drop database if exists "${dbName}" with (force)`]);
  }
}, 60_000);
