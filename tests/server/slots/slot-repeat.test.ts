// The same slot search ranks the same whatever the machine's speed: the quick re-map stops on its budget in
// counts (generations, decodes per local search), not on the clock, unless the clock passes its safety cap.
// The machine's speed is played by an injected clock that advances a fixed step per reading: 1× and 3×.
// On the demo network, the work takes Vellaport down for 4 hours on three nights; on two of them another window
// takes a nearby span down, so each night is a network state of its own with its own re-map.
import { countComponents } from '../../../planner/impact/bridges';
import { buildInventory } from '../../../planner/model/build-inventory';
import { readDemoFile } from '../../../db/seed/demo-identity';
import type { ElementRow } from '../../../server/queries/windows/window-rows';
import { GroupEvaluator, scaledRemapLimitMs, type EvaluatedSlot, type SearchRemaps } from '../../../server/services/slots/evaluate-slot';
import { rankSlots } from '../../../server/services/slots/find-slots';
import { quickRemap, type QuickRemapper } from '../../../server/services/slots/quick-remap';
import { RemapCache, type RemapAnswer } from '../../../server/services/slots/remap-cache';
import type { ContextWindow, SlotContext } from '../../../server/services/slots/slot-context';
import { namesOf } from '../../../server/services/slots/slot-words';
import { outageOf } from '../../../server/services/windows/pair-conflicts';
import { windowSpecOf } from '../../../server/services/windows/window-spec';
import { POLICY_DEFAULTS } from '../../../shared/policies';
import type { Scenario } from '../../../shared/scenario';
import type { SlotTime } from '../../../shared/slot-times';

const scenario = readDemoFile() as Scenario;
const inventory = buildInventory(scenario);
const HOUR_MS = 3_600_000;
const NOW = new Date('2031-03-01T12:00:00Z');
/** Three nights a month ahead (every tenant can be told in time), 01:00–05:00 UTC. */
const SLOTS: SlotTime[] = ['2031-04-01', '2031-04-02', '2031-04-03'].map((night) => {
  const startMs = Date.parse(`${night}T01:00:00Z`);
  return { startMs, endMs: startMs + 4 * HOUR_MS, night };
});
const WORK = scenario.sites.find((s) => s.name === 'Vellaport')!;
/** Clock steps per reading, in milliseconds: the slow machine's is three times the fast one's. */
const FAST_STEP_MS = 0.05;
const SLOW_STEP_MS = 3 * FAST_STEP_MS;

/** Two spans one hop away from the work (not ending at it), for the other windows. */
function nearbySpans(): string[] {
  const next = new Set(scenario.spans.filter((s) => s.a === WORK.id || s.b === WORK.id).flatMap((s) => [s.a, s.b]));
  next.delete(WORK.id);
  return scenario.spans.filter((s) => s.a !== WORK.id && s.b !== WORK.id && (next.has(s.a) || next.has(s.b)))
    .map((s) => s.id).slice(0, 2);
}

function otherWindow(spanId: string, slot: SlotTime, n: number): ContextWindow {
  const elements: ElementRow[] = [{ kind: 'span', id: spanId, effect: 'down', fraction: null }];
  const [startsAt, endsAt] = [new Date(slot.startMs), new Date(slot.endMs)];
  return {
    id: `other-${n}`, title: `Fibre work ${n}`, startMs: slot.startMs, endMs: slot.endMs, version: 1, acceptedPlanId: null,
    elements, spec: windowSpecOf({ id: `other-${n}`, startsAt, endsAt, elements }), outage: outageOf(inventory.network, elements),
    slices: [],
  };
}

function context(): SlotContext {
  const policies = POLICY_DEFAULTS;
  return {
    revision: 1, scenario, inventory, names: namesOf(scenario), freezes: [],
    windows: nearbySpans().map((span, i) => otherWindow(span, SLOTS[i + 1], i + 1)),
    policies, leadDays: new Map(scenario.tenants.map((t) => [t.id, Math.max(t.noticeDays, policies.noticeLeadDays)])),
    baseComponents: countComponents(inventory.network),
  };
}

/** One search with a clock advancing `stepMs` per reading; answers the ranked slots and each re-map's answer. */
async function search(stepMs: number, limitMs?: number) {
  let t = 0;
  const answers: RemapAnswer[] = [];
  const remapper: QuickRemapper = {
    remap: async (req, onBusy) => {
      const answer = await quickRemap(scenario, inventory, req, onBusy, () => (t += stepMs));
      answers.push(answer);
      return answer;
    },
    close: async () => undefined,
  };
  const remaps: SearchRemaps = { memo: new Map(), cache: new RemapCache(), stats: { runs: 0, reused: 0, cutShort: 0 }, limitMs: 0, remapper };
  const evaluator = new GroupEvaluator(context(), { sites: [WORK.id], spans: [] }, 4, remaps);
  remaps.limitMs = limitMs ?? scaledRemapLimitMs(evaluator.mustMoveCount());
  const evaluated: EvaluatedSlot[] = [];
  for (const slot of SLOTS) evaluated.push(await evaluator.evaluate(slot, NOW));
  return { ranked: rankSlots(evaluated), answers, stats: remaps.stats };
}

test('the same search on a machine three times slower gives the same ranking, costs and plans', async () => {
  const fast = await search(FAST_STEP_MS);
  const slow = await search(SLOW_STEP_MS);
  // Each night is a network state of its own, and no re-map met the cap on either machine.
  expect(fast.stats.runs).toBe(SLOTS.length);
  expect([...fast.answers, ...slow.answers].map((a) => a.stoppedBy)).not.toContain('time');
  expect(fast.stats.cutShort).toBe(0);
  expect(slow.stats.cutShort).toBe(0);
  expect(slow.ranked.map((c) => [c.start, c.rank, c.cost])).toEqual(fast.ranked.map((c) => [c.start, c.rank, c.cost]));
  expect(slow.ranked).toEqual(fast.ranked);
  expect(slow.answers.map((a) => a.slices)).toEqual(fast.answers.map((a) => a.slices));
});

test('every re-map the safety cap stops is counted, once per network state', async () => {
  // Every clock reading jumps past the cap: every re-map ends by time.
  const capped = await search(10_000, 900);
  expect(capped.answers.map((a) => a.stoppedBy)).toEqual(SLOTS.map(() => 'time'));
  expect(capped.stats.cutShort).toBe(SLOTS.length);
});
