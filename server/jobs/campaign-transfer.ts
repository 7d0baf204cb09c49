// A campaign problem packed for its scheduling thread: the slots (up to a few hundred thousand for the largest
// campaign the form allows) as typed arrays whose buffers move to the thread without a copy. Copying them as
// objects took the calling thread close to half a second, about as long as the scheduling the thread spares it.
import type { CampaignGroupInput, CampaignProblem, CampaignRules } from '../services/campaigns/engine';

export interface PackedCampaign {
  rules: CampaignRules;
  clashes: Array<[number, number]>;
  labels: (string | null)[];
  touched: (readonly string[])[];
  /** group g's slots are [slotStart[g], slotStart[g + 1]) */
  slotStart: Uint32Array;
  startMs: Float64Array;
  endMs: Float64Array;
  cost: Float64Array;
  /** index into `nights` */
  night: Uint32Array;
  nights: string[];
}

export function packCampaign(p: CampaignProblem): PackedCampaign {
  const total = p.groups.reduce((n, g) => n + g.slots.length, 0);
  const packed: PackedCampaign = {
    rules: p.rules, clashes: p.clashes, labels: p.groups.map((g) => g.label ?? null), touched: p.groups.map((g) => g.touched),
    slotStart: new Uint32Array(p.groups.length + 1), startMs: new Float64Array(total), endMs: new Float64Array(total),
    cost: new Float64Array(total), night: new Uint32Array(total), nights: [],
  };
  const nightIndex = new Map<string, number>();
  let k = 0;
  p.groups.forEach((g, i) => {
    packed.slotStart[i] = k;
    for (const s of g.slots) {
      let n = nightIndex.get(s.night);
      if (n === undefined) {
        n = packed.nights.push(s.night) - 1;
        nightIndex.set(s.night, n);
      }
      packed.startMs[k] = s.startMs;
      packed.endMs[k] = s.endMs;
      packed.cost[k] = s.cost;
      packed.night[k] = n;
      k++;
    }
  });
  packed.slotStart[p.groups.length] = k;
  return packed;
}

/** The buffers postMessage / workerData may move instead of copying. */
export function transferablesOf(p: PackedCampaign): ArrayBuffer[] {
  return [p.slotStart, p.startMs, p.endMs, p.cost, p.night].map((a) => a.buffer as ArrayBuffer);
}

export function unpackCampaign(p: PackedCampaign): CampaignProblem {
  const groups = p.touched.map((touched, g): CampaignGroupInput => {
    const slots: CampaignGroupInput['slots'] = [];
    for (let k = p.slotStart[g]; k < p.slotStart[g + 1]; k++) {
      slots.push({ startMs: p.startMs[k], endMs: p.endMs[k], night: p.nights[p.night[k]], cost: p.cost[k] });
    }
    const label = p.labels[g];
    return label === null ? { slots, touched } : { slots, touched, label };
  });
  return { groups, rules: p.rules, clashes: p.clashes };
}
