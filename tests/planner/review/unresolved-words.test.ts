// An unresolved slice's reason is read as it is on the plan review and the sign-off summary, so it names functions
// and sites as people call them, never by internal id; ids stay only where a scenario gives no name.
import { buildInventory, compileWindow } from '../../../planner/model/build-inventory';
import { planWindow } from '../../../planner/remap/plan-window';
import { functionWords, siteWords, tieWords } from '../../../planner/remap/reason-words';
import { tinyScenario, window } from '../fixtures/tiny-scenario';

const FUNCTION_NAMES: Record<string, string> = { ran: 'radio unit', upf: 'user plane', gw: 'IoT gateway', app: 'telemetry app', c1: 'collector', d1: 'store' };

function namedTinyScenario() {
  const scenario = tinyScenario();
  return {
    ...scenario,
    slices: scenario.slices.map((s) => ({ ...s, functions: s.functions.map((f) => ({ ...f, name: FUNCTION_NAMES[f.id] })) })),
  };
}

test('functions, links and sites are named by what people call them, with the id only as a fallback', () => {
  const functions = [{ id: 'ran', name: 'radio unit' }, { id: 'upf' }];
  expect(functionWords(functions[0])).toBe('the radio unit');
  expect(functionWords(functions[1])).toBe('function "upf"');
  expect(tieWords({ from: 0, to: 1 }, functions)).toBe('the link between the radio unit and function "upf"');
  expect(siteWords({ name: 'Site E' })).toBe('site Site E');
});

test('D down strands the slice fixed on E: its reason names the function and the site, not their ids', async () => {
  const inv = buildInventory(namedTinyScenario());
  const result = await planWindow(inv, compileWindow(window('w-site-d', { sites: ['D'] })), { mode: 'greedy' });
  const transit = result.slices.find((s) => s.slice === 's-transit');
  expect(transit?.outcome).toBe('unresolved');
  const reason = transit?.reason;
  expect(reason).toEqual(expect.any(String));
  expect(reason).toMatch(/the radio unit|the user plane/);
  expect(reason).not.toMatch(/"(ran|upf|ran-upf|E|D)"/);
});
