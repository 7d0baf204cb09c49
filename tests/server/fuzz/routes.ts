// Every route of the app, read from Express's own router stack, so a route added later is fuzzed without a list.
import type express from 'express';

export type RouteInfo = { method: string; pattern: string };

type Layer = {
  rawPath?: unknown;
  route?: { path: unknown; methods: Record<string, boolean> };
  handle?: { stack?: Layer[] };
};

function join(prefix: string, path: unknown): string {
  const p = typeof path === 'string' && path !== '/' ? path : '';
  return `${prefix}${p}` || '/';
}

function walk(stack: Layer[], prefix: string, out: RouteInfo[]): void {
  for (const layer of stack) {
    if (layer.route) {
      for (const method of Object.keys(layer.route.methods)) {
        if (method !== '_all') out.push({ method: method.toUpperCase(), pattern: join(prefix, layer.route.path) });
      }
    } else if (layer.handle?.stack) {
      walk(layer.handle.stack, join(prefix, layer.rawPath), out);
    }
  }
}

/** Unique method + pattern pairs, e.g. { method: 'PATCH', pattern: '/api/windows/:id' }. */
export function listRoutes(app: express.Application): RouteInfo[] {
  const out: RouteInfo[] = [];
  walk((app as unknown as { router: { stack: Layer[] } }).router.stack, '', out);
  const seen = new Set<string>();
  return out.filter((r) => r.pattern.startsWith('/api/') && !seen.has(`${r.method} ${r.pattern}`) && seen.add(`${r.method} ${r.pattern}`));
}

/** `:name` parameters of a pattern ('/{*splat}' wildcards are left out of the fuzz). */
export function paramsOf(pattern: string): string[] {
  return [...pattern.matchAll(/:(\w+)/g)].map((m) => m[1]);
}
