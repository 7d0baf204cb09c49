// POST /api/scenarios/validate: always 200 with ok, errors and warnings, each located by a JSON path.
import request from 'supertest';
import { scenarioValidationSchema } from '../../shared/api';
import { signInAs } from './helpers/sign-in';
import { setupTestApp, type TestContext } from './helpers/test-app';
import { tinyScenario } from './helpers/tiny-scenario';

let ctx: TestContext;
let cookie: string;
beforeAll(async () => {
  ctx = await setupTestApp();
  cookie = await signInAs(ctx.app, ctx.users.planner.email);
});
afterAll(() => ctx.close());

const validate = (body: unknown) =>
  request(ctx.app).post('/api/scenarios/validate').set('Cookie', cookie).send(body as object);

test('a valid scenario: ok with no errors', async () => {
  const res = await validate(tinyScenario());
  expect(res.status).toBe(200);
  expect(scenarioValidationSchema.strict().parse(res.body)).toEqual({ ok: true, errors: [], warnings: [] });
});

test('unknown references are errors at their JSON paths', async () => {
  const scenario = tinyScenario();
  scenario.slices[0].ties[0].to = 'f9';
  scenario.placements[0].paths.e1 = ['k9'];
  const res = await validate(scenario);
  expect(res.status).toBe(200);
  const body = scenarioValidationSchema.parse(res.body);
  expect(body.ok).toBe(false);
  expect(body.errors.map((e) => e.path)).toEqual(expect.arrayContaining(['$.slices[0].ties[0].to', '$.placements[0].paths.e1[0]']));
  expect(body.errors.every((e) => e.message.length > 0)).toBe(true);
});

test('a schema violation is reported at its field', async () => {
  const scenario = tinyScenario();
  scenario.slices[0].sst = 0;
  const body = scenarioValidationSchema.parse((await validate(scenario)).body);
  expect(body.ok).toBe(false);
  expect(body.errors.map((e) => e.path)).toContain('$.slices[0].sst');
});

test('placements over capacity are warnings, not errors', async () => {
  const scenario = tinyScenario();
  scenario.slices[0].ties[0].bandwidthGbps = 50;
  const body = scenarioValidationSchema.parse((await validate(scenario)).body);
  expect(body.ok).toBe(true);
  expect(body.errors).toEqual([]);
  expect(body.warnings.map((w) => w.path)).toContain('$.spans[0].capacityGbps');
});

test('a body that is not a scenario at all still gets 200 with errors', async () => {
  const body = scenarioValidationSchema.parse((await validate([1, 2, 3])).body);
  expect(body.ok).toBe(false);
  expect(body.errors.length).toBeGreaterThan(0);
});
