// The map's input: the network as GET /api/network/map returns it (sites with coordinates, spans with load).
// Kept structural so the component also takes data built elsewhere (a slice's detail, a window's impact).
export type MapSiteKind = 'core' | 'aggregation' | 'edge' | 'cell-site';

export type MapSite = { id: string; name: string; kind: MapSiteKind; lat: number; lon: number; cpuUtilisation: number | null };

export type MapSpan = { id: string; a: string; b: string; capacityGbps: number; utilisation: number | null };

export type MapOutline =
  | { type: 'Polygon'; coordinates: number[][][] }
  | { type: 'MultiPolygon'; coordinates: number[][][][] };

export type NetworkMapData = { name: string | null; outline: MapOutline | null; sites: readonly MapSite[]; spans: readonly MapSpan[] };

export type MapSelection = { kind: 'site' | 'span'; id: string };
