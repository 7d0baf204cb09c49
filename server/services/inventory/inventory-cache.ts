// The compiled inventory of one revision, kept per process and rebuilt only when the inventory revision changes.
// Every read checks the revision with one small query (read-your-writes, and the fallback when a notification is
// missed); concurrent reads of a new revision share one build. Views (network-wide, and per tenant for tenant
// users) are derived from the same compiled inventory and kept with it.
import type { Db, Queryable } from '../../../db/client';
import { buildInventory } from '../../../planner/model/build-inventory';
import type { Inventory } from '../../../planner/model/types';
import type { Scenario } from '../../../shared/scenario';
import { selectInventoryRevision } from '../../queries/inventory/inventory-revision';
import { selectScenarioTables } from '../../queries/inventory/scenario-tables';
import { InventoryListener } from './inventory-listener';
import { tablesToScenario } from './load-network-scenario';
import {
  compileInventory, loadInventoryView, sliceFactsOf, viewOf, type CompiledInventory, type InventoryView,
} from './inventory-view';
import { warmLists, yieldToLoop } from './warm-lists';

/** How many tenants' views one revision keeps (least recently used goes first). */
const TENANT_VIEWS = 32;

export type BuiltInventory = { revision: number; compiled: CompiledInventory };

/**
 * Reads the revision, then the tables: data read after the revision is at least that new, so a reader never
 * waits on a stale copy. Built in this thread, with a pause for waiting requests between the steps.
 * WARNING: measured at 1,000 sites / 20,000 slices (2 shared CPUs under load), handing a build made in a worker
 * thread back blocks this thread longer than building here: deserialising the tables, scenario and compiled
 * inventory (53 MB structured clone) took 4.4–6.1 s, against 1.4–2.3 s for the scenario, 1.2–2.4 s to compile and
 * about 1 s for the network-wide view built in place, each step a separate pause.
 */
export async function buildCompiledInventory(db: Queryable): Promise<BuiltInventory> {
  const revision = await selectInventoryRevision(db);
  const tables = await selectScenarioTables(db);
  await yieldToLoop();
  const scenario = tablesToScenario(tables);
  await yieldToLoop();
  const inventory = buildInventory(scenario);
  await yieldToLoop();
  return { revision, compiled: { scenario, inventory, sliceFacts: sliceFactsOf(tables) } };
}

type Snapshot = { revision: number; compiled: CompiledInventory; staff: InventoryView; tenants: Map<string, InventoryView> };

export type InventoryCacheOptions = {
  /** reads and compiles one revision (default: in this thread, buildCompiledInventory) */
  build?: (db: Db) => Promise<BuiltInventory>;
  /** freezes the shared scenario so that a caller mutating it fails loudly (on in tests) */
  freeze?: boolean;
};

function deepFreeze<T>(value: T): T {
  if (value === null || typeof value !== 'object' || Object.isFrozen(value)) return value;
  for (const v of Object.values(value)) deepFreeze(v);
  return Object.freeze(value);
}

export class InventoryCache {
  private snapshot: Snapshot | null = null;
  private flight: { revision: number; promise: Promise<Snapshot> } | null = null;
  private readonly build: (db: Db) => Promise<BuiltInventory>;
  private readonly freeze: boolean;
  private listener: InventoryListener | null = null;
  /** builds finished by this cache (for tests and the operations log) */
  builds = 0;

  constructor(private readonly db: Db, options: InventoryCacheOptions = {}) {
    this.build = options.build ?? buildCompiledInventory;
    this.freeze = options.freeze ?? process.env.NODE_ENV === 'test';
  }

  /** The revision held now, or null before the first build. */
  get revision(): number | null {
    return this.snapshot?.revision ?? null;
  }

  /** The compiled inventory of the current revision (checked now; built if it changed). */
  async compiled(): Promise<CompiledInventory> {
    return (await this.current()).compiled;
  }

  /** What `tenantId` may see (null = network-wide) of the current revision. */
  async view(tenantId: string | null): Promise<InventoryView> {
    const snap = await this.current();
    if (tenantId === null) return snap.staff;
    let view = snap.tenants.get(tenantId);
    if (view) snap.tenants.delete(tenantId);
    else view = viewOf(snap.compiled, tenantId);
    snap.tenants.set(tenantId, view);
    if (snap.tenants.size > TENANT_VIEWS) snap.tenants.delete(snap.tenants.keys().next().value!);
    return view;
  }

  /**
   * Inside a transaction: the cached copy if the transaction sees the revision it was built from, else a copy
   * read through the transaction itself (its own uncommitted writes, or a revision this process has not built).
   */
  async compiledIn(tx: Queryable): Promise<CompiledInventory> {
    const revision = await selectInventoryRevision(tx);
    if (this.snapshot?.revision === revision) return this.snapshot.compiled;
    return compileInventory(await selectScenarioTables(tx));
  }

  /** Brings the cache up to `revision` (or to whatever the database holds now) without anyone waiting on it. */
  refresh(revision?: number): Promise<void> {
    const target = revision === undefined ? selectInventoryRevision(this.db) : Promise.resolve(revision);
    return target.then((r) => this.ensure(r)).then(() => undefined);
  }

  /**
   * LISTENs on its own connection to `url` and rebuilds in the background when another write lands, so the next
   * read finds the new revision built. `onError` hears about failed background builds and lost connections.
   */
  listen(url: string, onError: (what: string, err: Error) => void = () => undefined): Promise<void> {
    const refresh = (revision?: number) => this.refresh(revision).catch((err: unknown) =>
      onError('inventory rebuild failed', err instanceof Error ? err : new Error(String(err))));
    if (this.listener) return Promise.resolve();
    this.listener = new InventoryListener({
      url,
      onRevision: (revision) => void refresh(revision),
      onListening: () => void refresh(),
      onLost: (err, retryInMs) => onError(`inventory notifications lost; listening again in ${retryInMs} ms`, err),
    });
    return this.listener.start();
  }

  /** Stops listening (graceful shutdown, tests). Reads still work, checking the revision each time. */
  async close(): Promise<void> {
    const listener = this.listener;
    this.listener = null;
    await listener?.close();
  }

  private async current(): Promise<Snapshot> {
    return this.ensure(await selectInventoryRevision(this.db));
  }

  /** Single flight: a read of revision r joins a build that will hold r or later, else waits for it and builds anew. */
  private async ensure(revision: number): Promise<Snapshot> {
    for (;;) {
      if (this.snapshot && this.snapshot.revision >= revision) return this.snapshot;
      const flight = this.flight;
      if (!flight) break;
      if (flight.revision >= revision) return flight.promise;
      await flight.promise.catch(() => undefined);
    }
    const flight = { revision, promise: this.rebuild() };
    this.flight = flight;
    const clear = () => { if (this.flight === flight) this.flight = null; };
    flight.promise.then(clear, clear);
    return flight.promise;
  }

  private async rebuild(): Promise<Snapshot> {
    // Every reader from now on waits for the newer revision, so the old one is let go before the new one is read:
    // the process then keeps one revision alive while building, not two (at 20,000 slices one is about 200 MB of heap).
    this.snapshot = null;
    const { revision, compiled } = await this.build(this.db);
    if (this.freeze) deepFreeze(compiled.scenario);
    const snap: Snapshot = { revision, compiled, staff: viewOf(compiled, null), tenants: new Map() };
    await yieldToLoop();
    await warmLists(snap.staff);
    // Another build may have finished meanwhile (TypeScript cannot see that across the awaits, hence the cast).
    const held = this.snapshot as Snapshot | null;
    if (!held || held.revision <= revision) this.snapshot = snap;
    this.builds += 1;
    return snap;
  }
}

const caches = new WeakMap<Db, InventoryCache>();

/** The process's cache for this database handle (one per pool, as each process has its own). */
export function inventoryCacheFor(db: Db, options?: InventoryCacheOptions): InventoryCache {
  let cache = caches.get(db);
  if (!cache) {
    cache = new InventoryCache(db, options);
    caches.set(db, cache);
  }
  return cache;
}

/** Drizzle's transaction handle has rollback(); the pool-backed database has not. */
const isTransaction = (db: Queryable): boolean => 'rollback' in db;

/** What `tenantId` may see of the current inventory: cached on the pool, read afresh inside a transaction. */
export function inventoryView(db: Queryable, tenantId: string | null): Promise<InventoryView> {
  return isTransaction(db) ? loadInventoryView(db, tenantId) : inventoryCacheFor(db as Db).view(tenantId);
}

/** The current scenario and its planner compilation. Shared: callers must not change them. */
export async function currentInventory(db: Queryable): Promise<{ scenario: Scenario; inventory: Inventory }> {
  const compiled = isTransaction(db)
    ? compileInventory(await selectScenarioTables(db))
    : await inventoryCacheFor(db as Db).compiled();
  return { scenario: compiled.scenario, inventory: compiled.inventory };
}
