// The six invented tenants of the demo and the shape of their slices (service type, functions, demands).
import type { ScenarioSite, ScenarioTenant } from '../../shared/scenario';

/** Where a function goes: the tenant's own site, or the nearest site of a tier that has room. */
export type Where = 'home' | 'edge' | 'aggregation' | 'core' | 'with-previous';

export interface FunctionSpec {
  role: string;
  name: string;
  cpu: [number, number];
  where: Where;
  moveCost?: number;
}

export interface Profile {
  tenant: ScenarioTenant;
  short: string;
  count: number;
  sst: number;
  critical: boolean;
  priority: [number, number];
  /** Bandwidth of the access tie; ties further in carry a share of it. */
  gbps: [number, number];
  budgetsMs: number[];
  homes: string[];
  anchor: { site: number; point: number; radiusKm: number; fixed: number };
  chain: FunctionSpec[];
  extra: { odds: number; spec: FunctionSpec };
  purposes: string[];
}

const ops = (name: string, domain: string) => ({ name, email: `${name.toLowerCase().replace(/[^a-z]+/g, '.')}@${domain}` });
const control: FunctionSpec = { role: 'smf', name: 'Session control', cpu: [2, 4], where: 'core', moveCost: 5 };

export const PROFILES: Profile[] = [
  {
    tenant: { id: 't-crannock-logistics', name: 'Crannock Quay Logistics', noticeDays: 7,
      contacts: [ops('Port Operations Desk', 'crannock-logistics.example'), ops('Mara Tollent', 'crannock-logistics.example')] },
    short: 'port', count: 26, sst: 3, critical: false, priority: [3, 4], gbps: [0.05, 0.3], budgetsMs: [50, 100],
    homes: ['Crannock Quay', 'Brisk Harbour', 'Yarrowmouth'],
    anchor: { site: 0.6, point: 0, radiusKm: 0, fixed: 0 },
    chain: [
      { role: 'gw', name: 'IoT gateway', cpu: [1, 2], where: 'home' },
      { role: 'upf', name: 'User plane', cpu: [2, 4], where: 'edge', moveCost: 2 },
      { role: 'app', name: 'Asset platform', cpu: [4, 8], where: 'aggregation', moveCost: 4 },
    ],
    extra: { odds: 0.3, spec: control },
    purposes: ['Crane telemetry', 'Reefer monitoring', 'Gate cameras', 'Yard tractor tracking', 'Berth sensors', 'Tide gauges'],
  },
  {
    tenant: { id: 't-tidewell-broadcasting', name: 'Tidewell Broadcasting', noticeDays: 10,
      contacts: [ops('Network Control', 'tidewell-broadcasting.example')] },
    short: 'bcast', count: 22, sst: 1, critical: false, priority: [2, 4], gbps: [0.8, 2.5], budgetsMs: [10, 20, 50],
    homes: ['Vellaport', 'Quellhaven', 'Vennet Bay', 'Ostry Head', 'Merrisand', 'Talloway Strand'],
    anchor: { site: 0, point: 0.5, radiusKm: 15, fixed: 0 },
    chain: [
      { role: 'gw', name: 'Contribution gateway', cpu: [2, 3], where: 'home' },
      { role: 'upf', name: 'User plane', cpu: [3, 6], where: 'edge', moveCost: 2 },
      { role: 'hub', name: 'Media hub', cpu: [8, 16], where: 'core', moveCost: 4 },
    ],
    extra: { odds: 0.2, spec: control },
    purposes: ['Outside broadcast', 'Live news contribution', 'Radio studio link', 'Weather camera feed'],
  },
  {
    tenant: { id: 't-kestrelmoor-works', name: 'Kestrelmoor Precision Works', noticeDays: 14,
      contacts: [ops('Plant Engineering', 'kestrelmoor-works.example'), ops('Idris Fallowe', 'kestrelmoor-works.example')] },
    short: 'factory', count: 24, sst: 2, critical: false, priority: [2, 2], gbps: [0.2, 1], budgetsMs: [1, 2, 5],
    homes: ['Skarrowby', 'Lirrenford', 'Quarrowdene'],
    anchor: { site: 1, point: 0, radiusKm: 0, fixed: 0.7 },
    chain: [
      { role: 'plc', name: 'Line controller gateway', cpu: [2, 4], where: 'home' },
      { role: 'upf', name: 'Local user plane', cpu: [3, 5], where: 'with-previous', moveCost: 2 },
      { role: 'mes', name: 'Execution system', cpu: [4, 8], where: 'edge', moveCost: 4 },
    ],
    extra: { odds: 0.25, spec: control },
    purposes: ['Press line control', 'AGV fleet', 'Robot cell', 'Machine vision QA', 'Paint shop'],
  },
  {
    tenant: { id: 't-saltmere-proving', name: 'Saltmere Vehicle Proving Ground', noticeDays: 5,
      contacts: [ops('Track Control', 'saltmere-proving.example')] },
    short: 'v2x', count: 16, sst: 4, critical: false, priority: [3, 3], gbps: [0.2, 0.8], budgetsMs: [3, 5, 10],
    homes: ['Varrick Flats', 'Ettering'],
    anchor: { site: 0, point: 1, radiusKm: 10, fixed: 0 },
    chain: [
      { role: 'rsu', name: 'Roadside unit gateway', cpu: [1, 2], where: 'home' },
      { role: 'upf', name: 'User plane', cpu: [2, 4], where: 'edge', moveCost: 2 },
      { role: 'v2x', name: 'V2X application', cpu: [4, 6], where: 'edge', moveCost: 3 },
    ],
    extra: { odds: 0.2, spec: control },
    purposes: ['Platoon trial', 'Remote driving', 'Track telemetry', 'Collision warning test'],
  },
  {
    tenant: { id: 't-fennick-arena', name: 'Fennick Ridge Arena', noticeDays: 3,
      contacts: [ops('Venue Technology', 'fennick-arena.example')] },
    short: 'arena', count: 18, sst: 1, critical: false, priority: [4, 5], gbps: [0.8, 2], budgetsMs: [10, 20, 50],
    homes: ['Fennick Ridge'],
    anchor: { site: 1, point: 0, radiusKm: 0, fixed: 0.4 },
    chain: [
      { role: 'gw', name: 'Venue gateway', cpu: [2, 3], where: 'home' },
      { role: 'upf', name: 'User plane', cpu: [3, 5], where: 'aggregation', moveCost: 2 },
      { role: 'cdn', name: 'Replay cache', cpu: [4, 8], where: 'aggregation', moveCost: 3 },
    ],
    extra: { odds: 0.2, spec: control },
    purposes: ['Fan connectivity', 'Replay video', 'Ticket scanning', 'Broadcast compound', 'Concessions payments'],
  },
  {
    tenant: { id: 't-ambry-dispatch', name: 'Ambry Coast Ambulance and Fire Dispatch', noticeDays: 21,
      contacts: [ops('Control Room Duty Manager', 'ambry-dispatch.example'), ops('Sena Quellamore', 'ambry-dispatch.example')] },
    short: 'dispatch', count: 18, sst: 2, critical: true, priority: [1, 1], gbps: [0.1, 0.5], budgetsMs: [2, 5, 10],
    homes: ['Orrindale', 'Mirrowick', 'Drennock', 'Tollymere', 'Caddowmouth', 'Pellow Sands', 'Dunmarrow', 'Selkinby'],
    anchor: { site: 1, point: 0, radiusKm: 0, fixed: 0.5 },
    chain: [
      { role: 'gw', name: 'Station gateway', cpu: [1, 2], where: 'home' },
      { role: 'upf', name: 'User plane', cpu: [2, 4], where: 'edge', moveCost: 2 },
      { role: 'cad', name: 'Dispatch application', cpu: [4, 8], where: 'core', moveCost: 5 },
    ],
    extra: { odds: 0.3, spec: control },
    purposes: ['Ambulance telemetry', 'Fire crew video', 'Dispatch voice', 'Incident drone feed'],
  },
];

/** Which kinds of site each tier may use, nearest first. */
export const TIER_KINDS: Record<Exclude<Where, 'home' | 'with-previous'>, ScenarioSite['kind'][]> = {
  edge: ['edge', 'aggregation'],
  aggregation: ['aggregation', 'core'],
  core: ['core'],
};
