// Orders a plan's steps make-before-break: each step holds old and new resources at once, so it must fit first.
// Reference: RFC 3209 §2.5 make-before-break with shared-explicit reservation (spans on both paths are claimed once).
import { fits } from '../model/tolerance';
import type { Inventory, Reservation, SlicePlacement, WindowSpec } from '../model/types';
import { placementLoad } from '../model/window-capacity';
import { resolveWindow } from '../model/window-elements';
import { KnockOnGate, type MadeRoomFor } from './knock-on-order';
import { listSteps, type PendingStep } from './step-list';

export interface OrderedStep {
  slice: string;
  kind: 'move-function' | 'reroute-tie';
  /** function or tie id */
  element: string;
  /** site id (move) or span ids (reroute) */
  from: string | string[];
  to: string | string[];
  /** true when the step only fits with temporary spare capacity */
  needsSpare: boolean;
  /** a knock-on move: a slice the window does not touch, moved to make room */
  knockOn: boolean;
}

export interface StepOrderOptions {
  /** knock-on slices (index) → the touched slices (indices) they make room for; see madeRoomForIndex */
  madeRoomFor?: MadeRoomFor;
}

export interface StepOrder {
  steps: OrderedStep[];
  needsSpare: number;
}

interface Ledger {
  freeCpu: Float64Array;
  freeGbps: Float64Array;
}

/** Extra resources the step needs while old and new coexist (spans shared by both paths count once). */
function fitsNow(inv: Inventory, step: PendingStep, ledger: Ledger): boolean {
  const slice = inv.slices[step.slice];
  if (step.kind === 'move-function') return fits(slice.functions[step.part].cpu, ledger.freeCpu[step.toSite]);
  const old = new Set(step.fromSpans);
  const gbps = slice.ties[step.part].bandwidthGbps;
  return step.toSpans.every((x) => old.has(x) || fits(gbps, ledger.freeGbps[x]));
}

/** Claims the new resources and releases the old ones (the step is complete). */
function apply(inv: Inventory, step: PendingStep, ledger: Ledger): void {
  const slice = inv.slices[step.slice];
  if (step.kind === 'move-function') {
    const cpu = slice.functions[step.part].cpu;
    ledger.freeCpu[step.toSite] -= cpu;
    ledger.freeCpu[step.fromSite] += cpu;
    return;
  }
  const gbps = slice.ties[step.part].bandwidthGbps;
  for (const x of step.toSpans) ledger.freeGbps[x] -= gbps;
  for (const x of step.fromSpans) ledger.freeGbps[x] += gbps;
}

function describe(inv: Inventory, step: PendingStep, needsSpare: boolean, knockOn: boolean): OrderedStep {
  const { sites, spans } = inv.network;
  const slice = inv.slices[step.slice];
  const moving = step.kind === 'move-function';
  return {
    slice: slice.id, kind: step.kind, needsSpare, knockOn,
    element: moving ? slice.functions[step.part].id : slice.ties[step.part].id,
    from: moving ? sites[step.fromSite].id : step.fromSpans.map((x) => spans[x].id),
    to: moving ? sites[step.toSite].id : step.toSpans.map((x) => spans[x].id),
  };
}

/** Before the window: full capacity minus reservations and minus today's load of every slice. */
function initialLedger(inv: Inventory, window: WindowSpec, reservations?: Reservation): Ledger {
  resolveWindow(inv.network, window); // unknown window elements are an error here as everywhere
  const load = placementLoad(inv, inv.slices.map((s) => s.index));
  const freeCpu = Float64Array.from(inv.network.sites, (s, i) => s.cpu - load.siteCpu[i] - (reservations?.siteCpu?.[s.id] ?? 0));
  const freeGbps = Float64Array.from(inv.network.spans, (s, i) => s.capacityGbps - load.spanGbps[i] - (reservations?.spanGbps?.[s.id] ?? 0));
  return { freeCpu, freeGbps };
}

/**
 * Greedy: repeatedly take the first pending step that fits; when none fits, take the first pending one
 * anyway and flag it needsSpare (its completion may unblock the rest). Knock-on moves are tried first, and a
 * touched slice's steps wait until the knock-on moves making room for it are done; the capacity check is the
 * same for every step.
 */
export function orderSteps(
  inv: Inventory, window: WindowSpec, next: Map<number, SlicePlacement | null>, reservations?: Reservation,
  options: StepOrderOptions = {},
): StepOrder {
  const ledger = initialLedger(inv, window, reservations);
  const listed = listSteps(inv, next);
  const gate = new KnockOnGate(options.madeRoomFor ?? new Map(), listed);
  const pending = gate.sort(listed);
  const steps: OrderedStep[] = [];
  while (pending.length > 0) {
    const ready = pending.findIndex((step) => gate.mayGo(step) && fitsNow(inv, step, ledger));
    // None fits: the first step allowed to go (any step if hand-made data has knock-on moves wait on each other).
    const pick = ready !== -1 ? ready : Math.max(0, pending.findIndex((step) => gate.mayGo(step)));
    const [step] = pending.splice(pick, 1);
    const needsSpare = ready === -1 && !fitsNow(inv, step, ledger);
    apply(inv, step, ledger);
    gate.done(step);
    steps.push(describe(inv, step, needsSpare, gate.isKnockOn(step.slice)));
  }
  return { steps, needsSpare: steps.filter((s) => s.needsSpare).length };
}
